/**
 * The floor the recompute figures are set against: the pure advisor run over a whole stand on
 * one thread (`planStand`), with the stand's record read straight from the database file.
 */
import { performance } from 'node:perf_hooks';
import Database from 'better-sqlite3';
import { planStand, type StandTree } from '../../shared/rules/index';

interface TreeRow {
  id: number;
  tag: string;
  species: StandTree['species'];
  status: StandTree['status'];
}

/** The stand's standing record: measurements no later row corrects, and every taphole. */
export function readStand(file: string, sugarbushId: number): StandTree[] {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    const trees = db
      .prepare('select id, tag, species, status from trees where sugarbush_id = ? order by tag')
      .all(sugarbushId) as TreeRow[];
    type Measurement = StandTree['measurements'][number];
    type Hole = StandTree['tapholes'][number];
    const byId = new Map<number, StandTree & { measurements: Measurement[]; tapholes: Hole[] }>();
    for (const t of trees) byId.set(t.id, { ...t, treeId: t.id, measurements: [], tapholes: [] });
    const measurements = db
      .prepare(
        `select m.tree_id, m.measured_on, m.dbh_cm, m.crown_dieback_pct, m.confirmed_outlier
         from measurements m join trees t on t.id = m.tree_id
         where t.sugarbush_id = ?
           and not exists (select 1 from measurements c where c.corrects_id = m.id)
         order by m.tree_id, m.measured_on, m.id`,
      )
      .raw()
      .iterate(sugarbushId) as IterableIterator<[number, string, number, number | null, number]>;
    for (const [treeId, measuredOn, dbhCm, crownDiebackPct, confirmed] of measurements)
      byId.get(treeId)?.measurements.push({
        measuredOn,
        dbhCm,
        crownDiebackPct,
        ...(confirmed ? { confirmedOutlier: true } : {}),
      });
    const holes = db
      .prepare(
        `select h.tree_id, h.season, h.height_cm, h.azimuth_deg, h.depth_cm, h.bit_cm, h.collection
         from tapholes h join trees t on t.id = h.tree_id
         where t.sugarbush_id = ?
         order by h.tree_id, h.season, h.id`,
      )
      .raw()
      .iterate(sugarbushId) as IterableIterator<
      [number, number, number, number, number, number, StandTree['tapholes'][number]['collection']]
    >;
    for (const [treeId, season, heightCm, azimuthDeg, depthCm, bitCm, collection] of holes)
      byId.get(treeId)?.tapholes.push({ season, heightCm, azimuthDeg, depthCm, bitCm, collection });
    return trees.map((t) => byId.get(t.id)!);
  } finally {
    db.close();
  }
}

export interface StandSettings {
  profile: string;
  sunnyAzimuthDeg: number;
}

export function standSettings(file: string, sugarbushId: number): StandSettings {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    const row = db
      .prepare('select profile, sunny_azimuth_deg from sugarbushes where id = ?')
      .get(sugarbushId) as { profile: string; sunny_azimuth_deg: number };
    return { profile: row.profile, sunnyAzimuthDeg: row.sunny_azimuth_deg };
  } finally {
    db.close();
  }
}

/** Milliseconds for one single-threaded `planStand` of the whole stand (the better of `runs`). */
export function timePlanStand(
  trees: readonly StandTree[],
  opts: { season: number; profile: string; sunnyAzimuthDeg: number },
  runs = 1,
) {
  let best = Infinity;
  let taps = 0;
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    const plan = planStand(trees, opts);
    best = Math.min(best, performance.now() - t0);
    taps = plan.totals.taps;
  }
  return { ms: best, taps };
}
