import { loadConfig } from '../config';
import { describeDb, migrateLatest, openDb } from '../db';
import { exitOnConfigError } from '../index';

try {
  const config = loadConfig();
  const db = openDb(config.database);
  await migrateLatest(db);
  console.log(`Migrated ${describeDb(config.database)}`);
  await db.destroy();
} catch (err) {
  exitOnConfigError(err);
}
