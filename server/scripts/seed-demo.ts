import type { Knex } from 'knex';
import { seed } from '../../seeds/01_demo';

/** Write the demo stand into an empty database. Returns whether it did. */
export async function seedDemoIfEmpty(db: Knex): Promise<boolean> {
  const [{ n }] = await db('users').count({ n: '*' });
  if (Number(n) > 0) return false;
  await seed(db);
  return true;
}
