import type { Knex } from 'knex';
import seedrandom from 'seedrandom';

const BIT_CM = (5 / 16) * 2.54;
const DEPTH_CM = 2 * 2.54;

/**
 * A large invented stand for benchmarks: `trees` maples with `seasons` autumn measurements and the
 * tapholes a careful tapper would have drilled each season (1 tap at 12–18 in, 2 above).
 */
export async function writeSyntheticStand(
  db: Knex,
  opts: { trees: number; seasons: number; lastSeason: number },
) {
  const rng = seedrandom('clearwood-bench');
  const [stand] = await db('sugarbushes')
    .insert({ name: 'Bench Stand', profile: 'conservative' })
    .returning('id');
  const sugarbushId = stand.id as number;
  const firstSeason = opts.lastSeason - opts.seasons + 1;
  const chunk = <T>(rows: T[], size: number) =>
    Array.from({ length: Math.ceil(rows.length / size) }, (_, i) =>
      rows.slice(i * size, (i + 1) * size),
    );

  await db.transaction(async (trx) => {
    const treeRows = Array.from({ length: opts.trees }, (_, i) => ({
      sugarbush_id: sugarbushId,
      tag: `B-${String(i + 1).padStart(5, '0')}`,
      species: rng() < 0.85 ? 'sugar-maple' : 'red-maple',
      lat: 44.3 + rng() * 0.02,
      lng: -72.6 - rng() * 0.03,
      status: rng() < 0.01 ? 'dead' : 'active',
    }));
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
