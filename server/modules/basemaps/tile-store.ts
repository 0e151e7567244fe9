import fs from 'node:fs';
import Database from 'better-sqlite3';

/** One tile by its TMS address; kept on the file's lookup index (`ensureTileIndexes`). */
export const TILE_LOOKUP_SQL =
  'select tile_data from tiles where zoom_level = ? and tile_column = ? and tile_row = ?';

interface OpenFile {
  db: Database.Database;
  tile: Database.Statement<[number, number, number], Buffer>;
  mtimeMs: number;
}

/**
 * Read-only handles on basemap files, one per file, with the tile lookup prepared once. At most
 * `capacity` stay open; the least recently used is closed first. A file replaced on disk (new
 * mtime) is reopened.
 */
export function tileStore(capacity = 16) {
  const open = new Map<string, OpenFile>();

  function handle(file: string): OpenFile {
    const mtimeMs = fs.statSync(file).mtimeMs;
    let entry = open.get(file);
    if (entry && entry.mtimeMs !== mtimeMs) {
      entry.db.close();
      entry = undefined;
    }
    if (!entry) {
      const db = new Database(file, { readonly: true, fileMustExist: true });
      const tile = db.prepare<[number, number, number], Buffer>(TILE_LOOKUP_SQL).pluck();
      entry = { db, tile, mtimeMs };
    }
    open.delete(file); // re-insert: Map order is the recency order
    open.set(file, entry);
    while (open.size > capacity) {
      const [oldest, stale] = open.entries().next().value!;
      stale.db.close();
      open.delete(oldest);
    }
    return entry;
  }

  return {
    /** The tile at TMS coordinates (row counted from the south), or undefined; and the file's mtime. */
    read(file: string, z: number, x: number, tmsRow: number) {
      const entry = handle(file);
      return { data: entry.tile.get(z, x, tmsRow), mtimeMs: entry.mtimeMs };
    },
    /** The file's modification time, opening it if needed (for a conditional request). */
    mtimeOf: (file: string) => handle(file).mtimeMs,
    close() {
      for (const entry of open.values()) entry.db.close();
      open.clear();
    },
  };
}

export type TileStore = ReturnType<typeof tileStore>;
