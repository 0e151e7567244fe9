import type { Knex } from 'knex';
import type { StandTree, StatusChange } from '../../../shared/rules/index';
import { treeStatuses } from '../../../shared/schemas/enums';

export type RecordedTree = StandTree & { id: number; tag: string; recordVersion: number };

/**
 * Trees with their standing record — measurements no later row corrects, and every taphole — and
 * the record's version: the whole stand, one tree, or the trees of a list of ids.
 */
export async function loadStandTrees(
  db: Knex,
  sugarbushId: number,
  only?: number | readonly number[],
): Promise<RecordedTree[]> {
  const some = only === undefined ? null : typeof only === 'number' ? [only] : [...only];
  const trees: {
    id: number;
    tag: string;
    species: StandTree['species'];
    status: StandTree['status'];
    record_version: number;
  }[] = await db('trees')
    .where({ sugarbush_id: sugarbushId })
    .modify((q) => {
      if (some) q.whereIn('id', some);
    })
    .orderBy('tag')
    .select('id', 'tag', 'species', 'status', 'record_version');
  const ids = trees.map((t) => t.id);
  const scope = (table: string, alias: string) =>
    some
      ? db(`${table} as ${alias}`).whereIn(`${alias}.tree_id`, some)
      : db(`${table} as ${alias}`)
          .join('trees as t', 't.id', `${alias}.tree_id`)
          .where('t.sugarbush_id', sugarbushId);

  const measurements = await scope('measurements', 'm')
    .whereNotExists(db('measurements as c').select(db.raw('1')).whereRaw('c.corrects_id = m.id'))
    .orderBy(['m.tree_id', 'm.measured_on', 'm.id'])
    .select('m.tree_id', 'm.measured_on', 'm.dbh_cm', 'm.crown_dieback_pct', 'm.confirmed_outlier');
  const holes = await scope('tapholes', 'h')
    .orderBy(['h.tree_id', 'h.season', 'h.id'])
    .select(
      'h.tree_id',
      'h.season',
      'h.height_cm',
      'h.azimuth_deg',
      'h.depth_cm',
      'h.bit_cm',
      'h.collection',
    );

  const history = await statusHistories(db, sugarbushId, some);

  const byId = new Map<
    number,
    RecordedTree & {
      measurements: StandTree['measurements'][number][];
      tapholes: StandTree['tapholes'][number][];
    }
  >();
  for (const t of trees)
    byId.set(t.id, {
      id: t.id,
      tag: t.tag,
      species: t.species,
      status: t.status,
      recordVersion: Number(t.record_version),
      ...(history.has(t.id) ? { statusHistory: history.get(t.id) } : {}),
      measurements: [],
      tapholes: [],
    });
  for (const m of measurements) {
    byId.get(m.tree_id)?.measurements.push({
      measuredOn: m.measured_on,
      dbhCm: m.dbh_cm,
      crownDiebackPct: m.crown_dieback_pct,
      ...(m.confirmed_outlier ? { confirmedOutlier: true } : {}),
    });
  }
  for (const h of holes) {
    byId.get(h.tree_id)?.tapholes.push({
      season: h.season,
      heightCm: h.height_cm,
      azimuthDeg: h.azimuth_deg,
      depthCm: h.depth_cm,
      bitCm: h.bit_cm,
      collection: h.collection,
    });
  }
  return ids.map((id) => byId.get(id)!);
}

/**
 * The statuses the audit trail gave trees, oldest first, by tree: the status a tree was created
 * with and every change of it. The advice for a season reads the status the tree had then.
 */
export async function statusHistories(
  db: Knex,
  sugarbushId: number,
  only: readonly number[] | null,
): Promise<Map<number, StatusChange[]>> {
  const rows: { entity_id: number; action: string; detail: string; created_at: string }[] =
    await db('audit_events as e')
      .where('e.sugarbush_id', sugarbushId)
      .where('e.entity', 'tree')
      .modify((q) => {
        if (only) q.whereIn('e.entity_id', only);
      })
      .whereIn('e.action', ['create', 'update'])
      .where('e.detail', 'like', '%"status"%')
      .orderBy([
        { column: 'e.created_at', order: 'asc' },
        { column: 'e.id', order: 'asc' },
      ])
      .select('e.entity_id', 'e.action', 'e.detail', 'e.created_at');
  const byTree = new Map<number, StatusChange[]>();
  for (const r of rows) {
    let status: unknown;
    try {
      status = (JSON.parse(r.detail) as { status?: unknown } | null)?.status;
    } catch {
      continue; // a detail that is not JSON names no status
    }
    if (typeof status !== 'string' || !(treeStatuses as readonly string[]).includes(status))
      continue;
    const id = Number(r.entity_id);
    const change: StatusChange = {
      on: String(r.created_at).slice(0, 10),
      status: status as StatusChange['status'],
      ...(r.action === 'create' ? { created: true } : {}),
    };
    byTree.set(id, [...(byTree.get(id) ?? []), change]);
  }
  return byTree;
}
