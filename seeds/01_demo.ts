import type { Knex } from 'knex';
import { copyLatestMeasurements } from '../server/modules/advice/refresh-trees';
import { hashPassword } from '../server/modules/auth/password';
import { buildDemo } from './demo/demo';
import { DEMO_PASSWORD, DEMO_USERS } from './demo/people';
import { writeDemo } from './demo/write';

/**
 * The Clearwood demo: Fernside Maple Co-op's Owl Ledge sugarbush (about 1,200 tagged maples,
 * seasons 2018–2026, a consultant's notes) and a small second stand, Cobble Run, of another owner.
 * Everything is generated from a fixed seed, so every run writes the same trees and records.
 */
export { DEMO_PASSWORD, DEMO_USERS };
export { DEMO_PROBLEM_TAGS } from './demo/problems';
export { DEMO_SEED } from './demo/random';

export async function seed(knex: Knex): Promise<void> {
  const stands = buildDemo();
  const hashes = await Promise.all(DEMO_USERS.map(() => hashPassword(DEMO_PASSWORD)));
  await knex.transaction(async (trx) => {
    await writeDemo(trx, stands, hashes);
    // Written in bulk: the register's latest measurements follow; advice is made on first read.
    for (const { id } of await trx('sugarbushes').select('id'))
      await copyLatestMeasurements(trx, { sugarbushId: id });
  });
}
