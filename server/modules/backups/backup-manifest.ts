import type { FileCount } from './stored-files';

/** `manifest.json` in every backup folder: what was copied, from where, and what it held. */
export interface BackupManifest {
  format: 'clearwood-backup/1';
  takenAt: string;
  source: { database: string; photos: string | null; basemaps: string };
  database: {
    file: string;
    bytes: number;
    integrity: string;
    /** The newest migration the copy has run (restores migrate forward from it). */
    migration: string | null;
    migrations: number;
  };
  rows: Record<string, number>;
  files: { photos: FileCount | null; basemaps: FileCount };
  notes: string[];
}

export const MANIFEST_FILE = 'manifest.json';
export const DATABASE_COPY = 'clearwood.sqlite';

/** Backup folders are named by their UTC instant, so their names sort as their times do. */
export const backupName = (at: Date) =>
  `clearwood-${at
    .toISOString()
    .replace(/[-:]/g, '')
    .replace(/\.\d{3}Z$/, 'Z')}`;
export const BACKUP_NAME = /^clearwood-\d{8}T\d{6}Z$/;
