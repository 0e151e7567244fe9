import { once } from 'node:events';
import type { Writable } from 'node:stream';
import { stringify } from 'csv-stringify';
import type { AppContext } from '../../context';
import { exportHeaders, type ImportKind } from '../../../shared/schemas/imports';
import { exportsRepository, type RegisterRow } from './exports.repository';

type Cell = string | number | null;

/** `Owl Ledge` → `owl-ledge-trees.csv`. */
export function exportFileName(standName: string, what: string, ext: string) {
  const slug =
    standName
      .toLowerCase()
      .normalize('NFKD')
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '') || 'stand';
  return `${slug}-${what}.${ext}`;
}

/** Write, and wait when the reader is slower than the database (backpressure). */
async function put(out: Writable, chunk: string | Cell[]) {
  if (!out.write(chunk)) await once(out, 'drain');
}

/**
 * Text a spreadsheet would run as a formula (`=`, `+`, `-`, `@` first) goes out behind a `'`, as
 * spreadsheets themselves mark text; the import takes the mark off again.
 */
export const asText = (value: string | null): Cell =>
  value !== null && /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;

const num = (v: unknown): Cell => (v === null || v === undefined ? null : Number(v));

/** The rows a kind exports for one page of trees, in the order of the import header. */
async function rowsOf(
  repo: ReturnType<typeof exportsRepository>,
  kind: ImportKind,
  trees: RegisterRow[],
): Promise<Cell[][]> {
  if (kind === 'trees')
    return trees.map((t) => [t.tag, t.species, num(t.lat), num(t.lng), t.status]);
  const tagOf = new Map(trees.map((t) => [Number(t.id), t.tag]));
  const order = new Map(trees.map((t, i) => [Number(t.id), i]));
  const ids = trees.map((t) => t.id);
  const rows =
    kind === 'measurements'
      ? (await repo.measurementsOf(ids)).map((m) => ({
          treeId: Number(m.tree_id),
          cells: [m.measured_on, num(m.dbh_cm), num(m.crown_dieback_pct), asText(m.note ?? null)],
        }))
      : (await repo.tapholesOf(ids)).map((h) => ({
          treeId: Number(h.tree_id),
          cells: [
            num(h.season),
            num(h.height_cm),
            num(h.azimuth_deg),
            num(h.depth_cm),
            num(h.bit_cm),
            h.collection,
          ],
        }));
  // Tree by tree in tag order; within a tree, as the query sorted them (a stable sort).
  rows.sort((a, b) => order.get(a.treeId)! - order.get(b.treeId)!);
  return rows.map((r) => [asText(tagOf.get(r.treeId)!), ...r.cells] as Cell[]);
}

export function exportsService(ctx: AppContext) {
  const repo = exportsRepository(ctx.db);
  return {
    standName: (sugarbushId: number) => repo.standName(sugarbushId),

    /** A kind's CSV, with the header it imports by, written page by page into `out`. */
    async csv(sugarbushId: number, kind: ImportKind, out: Writable): Promise<void> {
      const csv = stringify({ header: true, columns: [...exportHeaders[kind]] });
      csv.pipe(out);
      for await (const trees of repo.treePages(sugarbushId))
        for (const row of await rowsOf(repo, kind, trees)) await put(csv, row);
      csv.end();
      await once(csv, 'end');
    },

    /** The register as a GeoJSON FeatureCollection of points (null geometry where no position). */
    async geojson(sugarbushId: number, out: Writable): Promise<void> {
      await put(out, '{"type":"FeatureCollection","features":[');
      let first = true;
      for await (const trees of repo.treePages(sugarbushId)) {
        const text = trees
          .map((t) =>
            JSON.stringify({
              type: 'Feature',
              id: Number(t.id),
              geometry:
                t.lat === null || t.lng === null
                  ? null
                  : { type: 'Point', coordinates: [Number(t.lng), Number(t.lat)] },
              properties: {
                tag: t.tag,
                species: t.species,
                lat: num(t.lat),
                lng: num(t.lng),
                status: t.status,
                latestDbhCm: num(t.latest_dbh_cm),
                latestMeasuredOn: t.latest_measured_on ?? null,
                latestCrownDiebackPct: num(t.latest_crown_dieback_pct),
              },
            }),
          )
          .join(',\n');
        await put(out, `${first ? '\n' : ',\n'}${text}`);
        first = false;
      }
      out.end(']}\n');
    },
  };
}
