/**
 * Large invented stands for `npm run bench`, written straight into an SQLite file with prepared
 * statements in one transaction, and kept in a cache under the temp dir so that a re-run skips
 * the writing. Nothing here is demo data: the stand, its owner and its trees are made up.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import { pathToFileURL } from 'node:url';
import Database from 'better-sqlite3';
import type { Knex } from 'knex';
import seedrandom from 'seedrandom';
import { insideRing, polygonGeoJson, toLatLng, type XY } from '../../seeds/demo/geo';
import { createDb, migrationsDir } from '../../server/db';
import { hashPassword } from '../../server/modules/auth/password';

/** Bump when the rows written change; cached files of other versions are deleted. */
export const GENERATOR_VERSION = 3;

/**
 * The schema the rows are written against: the migrations up to this one. The server migrates
 * the file forward from there on start, as it would a real database written before later
 * migrations (which must bring such rows along: versions, derived columns).
 */
const SCHEMA_POINT = '20261202140200_custom_profiles_stored_checked.ts';

export const BENCH_OWNER = { email: 'bench-owner@stand.example', password: 'maple-demo-2027' };

const BIT_CM = (5 / 16) * 2.54;
const DEPTH_CM = 2 * 2.54;

/** The invented stand's origin; positions are metres east/north of it. */
const ORIGIN = { lat: 44.31, lng: -72.615 };

/**
 * An irregular boundary around the origin: about 1 km² for 20,000 trees, growing with the stand
 * so that the trees per hectare stay those of a managed sugarbush (24 vertices).
 */
function boundaryRing(scale: number): XY[] {
  return Array.from({ length: 24 }, (_, i) => {
    const a = (i / 24) * Math.PI * 2;
    const r = 560 * scale * (1 + 0.08 * Math.sin(3 * a + 1) + 0.05 * Math.cos(5 * a));
    return [r * Math.cos(a), r * Math.sin(a)] as const;
  });
}

/**
 * Where the trees stand: clumps of maples over a thinner scatter, none in a wet hollow, on a rock
 * ledge or in the sugar road's bed, and tagged in the order a crew walks east–west strips. A
 * handful of points land a few metres over the line, as GPS fixes near an edge do.
 */
function standLayout(count: number, ring: readonly XY[], scale: number): XY[] {
  const rng = seedrandom('clearwood-bench-layout');
  const clumps = Array.from({ length: Math.round(48 * scale * scale) }, () => ({
    x: (rng() - 0.5) * 1000 * scale,
    y: (rng() - 0.5) * 1000 * scale,
    r: 30 + rng() * 70,
  }));
  const density = (x: number, y: number) => {
    const [u, v] = [x / scale, y / scale];
    if (((u + 180) / 120) ** 2 + ((v - 150) / 70) ** 2 < 1) return 0; // the wet hollow
    if (Math.abs(u - 220) < 40 && Math.abs(v + 260) < 25) return 0; // the ledge
    if (Math.abs(y - 0.35 * x + 40 * scale) < 4) return 0; // the road, 8 m wide
    let d = 0.2;
    for (const c of clumps) {
      const dx = x - c.x;
      const dy = y - c.y;
      if (Math.abs(dx) < 4 * c.r && Math.abs(dy) < 4 * c.r)
        d += Math.exp(-(dx * dx + dy * dy) / (c.r * c.r));
    }
    return Math.min(d, 1);
  };
  const points: XY[] = [];
  const span = 1300 * scale;
  for (let guard = 0; points.length < count && guard < count * 50; guard++) {
    const p: XY = [(rng() - 0.5) * span, (rng() - 0.5) * span];
    const over = !insideRing(ring, p);
    if (over ? rng() < 0.998 : rng() > density(p[0], p[1])) continue;
    points.push(p);
  }
  const STRIP_M = 25;
  const strip = (p: XY) => Math.floor((p[1] + span / 2) / STRIP_M);
  return points.sort((a, b) => strip(a) - strip(b) || (strip(a) % 2 ? b[0] - a[0] : a[0] - b[0]));
}

export interface StandOptions {
  trees: number;
  seasons: number;
  /** The last season with measurements and tapholes (the one before the season advised). */
  lastSeason: number;
}

/**
 * Write the stand, its owner (`BENCH_OWNER`) and `seasons` autumn measurements and the tapholes
 * a careful tapper would have drilled each season (1 tap at 12–18 in, 2 above) into an open
 * database at `SCHEMA_POINT`. Returns the stand's id.
 */
