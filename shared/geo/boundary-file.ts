import {
  candidatesOf,
  MAX_CANDIDATES,
  type BoundaryCandidate,
  type FoundShape,
  type SkippedShape,
} from './boundary-shapes';
import { hasZipDirectory, isKml, kmlOfKmz, zipEntries, type ZipEntries } from './boundary-zip';
import { readCrsMember, toWgs84 } from './crs';

/**
 * Reads a stand's boundary from the files GIS programs and GPS units write: GeoJSON (in WGS 84,
 * or in a projected system its legacy `crs` member names), KML and KMZ (a zipped KML), GPX and
 * a zipped Shapefile. Pure: bytes in, outlines in WGS 84 out, in the browser and in node alike.
 * The KML/GPX, zip and Shapefile readers are loaded only when such a file comes.
 */
export type BoundaryFileRead =
  | {
      candidates: BoundaryCandidate[];
      skipped: SkippedShape[];
      /** The system the file was in ("CRS84", "EPSG:32618", or "the Shapefile's .prj"). */
      crs: string;
      /** The layer's name when the file gives one (GDAL writes it in a GeoJSON's `name`). */
      layerName: string | null;
    }
  | { error: string };

/** Parses XML text into a DOM document: the browser's DOMParser, or @xmldom/xmldom in node. */
export type XmlParser = (text: string) => Document;

export interface ReadOptions {
  parseXml?: XmlParser;
}

/** Larger than this and it is no stand outline (a county's parcels, a whole survey). */
export const MAX_BOUNDARY_FILE_BYTES = 20 * 1024 * 1024;

export const BOUNDARY_FILE_EXTENSIONS = [
  '.geojson',
  '.json',
  '.kml',
  '.kmz',
  '.gpx',
  '.zip',
] as const;

type Format = 'geojson' | 'kml' | 'kmz' | 'gpx' | 'shapefile';
type Found = { shapes: FoundShape[]; crs: string; layerName: string | null; degrees: boolean };

const failure = (error: string) => ({ error });

const extensionOf = (name: string) => /\.[^.]+$/.exec(name.toLowerCase())?.[0] ?? '';

function sniff(bytes: Uint8Array, text: () => string): Format | null {
  if (bytes[0] === 0x50 && bytes[1] === 0x4b) return 'shapefile';
  const start = text().trimStart();
  if (start.startsWith('{')) return 'geojson';
  if (start.startsWith('<'))
    return /<kml[\s>]/.test(start) ? 'kml' : /<gpx[\s>]/.test(start) ? 'gpx' : null;
  return null;
}

function formatOf(name: string, bytes: Uint8Array, text: () => string): Format | { error: string } {
  const ext = extensionOf(name);
  if (ext === '.geojson' || ext === '.json') return 'geojson';
  if (ext === '.kml') return 'kml';
  if (ext === '.gpx') return 'gpx';
  if (ext === '.zip') return 'shapefile';
  if (ext === '.kmz') return 'kmz';
  if (['.shp', '.shx', '.dbf', '.prj', '.cpg'].includes(ext))
    return failure(
      'A Shapefile is several files: zip the .shp together with its .shx, .dbf and .prj, and import the .zip.',
    );
  return (
    sniff(bytes, text) ??
    failure(
      `Clearwood cannot read ${ext ? `a ${ext} file` : 'this file'} as a boundary. Choose a GeoJSON (.geojson, .json), KML or KMZ, GPX, or a zipped Shapefile (.zip).`,
    )
  );
}

const featureName = (properties: unknown): string | null => {
  if (!properties || typeof properties !== 'object') return null;
  const p = properties as Record<string, unknown>;
  const name = p.name ?? p.Name ?? p.NAME;
  return typeof name === 'string' || typeof name === 'number' ? String(name) : null;
};

/** The features of a FeatureCollection, a Feature or a bare geometry, each with its name. */
function shapesOfGeoJson(value: unknown): FoundShape[] | null {
  if (!value || typeof value !== 'object') return null;
  const { type, features, geometry, properties } = value as Record<string, unknown>;
  if (type === 'FeatureCollection')
    return Array.isArray(features) ? features.flatMap((f) => shapesOfGeoJson(f) ?? []) : null;
  if (type === 'Feature') return [{ name: featureName(properties), geometry: geometry ?? null }];
  return typeof type === 'string' ? [{ name: null, geometry: value }] : null;
}

