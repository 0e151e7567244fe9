import proj4 from 'proj4';

/**
 * The coordinate systems a boundary file may be in, each defined here by its proj4 string (no
 * EPSG database is shipped): WGS 84 and NAD83 in degrees, the UTM zones on WGS 84 (EPSG:326zz
 * north, 327zz south) and on NAD83 (269zz), and Web Mercator. Everything is turned into WGS 84
 * longitude/latitude, the only system Clearwood keeps.
 */
export type CrsRead =
  | { ok: true; code: string; degrees: boolean; definition: string | null }
  | { ok: false; message: string };

const WEB_MERCATOR =
  '+proj=merc +a=6378137 +b=6378137 +lat_ts=0 +lon_0=0 +x_0=0 +y_0=0 +k=1 +units=m +nadgrids=@null +wktext +no_defs';

/** EPSG codes in degrees that Clearwood takes as WGS 84 as they are (NAD83 is within about a metre of it here). */
const DEGREE_CODES = new Set([4326, 4269, 4979]);

/** The proj4 string of an EPSG code, or null when Clearwood does not know the code. */
export function projDefinition(code: number): string | null {
  const zone = code % 100;
  if (code > 32600 && code <= 32660)
    return `+proj=utm +zone=${zone} +datum=WGS84 +units=m +no_defs`;
  if (code > 32700 && code <= 32760)
    return `+proj=utm +zone=${zone} +south +datum=WGS84 +units=m +no_defs`;
  if (code > 26900 && code <= 26923)
    return `+proj=utm +zone=${zone} +datum=NAD83 +units=m +no_defs`;
  if (code === 3857 || code === 900913 || code === 102100 || code === 102113) return WEB_MERCATOR;
  return null;
}

const refuse = (name: string): CrsRead => ({
  ok: false,
  message: `The file is in ${name}, which Clearwood cannot read yet; export it in WGS 84 (EPSG:4326).`,
});

/** The EPSG code a crs name spells, in its usual forms ("EPSG:32618", URNs, OGC URLs). */
function epsgCode(name: string): number | null {
  const match =
    /^urn:ogc:def:crs:EPSG:[\d.]*:(\d+)$/i.exec(name) ??
    /^EPSG:{1,2}(\d+)$/i.exec(name) ??
    /^https?:\/\/www\.opengis\.net\/def\/crs\/EPSG\/[\d.]+\/(\d+)$/i.exec(name);
  return match ? Number(match[1]) : null;
}

const isCrs84 = (name: string) =>
  /^urn:ogc:def:crs:OGC:[\d.]*:CRS84$/i.test(name) ||
  /^(OGC:)?CRS:?84$/i.test(name) ||
  /^https?:\/\/www\.opengis\.net\/def\/crs\/OGC\/[\d.]+\/CRS84$/i.test(name);

/** Reads a system by its name or EPSG code: WGS 84 in degrees, a known projection, or a refusal. */
export function readCrsName(name: string): CrsRead {
  const trimmed = name.trim();
  if (isCrs84(trimmed)) return { ok: true, code: 'CRS84', degrees: true, definition: null };
  const code = epsgCode(trimmed);
  if (code === null) return refuse(trimmed || 'an unnamed coordinate system');
  if (DEGREE_CODES.has(code))
    return { ok: true, code: `EPSG:${code}`, degrees: true, definition: null };
  const definition = projDefinition(code);
  return definition
    ? { ok: true, code: `EPSG:${code}`, degrees: false, definition }
    : refuse(`EPSG:${code}`);
}

/**
 * The legacy GeoJSON `crs` member (2008 specification; GDAL still writes it): `{ type: "name",
 * properties: { name } }` or `{ type: "EPSG", properties: { code } }`. Without one, the
 * coordinates are WGS 84 longitude/latitude, as RFC 7946 says.
 */
export function readCrsMember(crs: unknown): CrsRead {
  if (crs === undefined || crs === null)
    return { ok: true, code: 'CRS84', degrees: true, definition: null };
  const { type, properties } = (typeof crs === 'object' ? crs : {}) as {
    type?: unknown;
    properties?: { name?: unknown; code?: unknown; href?: unknown };
  };
  if (type === 'name' && typeof properties?.name === 'string') return readCrsName(properties.name);
  if (
    type === 'EPSG' &&
    (typeof properties?.code === 'number' || typeof properties?.code === 'string')
  )
    return readCrsName(`EPSG:${properties.code}`);
  if (type === 'link' && typeof properties?.href === 'string')
    return refuse(`the coordinate system linked at ${properties.href}`);
  return refuse('a coordinate system the file does not name in a way Clearwood reads');
}

type Position = number[];
type Nested = Position | Nested[];

/** Maps every position of a coordinates array (any depth) through `fn`. */
function mapPositions(coordinates: Nested, fn: (p: Position) => Position): Nested {
  if (coordinates.length > 0 && typeof coordinates[0] === 'number')
    return fn(coordinates as Position);
  return (coordinates as Nested[]).map((c) => mapPositions(c, fn));
}

/** Seven decimals of a degree: about a centimetre. */
const round7 = (n: number) => Math.round(n * 1e7) / 1e7;

/**
 * Turns a geometry's coordinates from a projected system (a proj4 definition) into WGS 84
 * longitude/latitude degrees, rounded to about a centimetre. Anything that is not a number
 * array is left as it is for the boundary check to name.
 */
export function toWgs84<T extends { coordinates: unknown }>(geometry: T, definition: string): T {
  const converter = proj4(definition, 'WGS84');
  const convert = (p: Position): Position => {
    if (!p.every((n) => typeof n === 'number' && Number.isFinite(n))) return p;
    const [lng, lat] = converter.forward([p[0], p[1]]);
    return [round7(lng), round7(lat)];
  };
  if (!Array.isArray(geometry.coordinates)) return geometry;
  return { ...geometry, coordinates: mapPositions(geometry.coordinates as Nested, convert) };
}