function writeStand(sqlite: Database.Database, opts: StandOptions, passwordHash: string): number {
  const rng = seedrandom('clearwood-bench');
  const scale = Math.sqrt(Math.max(1, opts.trees / 20_000));
  const ring = boundaryRing(scale);
  const layout = standLayout(opts.trees, ring, scale);
  const firstSeason = opts.lastSeason - opts.seasons + 1;

  const insertTree = sqlite.prepare(
    'insert into trees (sugarbush_id, tag, species, lat, lng, status) values (?, ?, ?, ?, ?, ?)',
  );
  const insertMeasurement = sqlite.prepare(
    'insert into measurements (tree_id, measured_on, season, dbh_cm, crown_dieback_pct) values (?, ?, ?, ?, ?)',
  );
  const insertHole = sqlite.prepare(
    `insert into tapholes (tree_id, season, height_cm, azimuth_deg, depth_cm, bit_cm, collection)
     values (?, ?, ?, ?, ?, ?, 'vacuum')`,
  );

  return sqlite.transaction(() => {
    const standId = Number(
      sqlite
        .prepare('insert into sugarbushes (name, profile, boundary) values (?, ?, ?)')
        .run('Bench Stand', 'conservative', polygonGeoJson(ORIGIN, ring)).lastInsertRowid,
    );
    const userId = Number(
      sqlite
        .prepare('insert into users (email, name, password_hash, unit_system) values (?, ?, ?, ?)')
        .run(BENCH_OWNER.email, 'Bench Owner', passwordHash, 'metric').lastInsertRowid,
    );
    sqlite
      .prepare('insert into memberships (user_id, sugarbush_id, role) values (?, ?, ?)')
      .run(userId, standId, 'owner');

    for (let i = 0; i < opts.trees; i++) {
      const species = rng() < 0.85 ? 'sugar-maple' : 'red-maple';
      // A metre or so of GPS scatter.
      const [x, y] = layout[i % layout.length];
      const at = toLatLng(ORIGIN, [x + (rng() - 0.5) * 2, y + (rng() - 0.5) * 2]);
      const treeId = Number(
        insertTree.run(
          standId,
          `B-${String(i + 1).padStart(6, '0')}`,
          species,
          Math.round(at.lat * 1e7) / 1e7,
          Math.round(at.lng * 1e7) / 1e7,
          rng() < 0.01 ? 'dead' : 'active',
        ).lastInsertRowid,
      );
      let dbh = 18 + rng() * 45;
      const rate = 0.2 + rng() * 0.7;
      let azimuth = 120 + rng() * 120;
      for (let s = firstSeason; s <= opts.lastSeason; s++) {
        const taps = dbh >= 45.72 ? 2 : dbh >= 30.48 ? 1 : 0;
        for (let k = 0; k < taps; k++) {
          insertHole.run(
            treeId,
            s,
            70 + ((s * 37 + k * 41) % 70),
            (azimuth + k * 180) % 360,
            DEPTH_CM,
            BIT_CM,
          );
        }
        azimuth = (azimuth + 40 + rng() * 30) % 360;
        dbh += rate;
        insertMeasurement.run(
          treeId,
          `${s}-10-0${1 + Math.floor(rng() * 9)}`,
          s,
          Math.round(dbh * 10) / 10,
          rng() < 0.9 ? 0 : 10,
        );
      }
    }
    return standId;
  })();
}

/** The migrations up to the generator's schema point, loaded as `server/db.ts` loads them all. */
async function migrateToSchemaPoint(db: Knex) {
  const names = fs
    .readdirSync(migrationsDir)
    .filter((f) => /^\d{14}_[\w-]+\.ts$/.test(f) && f <= SCHEMA_POINT)
    .sort();
  if (!names.includes(SCHEMA_POINT)) throw new Error(`Migration ${SCHEMA_POINT} is missing`);
  await db.migrate.latest({
    migrationSource: {
      getMigrations: async () => names,
      getMigrationName: (name: string) => name,
      getMigration: (name: string) =>
        import(pathToFileURL(path.join(migrationsDir, name)).href) as Promise<Knex.Migration>,
    },
  });
}

export const benchCacheDir = () => path.join(os.tmpdir(), 'clearwood-bench-cache');

export interface CachedStand {
  /** The cached file: copy it before writing to it. */
  file: string;
  standId: number;
  /** Seconds spent writing it in this run, or null when it came from the cache. */
  generatedS: number | null;
  /** Seconds it took to write when it was written (this run or an earlier one). */
  writtenInS: number | null;
  measurements: number;
  tapholes: number;
}

/**
 * The stand's database file, from the cache when a file of this generator version and these
 * options is there, else written now (to a temporary name, renamed when complete).
 */
export async function syntheticStandFile(opts: StandOptions): Promise<CachedStand> {
  const dir = benchCacheDir();
  fs.mkdirSync(dir, { recursive: true });
  const prefix = `stand-v${GENERATOR_VERSION}-`;
  for (const f of fs.readdirSync(dir))
    if (f.startsWith('stand-v') && !f.startsWith(prefix)) fs.rmSync(path.join(dir, f));
  const file = path.join(dir, `${prefix}${opts.trees}t-${opts.seasons}s-${opts.lastSeason}.sqlite`);

  let generatedS: number | null = null;
  if (!fs.existsSync(file)) {
    const t0 = performance.now();
    const partial = `${file}.${process.pid}.partial`;
    fs.rmSync(partial, { force: true });
    const knex = createDb(partial);
    try {
      await migrateToSchemaPoint(knex);
    } finally {
      await knex.destroy();
    }
    const sqlite = new Database(partial);
    try {
      // A throw-away file until it is complete: no journal, no syncing.
      sqlite.pragma('journal_mode = OFF');
      sqlite.pragma('synchronous = OFF');
      sqlite.pragma('foreign_keys = ON');
      sqlite.pragma('cache_size = -262144');
      writeStand(sqlite, opts, await hashPassword(BENCH_OWNER.password));
      sqlite.pragma('journal_mode = DELETE');
    } finally {
      sqlite.close();
    }
    for (const suffix of ['-wal', '-shm']) fs.rmSync(partial + suffix, { force: true });
    generatedS = (performance.now() - t0) / 1000;
    fs.writeFileSync(`${file}.json`, JSON.stringify({ writtenInS: generatedS }));
    fs.renameSync(partial, file);
  }
  let writtenInS: number | null = generatedS;
  try {
    writtenInS ??= JSON.parse(fs.readFileSync(`${file}.json`, 'utf8')).writtenInS;
  } catch {
    // written before the time was kept beside it
  }

  const sqlite = new Database(file, { readonly: true });
  try {
    const count = (sql: string) => Number(sqlite.prepare(sql).pluck().get());
    return {
      file,
      generatedS,
      writtenInS,
      standId: count("select id from sugarbushes where name = 'Bench Stand'"),
      measurements: count('select count(*) from measurements'),
      tapholes: count('select count(*) from tapholes'),
    };
  } finally {
    sqlite.close();
  }
}
