import Database from 'better-sqlite3';
import { PNG } from 'pngjs';

/** A tile as MBTiles stores it: TMS row, counted from the south. */
export interface FixtureTile {
  z: number;
  x: number;
  row: number;
  data: Buffer;
}

export interface FixtureOptions {
  /** Metadata rows; a key set to null is left out. Defaults: a name and format png. */
  metadata?: Record<string, string | null>;
  tiles: FixtureTile[];
  /** Store the tiles behind views (deduplicated images), as some tools write them. */
  asViews?: boolean;
  /** Leave the database in WAL journal mode, as some tools save it. */
  wal?: boolean;
}

/** Write an MBTiles file (spec 1.3) holding exactly these tiles and metadata. */
export function writeMbtiles(file: string, opts: FixtureOptions): string {
  const db = new Database(file);
  try {
    db.exec('create table metadata (name text, value text)');
    if (opts.asViews) {
      db.exec(`
        create table map (zoom_level integer, tile_column integer, tile_row integer, tile_id text);
        create table images (tile_id text primary key, tile_data blob);
        create view tiles as
          select map.zoom_level, map.tile_column, map.tile_row, images.tile_data
          from map join images on images.tile_id = map.tile_id;`);
      const place = db.prepare('insert into map values (?, ?, ?, ?)');
      const image = db.prepare('insert or replace into images values (?, ?)');
      for (const t of opts.tiles) {
        const id = `${t.z}/${t.x}/${t.row}`;
        place.run(t.z, t.x, t.row, id);
        image.run(id, t.data);
      }
    } else {
      db.exec(
        'create table tiles (zoom_level integer, tile_column integer, tile_row integer, tile_data blob)',
      );
      const insert = db.prepare('insert into tiles values (?, ?, ?, ?)');
      for (const t of opts.tiles) insert.run(t.z, t.x, t.row, t.data);
    }
    const metadata = { name: 'Fixture basemap', format: 'png', ...opts.metadata };
    const row = db.prepare('insert into metadata values (?, ?)');
    for (const [name, value] of Object.entries(metadata)) if (value !== null) row.run(name, value);
    if (opts.wal) db.pragma('journal_mode = WAL');
  } finally {
    db.close();
  }
  return file;
}

/** A small PNG of one flat colour: a tile the tests can tell apart by its bytes. */
export function solidPng([r, g, b]: [number, number, number], size = 4): Buffer {
  const png = new PNG({ width: size, height: size, colorType: 2 });
  for (let i = 0; i < size * size; i++) png.data.set([r, g, b, 255], i * 4);
  return PNG.sync.write(png, { colorType: 2 });
}
