import type { Knex } from 'knex';
import seedrandom from 'seedrandom';
import { insideRing, polygonGeoJson, toLatLng, type XY } from '../../seeds/demo/geo';
import { hashPassword } from '../../server/modules/auth/password';

const BIT_CM = (5 / 16) * 2.54;
const DEPTH_CM = 2 * 2.54;

/** The invented stand's south-west-of-centre origin; positions are metres east/north of it. */
const ORIGIN = { lat: 44.31, lng: -72.615 };

/** An irregular boundary of about 1 km² (24 vertices around the origin). */
function boundaryRing(): XY[] {
  return Array.from({ length: 24 }, (_, i) => {
    const a = (i / 24) * Math.PI * 2;
    const r = 560 * (1 + 0.08 * Math.sin(3 * a + 1) + 0.05 * Math.cos(5 * a));
    return [r * Math.cos(a), r * Math.sin(a)] as const;
  });
}

/**
 * Where the trees stand: clumps of maples over a thinner scatter, none in a wet hollow, on a rock
 * ledge or in the sugar road's bed, and tagged in the order a crew walks east–west strips. A
 * handful of points land a few metres over the line, as GPS fixes near an edge do.
 */
function standLayout(count: number, ring: readonly XY[]): XY[] {
  const rng = seedrandom('clearwood-bench-layout');
  const clumps = Array.from({ length: 48 }, () => ({
    x: (rng() - 0.5) * 1000,
    y: (rng() - 0.5) * 1000,
    r: 30 + rng() * 70,
  }));
  const density = (x: number, y: number) => {
    if (((x + 180) / 120) ** 2 + ((y - 150) / 70) ** 2 < 1) return 0; // the wet hollow
    if (Math.abs(x - 220) < 40 && Math.abs(y + 260) < 25) return 0; // the ledge
    if (Math.abs(y - 0.35 * x + 40) < 4) return 0; // the road, 8 m wide
    let d = 0.2;
    for (const c of clumps) d += Math.exp(-((x - c.x) ** 2 + (y - c.y) ** 2) / (c.r * c.r));
    return Math.min(d, 1);
  };
  const points: XY[] = [];
  for (let guard = 0; points.length < count && guard < count * 50; guard++) {
    const p: XY = [(rng() - 0.5) * 1300, (rng() - 0.5) * 1300];
    const over = !insideRing(ring, p);
    if (over ? rng() < 0.998 : rng() > density(p[0], p[1])) continue;
    points.push(p);
  }
  const STRIP_M = 25;
  const strip = (p: XY) => Math.floor((p[1] + 650) / STRIP_M);
  return points.sort((a, b) => strip(a) - strip(b) || (strip(a) % 2 ? b[0] - a[0] : a[0] - b[0]));
}

/**
 * A large invented stand for benchmarks: `trees` maples laid out over about 1 km² inside a
 * boundary, with `seasons` autumn measurements and the tapholes a careful tapper would have
 * drilled each season (1 tap at 12–18 in, 2 above).
 */
export async function writeSyntheticStand(
  db: Knex,
  opts: { trees: number; seasons: number; lastSeason: number },
) {
  const rng = seedrandom('clearwood-bench');
  const ring = boundaryRing();
  const layout = standLayout(opts.trees, ring);
  const [stand] = await db('sugarbushes')
    .insert({
      name: 'Bench Stand',
      profile: 'conservative',
      boundary: polygonGeoJson(ORIGIN, ring),
    })
    .returning('id');
  const sugarbushId = stand.id as number;
  const firstSeason = opts.lastSeason - opts.seasons + 1;
  const chunk = <T>(rows: T[], size: number) =>
    Array.from({ length: Math.ceil(rows.length / size) }, (_, i) =>
      rows.slice(i * size, (i + 1) * size),
    );

  await db.transaction(async (trx) => {
    const treeRows = Array.from({ length: opts.trees }, (_, i) => {
      const species = rng() < 0.85 ? 'sugar-maple' : 'red-maple';
      // Two draws of a metre or so of GPS scatter; they also keep the records' draws as they were.
      const [x, y] = layout[i % layout.length];
      const at = toLatLng(ORIGIN, [x + (rng() - 0.5) * 2, y + (rng() - 0.5) * 2]);
      return {
        sugarbush_id: sugarbushId,
        tag: `B-${String(i + 1).padStart(5, '0')}`,
        species,
        lat: Math.round(at.lat * 1e7) / 1e7,
        lng: Math.round(at.lng * 1e7) / 1e7,
        status: rng() < 0.01 ? 'dead' : 'active',
      };
    });
    for (const part of chunk(treeRows, 150)) await trx('trees').insert(part);
    const ids: { id: number }[] = await trx('trees')
      .where({ sugarbush_id: sugarbushId })
      .orderBy('id')
      .select('id');

    let measurements: Record<string, unknown>[] = [];
    let holes: Record<string, unknown>[] = [];
    const flush = async () => {
      for (const part of chunk(measurements, 120)) await trx('measurements').insert(part);
      for (const part of chunk(holes, 80)) await trx('tapholes').insert(part);
      measurements = [];
      holes = [];
    };
    for (const { id } of ids) {
      let dbh = 18 + rng() * 45;
      const rate = 0.2 + rng() * 0.7;
      let azimuth = 120 + rng() * 120;
      for (let s = firstSeason; s <= opts.lastSeason; s++) {
        const taps = dbh >= 45.72 ? 2 : dbh >= 30.48 ? 1 : 0;
        for (let k = 0; k < taps; k++) {
          holes.push({
            tree_id: id,
            season: s,
            height_cm: 70 + ((s * 37 + k * 41) % 70),
            azimuth_deg: (azimuth + k * 180) % 360,
            depth_cm: DEPTH_CM,
            bit_cm: BIT_CM,
            collection: 'vacuum',
          });
        }
        azimuth = (azimuth + 40 + rng() * 30) % 360;
        dbh += rate;
        measurements.push({
          tree_id: id,
          measured_on: `${s}-10-0${1 + Math.floor(rng() * 9)}`,
          season: s,
          dbh_cm: Math.round(dbh * 10) / 10,
          crown_dieback_pct: rng() < 0.9 ? 0 : 10,
        });
      }
      if (measurements.length > 5000) await flush();
    }
    await flush();
  });
  return sugarbushId;
}

/** A user who owns the stand, so a browser can sign in and open its map. */
export async function writeStandOwner(
  db: Knex,
  sugarbushId: number,
  who: { email: string; password: string },
) {
  const [user] = await db('users')
    .insert({
      email: who.email,
      name: 'Bench Owner',
      password_hash: await hashPassword(who.password),
      unit_system: 'metric',
    })
    .returning('id');
  await db('memberships').insert({ user_id: user.id, sugarbush_id: sugarbushId, role: 'owner' });
}
