import type { Knex } from 'knex';
import type { MeasurementRow, TapholeRow, TreeRow } from './read-rows';
import { drilledHoleColumns } from '../tapholes/tapholes.repository';

/** Rows per statement: far below either engine's limit on bound values, short enough to interleave. */
export const BATCH = 400;

export function chunks<T>(xs: readonly T[], size = BATCH): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < xs.length; i += size) out.push(xs.slice(i, i + size));
  return out;
}

/**
 * Let other requests' callbacks run between two statements of a long write; with a pause (crash
 * tests only, `IMPORT_WRITE_PAUSE_MS`), wait that long as well.
 */
const breathe = (pauseMs: number) =>
  new Promise<void>((resolve) =>
    pauseMs > 0 ? setTimeout(resolve, pauseMs) : setImmediate(resolve),
  );

/** Told the rows written so far, after each batch. */
type Written = (rows: number) => void;

export interface StoredTree {
  id: number;
  tag: string;
  species: string;
  lat: number | null;
  lng: number | null;
  status: string;
}

export interface StoredMeasurement {
  treeId: number;
  measuredOn: string;
  dbhCm: number;
  crownDiebackPct: number | null;
  note: string | null;
}

export interface StoredTaphole {
  treeId: number;
  season: number;
  heightCm: number;
  azimuthDeg: number;
  depthCm: number;
  bitCm: number;
  collection: string;
}

export function importsRepository(db: Knex, opts: { writePauseMs?: number } = {}) {
  const pauseMs = opts.writePauseMs ?? 0;
  return {
    /** The stand's trees with these tags. */
    async treesByTag(
      sugarbushId: number,
      tags: readonly string[],
    ): Promise<Map<string, StoredTree>> {
      const found = new Map<string, StoredTree>();
      for (const part of chunks([...new Set(tags)])) {
        const rows = await db('trees')
          .where({ sugarbush_id: sugarbushId })
          .whereIn('tag', part)
          .select('id', 'tag', 'species', 'lat', 'lng', 'status');
        for (const r of rows)
          found.set(r.tag, { ...r, id: Number(r.id), lat: r.lat ?? null, lng: r.lng ?? null });
      }
      return found;
    },

    /** Standing readings (no later row corrects them) of these trees. */
    async measurementsOf(treeIds: readonly number[]): Promise<StoredMeasurement[]> {
      const out: StoredMeasurement[] = [];
      for (const part of chunks([...new Set(treeIds)])) {
        const rows = await db('measurements as m')
          .whereIn('m.tree_id', part)
          .whereNotExists(
            db('measurements as c').select(db.raw('1')).whereRaw('c.corrects_id = m.id'),
          )
          .select('m.tree_id', 'm.measured_on', 'm.dbh_cm', 'm.crown_dieback_pct', 'm.note');
        for (const r of rows)
          out.push({
            treeId: Number(r.tree_id),
            measuredOn: String(r.measured_on),
            dbhCm: Number(r.dbh_cm),
            crownDiebackPct: r.crown_dieback_pct === null ? null : Number(r.crown_dieback_pct),
            note: r.note ?? null,
          });
      }
      return out;
    },

    async tapholesOf(treeIds: readonly number[]): Promise<StoredTaphole[]> {
      const out: StoredTaphole[] = [];
      for (const part of chunks([...new Set(treeIds)])) {
        const rows = await db('tapholes')
          .whereIn('tree_id', part)
          .select(...drilledHoleColumns);
        for (const r of rows)
          out.push({
            treeId: Number(r.tree_id),
            season: Number(r.season),
            heightCm: Number(r.height_cm),
            azimuthDeg: Number(r.azimuth_deg),
            depthCm: Number(r.depth_cm),
            bitCm: Number(r.bit_cm),
            collection: String(r.collection),
          });
      }
      return out;
    },

    /** Insert the trees; their new ids. */
    async insertTrees(
      sugarbushId: number,
      rows: readonly TreeRow[],
      written: Written = () => undefined,
    ): Promise<number[]> {
      const ids: number[] = [];
      for (const part of chunks(rows)) {
        const made: { id: number }[] = await db('trees')
          .insert(
            part.map((r) => ({
              sugarbush_id: sugarbushId,
              tag: r.tag,
              species: r.species,
              lat: r.lat,
              lng: r.lng,
              status: r.status,
            })),
          )
          .returning(['id']);
        for (const m of made) ids.push(Number(m.id));
        written(ids.length);
        await breathe(pauseMs);
      }
      return ids;
    },

    async updateTree(id: number, r: TreeRow): Promise<void> {
      await db('trees').where({ id }).update({
        species: r.species,
        lat: r.lat,
        lng: r.lng,
        status: r.status,
        updated_at: new Date().toISOString(),
      });
    },

    async insertMeasurements(
      rows: readonly (MeasurementRow & { treeId: number })[],
      userId: number,
      written: Written = () => undefined,
    ): Promise<void> {
      let n = 0;
      for (const part of chunks(rows)) {
        await db('measurements').insert(
          part.map((r) => ({
            tree_id: r.treeId,
            measured_on: r.measuredOn,
            season: Number(r.measuredOn.slice(0, 4)),
            dbh_cm: r.dbhCm,
            crown_dieback_pct: r.crownDiebackPct,
            note: r.note,
            recorded_by: userId,
          })),
        );
        written((n += part.length));
        await breathe(pauseMs);
      }
    },

    async insertTapholes(
      rows: readonly (TapholeRow & { treeId: number })[],
      userId: number,
      written: Written = () => undefined,
    ): Promise<void> {
      let n = 0;
      for (const part of chunks(rows)) {
        await db('tapholes').insert(
          part.map((r) => ({
            tree_id: r.treeId,
            season: r.season,
            height_cm: r.heightCm,
            azimuth_deg: r.azimuthDeg,
            depth_cm: r.depthCm,
            bit_cm: r.bitCm,
            collection: r.collection,
            recorded_by: userId,
          })),
        );
        written((n += part.length));
        await breathe(pauseMs);
      }
    },
  };
}
