import fs from 'node:fs';
import Database from 'better-sqlite3';
import { AppError } from '../../errors';
import { MAX_TILE_ZOOM, type BasemapFormat } from '../../../shared/schemas/map';
import { checkMbtilesSchema, ensureTileIndexes } from './mbtiles-schema';

/** What an MBTiles file says about itself, checked. */
export interface MbtilesInfo {
  name: string | null;
  format: BasemapFormat;
  minZoom: number;
  maxZoom: number;
  bounds: [number, number, number, number];
  center: [number, number, number] | null;
}

/** Web Mercator's latitude limit, atan(sinh π), a hair rounded up so files writing 85.0511288 pass. */
const MAX_LAT = 85.0511288;
const SQLITE_HEADER = Buffer.from('SQLite format 3\0', 'latin1');

const notMbtiles = (message: string) => new AppError(400, 'not-mbtiles', message);
const notRaster = (message: string) => new AppError(400, 'not-raster', message);
const badBounds = (message: string) => new AppError(400, 'bad-bounds', message);
const badZoom = (message: string) => new AppError(400, 'bad-zoom', message);

const rasterFormats: Record<string, BasemapFormat> = {
  png: 'png',
  jpg: 'jpg',
  jpeg: 'jpg',
  webp: 'webp',
};
const vectorFormats = new Set(['pbf', 'mvt']);

/** The image type of a tile from its first bytes; 'vector' for gzip or zlib data (vector tiles). */
export function sniffTile(data: Buffer): BasemapFormat | 'vector' | null {
  if (data.length >= 8 && data.subarray(0, 8).equals(Buffer.from('89504e470d0a1a0a', 'hex')))
    return 'png';
  if (data.length >= 3 && data[0] === 0xff && data[1] === 0xd8 && data[2] === 0xff) return 'jpg';
  if (
    data.length >= 12 &&
    data.toString('latin1', 0, 4) === 'RIFF' &&
    data.toString('latin1', 8, 12) === 'WEBP'
  )
    return 'webp';
  if (data.length >= 2 && data[0] === 0x1f && data[1] === 0x8b) return 'vector';
  if (data.length >= 2 && data[0] === 0x78 && (data[0] * 256 + data[1]) % 31 === 0) return 'vector';
  return null;
}

/**
 * Whether the file starts with the SQLite header. A database saved in WAL mode is switched to
 * rollback-journal mode in place (header bytes 18–19): an uploaded file comes without its `-wal`
 * companion, so nothing is lost, and read-only handles then leave no `-wal`/`-shm` files behind.
 */
function checkSqliteHeader(file: string): boolean {
  const fd = fs.openSync(file, 'r+');
  try {
    const head = Buffer.alloc(20);
    const read = fs.readSync(fd, head, 0, head.length, 0);
    if (read < head.length || !head.subarray(0, SQLITE_HEADER.length).equals(SQLITE_HEADER))
      return false;
    if (head[18] === 2 || head[19] === 2) fs.writeSync(fd, Buffer.from([1, 1]), 0, 2, 18);
    return true;
  } finally {
    fs.closeSync(fd);
  }
}

/** XYZ tile edges in degrees. */
const tileLng = (x: number, z: number) => (x / 2 ** z) * 360 - 180;
const tileLat = (y: number, z: number) =>
  (Math.atan(Math.sinh(Math.PI * (1 - (2 * y) / 2 ** z))) * 180) / Math.PI;

const zoomOf = (value: string | undefined, which: string): number | null => {
  if (value === undefined || value.trim() === '') return null;
  const z = Number(value);
  if (!Number.isInteger(z) || z < 0 || z > MAX_TILE_ZOOM)
    throw badZoom(
      `The ${which} in the file's metadata is ${value}; use a whole number 0–${MAX_TILE_ZOOM}`,
    );
  return z;
};

function checkBounds([w, s, e, n]: number[], from: string): [number, number, number, number] {
  const where = `The bounds ${from}`;
  if (![w, s, e, n].every(Number.isFinite))
    throw badBounds(`${where} are not four numbers (west, south, east, north)`);
  if (w < -180 || e > 180) throw badBounds(`${where} run outside longitude −180…180`);
  if (s < -MAX_LAT || n > MAX_LAT)
    throw badBounds(`${where} run outside latitude −85.0511…85.0511 (the limit of web maps)`);
  if (!(w < e)) throw badBounds(`${where} have west (${w}) not less than east (${e})`);
  if (!(s < n)) throw badBounds(`${where} have south (${s}) not less than north (${n})`);
  return [w, s, e, n];
}

function parseCenter(value: string | undefined): [number, number, number] | null {
  const parts = value?.split(',').map((p) => Number(p.trim()));
  if (!parts || parts.length !== 3 || !parts.every(Number.isFinite)) return null;
  const [lng, lat, z] = parts;
  if (Math.abs(lng) > 180 || Math.abs(lat) > MAX_LAT || z < 0 || z > MAX_TILE_ZOOM) return null;
  return [lng, lat, Math.round(z)];
}

/**
 * Open an uploaded file (the caller's own copy) and check that it is a raster MBTiles (spec 1.3):
 * an SQLite database with `tiles(zoom_level, tile_column, tile_row, tile_data)` and
 * `metadata(name, value)` as plain tables, or tiles as the standard map/images view (see
 * `checkMbtilesSchema`; lookup indexes are added when missing), a raster format (png, jpg, webp; sniffed from the first tile when the metadata
 * has none), sane bounds and zooms (derived from the tiles when the metadata has none), and at
 * least one tile. The file must be the caller's own copy (see `checkSqliteHeader`). Throws an AppError whose code the client shows: not-mbtiles, not-raster,
 * bad-bounds or bad-zoom.
 */