function readGeoJson(text: string): Found | { error: string } {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    return failure(
      "The file isn't valid JSON. Choose a .geojson or .json file as a GIS program exports it.",
    );
  }
  const shapes = shapesOfGeoJson(value);
  if (!shapes)
    return failure('This is not GeoJSON: there is no "type". Export the stand outline as GeoJSON.');
  const root = value as { crs?: unknown; name?: unknown };
  const crs = readCrsMember(root.crs);
  if (!crs.ok) return failure(crs.message);
  const layerName = typeof root.name === 'string' ? root.name : null;
  const { definition } = crs;
  const inWgs84 = definition
    ? shapes.map((s) => ({ ...s, geometry: reproject(s.geometry, definition) }))
    : shapes;
  return { shapes: inWgs84, crs: crs.code, layerName, degrees: crs.degrees };
}

function reproject(geometry: unknown, definition: string): unknown {
  if (!geometry || typeof geometry !== 'object') return geometry;
  const g = geometry as { type?: unknown; coordinates?: unknown; geometries?: unknown };
  if (g.type === 'GeometryCollection' && Array.isArray(g.geometries))
    return { ...g, geometries: g.geometries.map((part) => reproject(part, definition)) };
  return 'coordinates' in g ? toWgs84(g as { coordinates: unknown }, definition) : g;
}

function parseXmlText(
  text: string,
  format: 'kml' | 'gpx',
  parseXml?: XmlParser,
): Document | { error: string } {
  const parser =
    parseXml ??
    (typeof DOMParser === 'undefined'
      ? null
      : (t: string) => new DOMParser().parseFromString(t, 'application/xml'));
  if (!parser) return failure('No XML parser is available to read this file.');
  const label = format.toUpperCase();
  let doc: Document;
  try {
    doc = parser(text);
  } catch {
    return failure(
      `The ${label} file is not well-formed XML. Export it again from the GPS or GIS program.`,
    );
  }
  if (!doc?.documentElement || doc.getElementsByTagName('parsererror').length > 0)
    return failure(
      `The ${label} file is not well-formed XML. Export it again from the GPS or GIS program.`,
    );
  const root = doc.documentElement.localName ?? doc.documentElement.nodeName;
  if (root !== format)
    return failure(`The file is named .${format} but holds <${root}>, not ${label}.`);
  return doc;
}

async function readXml(
  text: string,
  format: 'kml' | 'gpx',
  parseXml?: XmlParser,
): Promise<Found | { error: string }> {
  const doc = parseXmlText(text, format, parseXml);
  if ('error' in doc) return doc;
  const togeojson = await import('@tmcw/togeojson');
  const collection = format === 'kml' ? togeojson.kml(doc) : togeojson.gpx(doc);
  const shapes = collection.features.map((f) => ({
    name: featureName(f.properties),
    geometry: f.geometry,
  }));
  return { shapes, crs: 'CRS84', layerName: null, degrees: true };
}

async function readKmz(
  bytes: Uint8Array,
  parseXml: XmlParser | undefined,
  entries?: ZipEntries,
): Promise<Found | { error: string }> {
  const kml = await kmlOfKmz(bytes, MAX_BOUNDARY_FILE_BYTES, entries);
  return 'error' in kml ? kml : readXml(kml.text, 'kml', parseXml);
}

