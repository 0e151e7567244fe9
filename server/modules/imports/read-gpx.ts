import { XMLParser, XMLValidator } from 'fast-xml-parser';
import type { CsvTable } from './read-csv';

/** What a waypoint brings, as the columns of a table: `name` is the tag, `desc`/`cmt` are shown. */
export const gpxHeader = ['name', 'lat', 'lon', 'ele', 'desc', 'cmt'] as const;

/** The columns a waypoint fills unless the mapping says otherwise. */
export const gpxColumns = {
  name: 'tag',
  lat: 'lat',
  lon: 'lng',
  ele: null,
  desc: null,
  cmt: null,
} as const;

const text = (bytes: Uint8Array) => new TextDecoder('utf-8').decode(bytes).replace(/^\uFEFF/, '');

/**
 * A GPX file, told by its content rather than its name: XML (a `<` first, after any byte-order
 * mark and blank space) whose root element is `gpx`. A CSV never starts with `<`.
 */
export function looksLikeXml(bytes: Uint8Array): boolean {
  return text(bytes.subarray(0, 64)).trimStart().startsWith('<');
}

export type GpxRead = { table: CsvTable } | { fatal: string };

const cell = (v: unknown): string => {
  if (v === undefined || v === null) return '';
  if (typeof v === 'object') return '';
  return String(v).trim();
};

/**
 * Each `<wpt>` of a GPX file as a row (numbered from 1 in the file's order): its name, position,
 * elevation, description and comment. Tracks and routes are not trees and are left out. A file
 * that is not well-formed XML, not GPX, or holds no waypoint cannot be read at all.
 */
export function readGpx(bytes: Uint8Array): GpxRead {
  const xml = text(bytes);
  const valid = XMLValidator.validate(xml);
  if (valid !== true)
    return {
      fatal: `The GPX file is not well-formed XML (line ${valid.err.line}, column ${valid.err.col}): ${valid.err.msg}`,
    };
  const doc = new XMLParser({
    ignoreAttributes: false,
    attributeNamePrefix: '@',
    removeNSPrefix: true,
    parseAttributeValue: false,
    parseTagValue: false,
    processEntities: true,
    isArray: (_name, path) => path === 'gpx.wpt',
  }).parse(xml) as Record<string, unknown>;
  const gpx = doc.gpx as Record<string, unknown> | undefined;
  if (!gpx || typeof gpx !== 'object')
    return { fatal: 'The file is XML but not GPX (its root element is not <gpx>)' };
  const wpts = (gpx.wpt ?? []) as Record<string, unknown>[];
  if (wpts.length === 0)
    return {
      fatal:
        'The GPX file holds no waypoints (<wpt>): save the trees as waypoints; tracks and routes are not imported',
    };
  return {
    table: {
      header: [...gpxHeader],
      records: wpts.map((w, i) => ({
        row: i + 1,
        cells: [
          cell(w.name),
          cell(w['@lat']),
          cell(w['@lon']),
          cell(w.ele),
          cell(w.desc),
          cell(w.cmt),
        ],
      })),
      error: null,
    },
  };
}
