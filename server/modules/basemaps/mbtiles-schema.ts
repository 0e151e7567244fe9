import type Database from 'better-sqlite3';
import { AppError } from '../../errors';

const refuse = (message: string) => new AppError(400, 'not-mbtiles', message);

interface SchemaEntry {
  type: string;
  name: string;
  sql: string | null;
}

/**
 * The one view an MBTiles file may hold instead of a `tiles` table: the deduplicated `map` and
 * `images` pair joined on `tile_id`, as tile tools write it. Compared after folding case, quotes,
 * white space and aliases that only repeat the column's own name.
 */
const STANDARD_VIEW =
  /^create view tiles as select map\.zoom_level, map\.tile_column, map\.tile_row, images\.tile_data from map (?:inner |left )?join images on (?:images\.tile_id = map\.tile_id|map\.tile_id = images\.tile_id)$/;

export function normaliseViewSql(sql: string): string {
  return sql
    .toLowerCase()
    .replace(/["`[\]]/g, '')
    .replace(/\s+/g, ' ')
    .replace(/\s*,\s*/g, ', ')
    .replace(/\s*=\s*/g, ' = ')
    .replace(/\b(\w+)\.(\w+) as \2\b/g, '$1.$2')
    .replace(/\s*;\s*$/, '')
    .trim();
}

/**
 * Accept only what serving a tile needs, so that no uploaded file can make a tile lookup run an
 * arbitrary query: `metadata` a plain table, and `tiles` a plain table or the standard view over
 * plain `map` and `images` tables. Returns the tables a tile lookup reads.
 */
export function checkMbtilesSchema(db: Database.Database): 'table' | 'view' {
  const entries = db
    .prepare("select type, name, sql from sqlite_master where type in ('table', 'view')")
    .all() as SchemaEntry[];
  const byName = new Map(entries.map((e) => [e.name.toLowerCase(), e]));
  const plainTable = (name: string) => {
    const e = byName.get(name);
    return !!e && e.type === 'table' && !/^\s*create\s+virtual\b/i.test(e.sql ?? '');
  };

  if (!byName.has('metadata'))
    throw refuse('The file is an SQLite database but has no metadata table');
  if (!plainTable('metadata'))
    throw refuse('The metadata of an MBTiles file must be a plain table');
  const tiles = byName.get('tiles');
  if (!tiles) throw refuse('The file is an SQLite database but has no tiles table');
  if (plainTable('tiles')) return 'table';
  if (tiles.type === 'view' && STANDARD_VIEW.test(normaliseViewSql(tiles.sql ?? ''))) {
    if (plainTable('map') && plainTable('images')) return 'view';
    throw refuse('The tiles view must read plain map and images tables');
  }
  throw refuse(
    'The tiles must be a plain table, or the standard view of map and images: this file holds something else',
  );
}

/**
 * Indexes that keep one tile lookup to a few page reads, added to the upload (Clearwood's own
 * copy) when the file lacks them.
 */
export function ensureTileIndexes(db: Database.Database, kind: 'table' | 'view'): void {
  if (kind === 'table') {
    db.exec(
      'create index if not exists clearwood_tile_lookup on tiles (zoom_level, tile_column, tile_row)',
    );
  } else {
    db.exec(
      'create index if not exists clearwood_map_lookup on map (zoom_level, tile_column, tile_row)',
    );
    db.exec('create index if not exists clearwood_image_lookup on images (tile_id)');
  }
}