async function readShapefile(
  bytes: Uint8Array,
  parseXml: XmlParser | undefined,
): Promise<Found | { error: string }> {
  if (!hasZipDirectory(bytes))
    return failure('The .zip is damaged or not a zip file. Zip the Shapefile again and import it.');
  // A KMZ renamed, or a KML zipped by hand: a zip with a .kml and no .shp is read as KMZ.
  const entries = await zipEntries(bytes);
  if (
    entries &&
    !entries.some((e) => /\.shp$/i.test(e.filename)) &&
    entries.some((e) => isKml(e.filename))
  )
    return readKmz(bytes, parseXml, entries);
  const { default: shp } = await import('shpjs');
  let layers;
  try {
    const read = await shp(bytes);
    layers = Array.isArray(read) ? read : [read];
  } catch (err) {
    const message = err instanceof Error ? err.message : '';
    if (/no layers/i.test(message))
      return failure(
        'The .zip holds no .shp file. Zip the Shapefile (.shp, .shx, .dbf, .prj) and import that.',
      );
    const detail = message ? ` (${message})` : '';
    return failure(
      `The .zip could not be read as a Shapefile${detail}. It needs a .shp with its .shx and .dbf, and a .prj unless it is in WGS 84.`,
    );
  }
  const shapes = layers.flatMap((layer) =>
    layer.features.map((f) => ({ name: featureName(f.properties), geometry: f.geometry })),
  );
  const layerName = layers.length === 1 ? (layers[0].fileName ?? null) : null;
  return { shapes, crs: "the Shapefile's .prj", layerName, degrees: true };
}

/** The first position outside longitude/latitude ranges: metres in a file that names no system. */
function notDegrees(shapes: FoundShape[]): number[] | null {
  const walk = (c: unknown): number[] | null => {
    if (!Array.isArray(c)) return null;
    if (typeof c[0] === 'number') return Math.abs(c[0]) > 180 || Math.abs(c[1]) > 90 ? c : null;
    for (const inner of c) {
      const found = walk(inner);
      if (found) return found;
    }
    return null;
  };
  for (const { geometry } of shapes) {
    const g = geometry as {
      coordinates?: unknown;
      geometries?: { coordinates?: unknown }[];
    } | null;
    const found = walk(g?.coordinates) ?? walk(g?.geometries?.map((part) => part?.coordinates));
    if (found) return found;
  }
  return null;
}

/** Reads a boundary file into candidate outlines, or one plain message saying what is wrong. */
export async function readBoundaryFile(
  name: string,
  bytes: Uint8Array | ArrayBuffer,
  options: ReadOptions = {},
): Promise<BoundaryFileRead> {
  const data = bytes instanceof Uint8Array ? bytes : new Uint8Array(bytes);
  if (data.byteLength === 0) return failure('The file is empty.');
  if (data.byteLength > MAX_BOUNDARY_FILE_BYTES)
    return failure(
      `The file is ${(data.byteLength / 1024 / 1024).toFixed(0)} MB; a stand's outline is far smaller. Export only the stand.`,
    );
  let decoded: string | null = null;
  const text = () => (decoded ??= new TextDecoder('utf-8').decode(data).replace(/^\uFEFF/, ''));
  const format = formatOf(name, data, text);
  if (typeof format !== 'string') return format;
  const found =
    format === 'geojson'
      ? readGeoJson(text())
      : format === 'shapefile'
        ? await readShapefile(data, options.parseXml)
        : format === 'kmz'
          ? await readKmz(data, options.parseXml)
          : await readXml(text(), format, options.parseXml);
  if ('error' in found) return found;
  const stray = found.degrees ? notDegrees(found.shapes) : null;
  if (stray)
    return failure(
      `The coordinates are not longitude and latitude degrees (one is ${stray
        .slice(0, 2)
        .map((n) => Math.round(n * 10) / 10)
        .join(
          ', ',
        )}) and the file does not say which coordinate system they are in. Export it in WGS 84 (EPSG:4326).`,
    );
  const { candidates, skipped } = candidatesOf(found.shapes, found.layerName);
  if (candidates.length === 0) {
    if (skipped.length === 0) return failure('The file holds no shapes at all.');
    const reasons = skipped.slice(0, 3).map((s) => `"${s.name}" ${s.reason}`);
    const more = skipped.length > 3 ? ` (and ${skipped.length - 3} more)` : '';
    return failure(`The file holds no outline Clearwood can use: ${reasons.join('; ')}${more}.`);
  }
  if (candidates.length > MAX_CANDIDATES)
    return failure(
      `The file holds ${candidates.length} polygons. Keep only the stand's outlines (at most ${MAX_CANDIDATES}) and import again.`,
    );
  return { candidates, skipped, crs: found.crs, layerName: found.layerName };
}
