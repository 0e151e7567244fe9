import { loadConfig } from '../config';
import { exitOnConfigError } from '../index';
import { restoreBackup } from '../modules/backups/restore-backup';
import { BackupError } from '../modules/backups/sqlite-file';

const usage =
  'Usage: npm run restore -- <backup folder or .sqlite file> [--force]\n' +
  'Stop the server first. --force restores although the server lock names a live process.';

/** `npm run restore <backup>`: check a backup, set the current data aside, put the backup in. */
try {
  const args = process.argv.slice(2);
  const force = args.includes('--force');
  const targets = args.filter((a) => a !== '--force');
  if (targets.length !== 1 || targets[0].startsWith('-')) {
    console.error(usage);
    process.exit(1);
  }
  const config = loadConfig();
  const done = await restoreBackup(config, targets[0], { force });
  console.log(`Restored ${targets[0]} into ${done.database}`);
  console.log(
    done.setAside
      ? `  the database that was there is kept as ${done.setAside}`
      : '  there was no database there before',
  );
  if (done.migrated > 0) console.log(`  migrated forward by ${done.migrated} migration(s)`);
  for (const line of done.files) console.log(`  ${line}`);
  console.log('Start the server again (npm start).');
} catch (err) {
  if (err instanceof BackupError) {
    console.error(`Not restored: ${err.message}`);
    process.exit(1);
  }
  exitOnConfigError(err);
}
