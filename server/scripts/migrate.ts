import { loadConfig } from '../config';
import { createDb, migrateLatest } from '../db';
import { exitOnConfigError } from '../index';

try {
  const config = loadConfig();
  const db = createDb(config.DATABASE_FILE);
  await migrateLatest(db);
  console.log(`Migrated ${config.DATABASE_FILE}`);
  await db.destroy();
} catch (err) {
  exitOnConfigError(err);
}
