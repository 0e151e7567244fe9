import type { ImportColumn, ImportRowError } from '../../../shared/schemas/imports';
import type { StoredMeasurement, StoredTaphole, StoredTree } from './imports.repository';
import type { MeasurementRow, TapholeRow, TreeRow } from './read-rows';

/** Figures read back from a double or converted from inches: equal within a hundredth. */
const same = (a: number | null, b: number | null) =>
  a === null || b === null ? a === b : Math.abs(a - b) < 0.005;

/** The header of the column that filled a field (or the field's name). */
export const headerFor = (columns: readonly ImportColumn[], ...fields: string[]) =>
  columns.find((c) => c.field !== null && fields.includes(c.field))?.header ?? fields[0];

export interface Matched<R> {
  create: R[];
  update: (R & { id: number })[];
  unchanged: number;
  errors: ImportRowError[];
}

/**
 * Trees by tag: a new tag is added, the same tree again is left as it is, and a tag on record with
 * other data is reported — or, when the mapping says `updateExisting`, its entry is replaced.
 */
export function matchTrees(
  rows: readonly TreeRow[],
  stored: Map<string, StoredTree>,
  columns: readonly ImportColumn[],
  updateExisting: boolean,
): Matched<TreeRow> {
  const out: Matched<TreeRow> = { create: [], update: [], unchanged: 0, errors: [] };
  for (const r of rows) {
    const t = stored.get(r.tag);
    if (!t) {
      out.create.push(r);
      continue;
    }
    const differs = (['species', 'status', 'lat', 'lng'] as const).filter((f) =>
      f === 'lat' || f === 'lng' ? !same(r[f], t[f]) : r[f] !== t[f],
    );
    if (differs.length === 0) out.unchanged++;
    else if (updateExisting) out.update.push({ ...r, id: t.id });
    else
      out.errors.push({
        row: r.row,
        column: headerFor(columns, differs[0]),
        message: `Tree ${r.tag} is already in the register with another ${differs.join(', ')} (${differs
          .map((f) => `${f} ${t[f] ?? 'empty'}`)
          .join(', ')}): correct the row, or import with "updateExisting" to replace the entry`,
      });
  }
  return out;
}

/** Readings by tree and date: the same reading again adds nothing; another one is reported. */
export function matchMeasurements(
  rows: readonly MeasurementRow[],
  trees: Map<string, StoredTree>,
  stored: readonly StoredMeasurement[],
  columns: readonly ImportColumn[],
): Matched<MeasurementRow & { treeId: number }> {
  const out: Matched<MeasurementRow & { treeId: number }> = {
    create: [],
    update: [],
    unchanged: 0,
    errors: [],
  };
  const onRecord = new Map<string, StoredMeasurement[]>();
  for (const m of stored) {
    const k = `${m.treeId}|${m.measuredOn}`;
    onRecord.set(k, [...(onRecord.get(k) ?? []), m]);
  }
  for (const r of rows) {
    const tree = trees.get(r.tag);
    if (!tree) {
      out.errors.push(noTree(r.row, r.tag, columns));
      continue;
    }
    const there = onRecord.get(`${tree.id}|${r.measuredOn}`) ?? [];
    const equal = there.find(
      (m) =>
        same(m.dbhCm, r.dbhCm) &&
        same(m.crownDiebackPct, r.crownDiebackPct) &&
        (m.note ?? '') === (r.note ?? ''),
    );
    if (equal) out.unchanged++;
    else if (there.length > 0)
      out.errors.push({
        row: r.row,
        column: headerFor(columns, 'dbhCm', 'dbhIn', 'circumferenceCm', 'circumferenceIn'),
        message: `Tree ${r.tag} already has a reading on ${r.measuredOn} (DBH ${there[0].dbhCm} cm${
          there[0].crownDiebackPct === null ? '' : `, dieback ${there[0].crownDiebackPct} %`
        }): correct it on the tree's page rather than importing a second one`,
      });
    else out.create.push({ ...r, treeId: tree.id });
  }
  return out;
}

/** Holes by tree, season and position (height and side); the same hole again adds nothing. */
export function matchTapholes(
  rows: readonly TapholeRow[],
  trees: Map<string, StoredTree>,
  stored: readonly StoredTaphole[],
  columns: readonly ImportColumn[],
): Matched<TapholeRow & { treeId: number }> {
  const out: Matched<TapholeRow & { treeId: number }> = {
    create: [],
    update: [],
    unchanged: 0,
    errors: [],
  };
  const bySeason = new Map<string, StoredTaphole[]>();
  for (const h of stored) {
    const k = `${h.treeId}|${h.season}`;
    bySeason.set(k, [...(bySeason.get(k) ?? []), h]);
  }
  for (const r of rows) {
    const tree = trees.get(r.tag);
    if (!tree) {
      out.errors.push(noTree(r.row, r.tag, columns));
      continue;
    }
    const there = (bySeason.get(`${tree.id}|${r.season}`) ?? []).find(
      (h) =>
        Math.abs(h.heightCm - r.heightCm) < 0.05 && Math.abs(h.azimuthDeg - r.azimuthDeg) < 0.05,
    );
    if (!there) out.create.push({ ...r, treeId: tree.id });
    else if (
      same(there.depthCm, r.depthCm) &&
      same(there.bitCm, r.bitCm) &&
      there.collection === r.collection
    )
      out.unchanged++;
    else
      out.errors.push({
        row: r.row,
        column: headerFor(columns, 'depthCm', 'depthIn'),
        message: `Tree ${r.tag} already has a ${r.season} hole at that height and side, drilled ${there.depthCm} cm deep with a ${there.bitCm} cm bit (${there.collection}): correct the row`,
      });
  }
  return out;
}

const noTree = (row: number, tag: string, columns: readonly ImportColumn[]): ImportRowError => ({
  row,
  column: headerFor(columns, 'tag'),
  message: `No tree tagged ${tag} in this stand: import or add the tree first`,
});
