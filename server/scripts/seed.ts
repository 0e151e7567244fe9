import { loadConfig } from '../config';
import { openDb, migrateLatest } from '../db';
import { exitOnConfigError } from '../index';
import { seedDemoIfEmpty } from './seed-demo';

try {
  const config = loadConfig();
  const db = openDb(config.database);
  await migrateLatest(db);
  const seeded = await seedDemoIfEmpty(db);
  console.log(seeded ? 'Demo data written.' : 'The database already has users: nothing seeded.');
  await db.destroy();
} catch (err) {
  exitOnConfigError(err);
}