export function inspectMbtiles(file: string): MbtilesInfo {
  if (!checkSqliteHeader(file))
    throw notMbtiles('The file is not an MBTiles basemap: it is not an SQLite database');
  let db: Database.Database;
  try {
    db = new Database(file, { fileMustExist: true });
  } catch {
    throw notMbtiles('The file could not be opened as an SQLite database');
  }
  try {
    ensureTileIndexes(db, checkMbtilesSchema(db));
    return readInfo(db);
  } catch (err) {
    if (err instanceof AppError) throw err;
    throw notMbtiles(
      `The file could not be read as an MBTiles basemap (${(err as Error).message})`,
    );
  } finally {
    db.close();
  }
}

function readInfo(db: Database.Database): MbtilesInfo {
  const columnsOf = (name: string) =>
    new Set((db.pragma(`table_info(${name})`) as { name: string }[]).map((c) => c.name));
  const need = {
    tiles: ['zoom_level', 'tile_column', 'tile_row', 'tile_data'],
    metadata: ['name', 'value'],
  };
  for (const [table, columns] of Object.entries(need)) {
    const have = columnsOf(table);
    if (have.size === 0)
      throw notMbtiles(`The file is an SQLite database but has no ${table} table`);
    const missing = columns.filter((c) => !have.has(c));
    if (missing.length)
      throw notMbtiles(
        `The ${table} table lacks the column${missing.length > 1 ? 's' : ''} ${missing.join(', ')}`,
      );
  }

  const metadata = new Map<string, string>();
  for (const row of db.prepare('select name, value from metadata').all() as {
    name: unknown;
    value: unknown;
  }[])
    if (typeof row.name === 'string' && row.value !== null)
      metadata.set(row.name.toLowerCase(), String(row.value));

  const first = db.prepare('select tile_data from tiles limit 1').pluck().get() as
    Buffer | undefined;
  if (first === undefined) throw notMbtiles('The MBTiles file holds no tiles');

  const declared = metadata.get('format')?.trim().toLowerCase();
  let format: BasemapFormat;
  if (declared) {
    if (vectorFormats.has(declared))
      throw notRaster(
        `This MBTiles holds vector tiles (${declared}); Clearwood shows raster tiles only (png, jpg or webp)`,
      );
    if (!rasterFormats[declared])
      throw notRaster(
        `The tile format "${declared}" is not one Clearwood shows: use png, jpg or webp`,
      );
    format = rasterFormats[declared];
  } else {
    const sniffed = Buffer.isBuffer(first) ? sniffTile(first) : null;
    if (sniffed === 'vector')
      throw notRaster(
        'This MBTiles holds vector tiles; Clearwood shows raster tiles only (png, jpg or webp)',
      );
    if (!sniffed)
      throw notRaster(
        'The tiles are not png, jpg or webp images, and the metadata names no format',
      );
    format = sniffed;
  }

  const extent = db
    .prepare('select min(zoom_level) as lo, max(zoom_level) as hi from tiles')
    .get() as { lo: number; hi: number };
  if (!Number.isInteger(extent.lo) || extent.lo < 0 || extent.hi > MAX_TILE_ZOOM)
    throw badZoom(
      `The tiles run from zoom ${extent.lo} to ${extent.hi}; web maps use 0–${MAX_TILE_ZOOM}`,
    );
  const minZoom = zoomOf(metadata.get('minzoom'), 'minimum zoom') ?? extent.lo;
  const maxZoom = zoomOf(metadata.get('maxzoom'), 'maximum zoom') ?? extent.hi;
  if (minZoom > maxZoom)
    throw badZoom(`The minimum zoom (${minZoom}) is above the maximum zoom (${maxZoom})`);

  let bounds: [number, number, number, number];
  const written = metadata.get('bounds');
  if (written !== undefined && written.trim() !== '') {
    const parts = written.split(',').map((p) => Number(p.trim()));
    if (parts.length !== 4)
      throw badBounds('The bounds in the metadata are not four numbers (west, south, east, north)');
    bounds = checkBounds(parts, 'in the metadata');
  } else {
    bounds = boundsOfTiles(db, extent.hi);
  }

  const name = metadata.get('name')?.trim() || null;
  return { name, format, minZoom, maxZoom, bounds, center: parseCenter(metadata.get('center')) };
}

/** Bounds from the tiles at their deepest zoom (TMS rows counted from the south). */
function boundsOfTiles(db: Database.Database, z: number): [number, number, number, number] {
  const e = db
    .prepare(
      `select min(tile_column) as x0, max(tile_column) as x1, min(tile_row) as r0, max(tile_row) as r1
       from tiles where zoom_level = ?`,
    )
    .get(z) as { x0: number; x1: number; r0: number; r1: number };
  const last = 2 ** z - 1;
  if (![e.x0, e.x1, e.r0, e.r1].every((v) => Number.isInteger(v) && v >= 0 && v <= last))
    throw badBounds(`The tiles at zoom ${z} have columns or rows outside 0–${last}`);
  const north = last - e.r1;
  const south = last - e.r0;
  return checkBounds(
    [tileLng(e.x0, z), tileLat(south + 1, z), tileLng(e.x1 + 1, z), tileLat(north, z)],
    'of the tiles',
  );
}
