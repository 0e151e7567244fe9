import fs from 'node:fs';
import type { Knex } from 'knex';
import { migrateLatest, openDb } from '../../server/db';
import { freshDatabase, track } from '../../tests/api/test-database';
import { seed } from '../01_demo';

/** A fresh test database (SQLite, or PostgreSQL with TEST_DATABASE_URL) with the demo, for tests. */
export async function seededDb(): Promise<{ db: Knex; ms: number; close: () => Promise<void> }> {
  const { target, dir } = await freshDatabase();
  const db = track(openDb(target));
  await migrateLatest(db);
  const t0 = performance.now();
  await seed(db);
  const ms = performance.now() - t0;
  return {
    db,
    ms,
    close: async () => {
      await db.destroy();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

export interface TreeRow {
  id: number;
  tag: string;
  species: string;
  lat: number | null;
  lng: number | null;
  status: string;
  updated_at: string;
}
export interface MeasurementDbRow {
  tree_id: number;
  season: number;
  measured_on: string;
  dbh_cm: number;
  crown_dieback_pct: number;
  confirmed_outlier: number | boolean;
}
export interface TapholeDbRow {
  tree_id: number;
  season: number;
  height_cm: number;
  azimuth_deg: number;
  depth_cm: number;
  bit_cm: number;
  collection: string;
  drilled_on: string;
  stain_hit: number;
}

/** One stand's register grouped per tree, for checks tree by tree. */
export async function standRecords(db: Knex, name: string) {
  const { id } = await db('sugarbushes').where({ name }).first('id');
  const trees: TreeRow[] = await db('trees').where({ sugarbush_id: id }).orderBy('tag');
  const ids = db('trees').where({ sugarbush_id: id }).select('id');
  const ms: MeasurementDbRow[] = await db('measurements')
    .whereIn('tree_id', ids)
    .orderBy(['tree_id', 'season']);
  const th: TapholeDbRow[] = await db('tapholes')
    .whereIn('tree_id', ids)
    .orderBy(['tree_id', 'season', 'id']);
  const group = <T extends { tree_id: number }>(rows: T[]) => {
    const out = new Map<number, T[]>(trees.map((t) => [t.id, []]));
    for (const r of rows) out.get(r.tree_id)!.push(r);
    return out;
  };
  const measurements = group(ms);
  const tapholes = group(th);
  const byTag = new Map(trees.map((t) => [t.tag, t]));
  return {
    sugarbushId: id as number,
    trees,
    allMeasurements: ms,
    allTapholes: th,
    tree: (tag: string) => {
      const t = byTag.get(tag);
      if (!t) throw new Error(`no tree ${tag}`);
      return { ...t, measurements: measurements.get(t.id)!, tapholes: tapholes.get(t.id)! };
    },
  };
}

/** Straight-line distance (cm) across the trunk between two holes' azimuths. */
export const chordCm = (dbhCm: number, a: number, b: number) => {
  const d = Math.abs(a - b) % 360;
  return dbhCm * Math.sin((Math.min(d, 360 - d) * Math.PI) / 360);
};
