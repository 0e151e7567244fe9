import { loadConfig } from '../config';
import { exitOnConfigError } from '../index';
import { BackupError } from '../modules/backups/sqlite-file';
import { takeBackup } from '../modules/backups/take-backup';

/** `npm run backup`: an online, checked copy of the SQLite file and the uploaded files. */
try {
  const config = loadConfig();
  const { dir, manifest, removed } = await takeBackup(config);
  const { photos, basemaps } = manifest.files;
  console.log(`Backed up ${manifest.source.database} to ${dir}`);
  console.log(
    `  database ${manifest.database.bytes} bytes, integrity ${manifest.database.integrity}, ` +
      `at migration ${manifest.database.migration ?? '(none)'}`,
  );
  console.log(
    `  rows: ${Object.entries(manifest.rows)
      .map(([table, n]) => `${table} ${n}`)
      .join(', ')}`,
  );
  console.log(
    `  files: ${photos ? `${photos.count} photos` : 'photos not copied (S3)'}, ` +
      `${basemaps.count} basemaps`,
  );
  for (const note of manifest.notes) console.log(`  ${note}`);
  if (removed.length > 0)
    console.log(`  removed ${removed.length} older backup(s), keeping ${config.BACKUP_KEEP}`);
} catch (err) {
  if (err instanceof BackupError) {
    console.error(err.message);
    process.exit(1);
  }
  exitOnConfigError(err);
}
