import type { ZodType } from 'zod';
import { dbhFromCircumference } from '../../../shared/rules/index';
import { collections, species, speciesLabels, treeStatuses } from '../../../shared/schemas/enums';
import {
  PREVIEW_ROWS,
  unitOf,
  type ImportColumn,
  type ImportField,
  type ImportKind,
  type ImportMapping,
  type ImportRowError,
  type ImportSource,
} from '../../../shared/schemas/imports';
import { measurementInputSchema } from '../../../shared/schemas/measurement';
import { tapholeInputSchema } from '../../../shared/schemas/taphole';
import { treeInputSchema } from '../../../shared/schemas/tree';
import type { Boundary } from '../../../shared/geo/boundary';
import { farOutside } from './far-outside';
import { resolveColumns } from './import-columns';
import { readCsv, readNumber, type CsvTable, type NumberKind } from './read-csv';
import { gpxColumns, looksLikeXml, readGpx } from './read-gpx';

export interface TreeRow {
  row: number;
  tag: string;
  species: string;
  lat: number | null;
  lng: number | null;
  status: string;
}
export interface MeasurementRow {
  row: number;
  tag: string;
  measuredOn: string;
  dbhCm: number;
  crownDiebackPct: number | null;
  note: string | null;
}
export interface TapholeRow {
  row: number;
  tag: string;
  season: number;
  heightCm: number;
  azimuthDeg: number;
  depthCm: number;
  bitCm: number;
  collection: string;
}
export type ImportRow = TreeRow | MeasurementRow | TapholeRow;

export interface ReadRows<R extends ImportRow = ImportRow> {
  source: ImportSource;
  /** The file could not be read at all (a GPX that is not well-formed): a 400, no report. */
  fatal?: string;
  columns: ImportColumn[];
  preview: string[][];
  /** Data rows read, blank rows left out. */
  rows: number;
  /** Valid rows, each once: a row repeating an earlier one of the file is counted in `repeats`. */
  records: R[];
  repeats: number;
  errors: ImportRowError[];
  warnings: ImportRowError[];
  /** GPX: each waypoint's name as the file gives it, by its number (1 is the first). */
  waypoints?: string[];
}

/** Fields that may be left empty (an empty cell is null, not a missing value). */
const nullable = new Set<ImportField>(['lat', 'lng', 'crownDiebackPct']);

const numberKind: Partial<Record<ImportField, NumberKind>> = {
  lat: 'plain',
  lng: 'plain',
  season: 'plain',
  crownDiebackPct: '%',
  azimuthDeg: 'deg',
};

/** A `'` a spreadsheet (or our export) puts before text that would read as a formula. */
const fromText = (cell: string) => (/^'[=+\-@\t\r]/.test(cell) ? cell.slice(1) : cell);

/** Lengths converted from another unit keep 0.1 mm, well below what a tape reads. */
const round2 = (n: number) => Math.round(n * 100) / 100;

/** A key or a label, in any case: `Sugar maple`, `sugar maple` and `sugar-maple` are one. */
function choice(raw: string, keys: readonly string[], labels?: Record<string, string>) {
  const s = raw.trim().toLowerCase().replace(/\s+/g, '-');
  const key = keys.find((k) => k === s || labels?.[k]?.toLowerCase().replace(/\s+/g, '-') === s);
  return key ?? raw.trim();
}

const keyOf: Record<ImportKind, (r: Record<string, unknown>) => string> = {
  trees: (r) => String(r.tag),
  measurements: (r) => `${String(r.tag)}|${String(r.measuredOn)}`,
  tapholes: (r) =>
    `${String(r.tag)}|${String(r.season)}|${Number(r.heightCm).toFixed(1)}|${Number(r.azimuthDeg).toFixed(1)}`,
};

const schemaOf: Record<ImportKind, ZodType> = {
  trees: treeInputSchema,
  measurements: measurementInputSchema,
  tapholes: tapholeInputSchema,
};

/**
 * Read a CSV file of one kind into rows in the API's units, each checked by the same schema as
 * a row entered by hand. Pure: runs in a worker thread, touches no database.
 */
export function readRows(
  kind: ImportKind,
  bytes: Uint8Array,
  given: ImportMapping,
  boundary: Boundary | null = null,
  /** Called as each data row is checked: rows done of the file's rows (blank ones included). */
  onRow?: (done: number, total: number) => void,
): ReadRows {
  const empty = {
    columns: [],
    preview: [],
    rows: 0,
    records: [],
    repeats: 0,
    warnings: [],
    errors: [],
  };
  let table: CsvTable;
  let source: ImportSource = 'csv';
  let mapping = given;
  if (looksLikeXml(bytes)) {
    source = 'gpx';
    if (kind !== 'trees')
      return {
        ...empty,
        source,
        fatal: `A GPX file holds trees (waypoints), not ${kind}: import it as trees`,
      };
    const gpx = readGpx(bytes);
    if ('fatal' in gpx) return { ...empty, source, fatal: gpx.fatal };
    table = gpx.table;
    mapping = { ...given, columns: { ...gpxColumns, ...given.columns } };
  } else table = readCsv(bytes);
  if (table.error) return { ...empty, source, errors: [table.error] };
  const resolved = resolveColumns(kind, table.header, mapping);
  const { columns, index } = resolved;
  // A GPX has no header row: a problem of a column is about the whole file, no waypoint.
  const errors =
    source === 'gpx' ? resolved.errors.map((e) => ({ ...e, row: 0 })) : resolved.errors;
  const preview = table.records
    .filter((r) => r.cells.some((c) => c !== ''))
    .slice(0, PREVIEW_ROWS)
    .map((r) => r.cells.map((c) => c.slice(0, 200)));
  const out: ReadRows = {
    source,
    columns,
    preview,
    rows: 0,
    records: [],
    repeats: 0,
    errors,
    warnings: [],
    ...(source === 'gpx' ? { waypoints: table.records.map((r) => r.cells[0] ?? '') } : {}),
  };
  if (errors.length > 0) {
    out.rows = table.records.filter((r) => r.cells.some((c) => c !== '')).length;
    return out;
  }
  const headerOf = (field: ImportField) => table.header[index.get(field)!];
  const seen = new Map<string, { row: number; json: string }>();

  const total = table.records.length;
  for (const [i, { row, cells }] of table.records.entries()) {
    onRow?.(i + 1, total);
    if (cells.every((c) => c === '')) continue;
    out.rows++;
    const rowErrors: ImportRowError[] = [];
    if (cells.length > table.header.length && cells.slice(table.header.length).some(Boolean))
      rowErrors.push({
        row,
        column: null,
        message: `This row has ${cells.length} values; the header names ${table.header.length} columns`,
      });
    const values: Record<string, unknown> = {};
    const fieldOfKey: Record<string, ImportField> = {};
    for (const [field, i] of index) {
      const cell = cells[i] ?? '';
      const unit = unitOf(field);
      const base = field.replace(/(Cm|In)$/, '');
      const key = unit ? (base === 'circumference' ? 'dbhCm' : `${base}Cm`) : field;
      fieldOfKey[key] = field;
      const kindOfNumber = unit ?? numberKind[field];
      let value: unknown;
      if (kindOfNumber) {
        const n = readNumber(cell, kindOfNumber);
        if (n && 'error' in n) {
          rowErrors.push({ row, column: headerOf(field), message: n.error });
          continue;
        }
        value = n?.value ?? (nullable.has(field) ? null : undefined);
        if (unit && typeof value === 'number') {
          let cm = unit === 'in' ? value * 2.54 : value;
          if (base === 'circumference') cm = dbhFromCircumference(cm);
          if (cm !== value) value = round2(cm);
        }
      } else if (field === 'species') value = choice(cell, species, speciesLabels);
      else if (field === 'status') value = cell === '' ? undefined : choice(cell, treeStatuses);
      else if (field === 'collection') value = choice(cell, collections);
      else if (field === 'note') value = cell === '' ? null : fromText(cell);
      else if (field === 'tag') value = fromText(cell);
      else value = cell;
      values[key] = value;
    }
    // A species or status the row does not give is the one the mapping states, never a guess.
    if (kind === 'trees') {
      if ((values.species ?? '') === '' && mapping.defaults.species)
        values.species = mapping.defaults.species;
      if (values.status === undefined && mapping.defaults.status)
        values.status = mapping.defaults.status;
    }
    const tag = treeInputSchema.shape.tag.safeParse(values.tag ?? '');
    if (!tag.success)
      rowErrors.push({ row, column: headerOf('tag'), message: tag.error.issues[0].message });
    const result = schemaOf[kind].safeParse(values);
    if (!result.success) {
      for (const issue of result.error.issues) {
        const key = String(issue.path[0] ?? '');
        const field = fieldOfKey[key];
        const column = field ? headerOf(field) : key;
        // The tag is checked above; a value that was not a number is reported once.
        if (key === 'tag' || rowErrors.some((e) => e.column === column)) continue;
        rowErrors.push({ row, column, message: issue.message });
      }
    }
    if (rowErrors.length > 0) {
      out.errors.push(...rowErrors);
      continue;
    }
    const record = {
      row,
      ...(result.data as Record<string, unknown>),
      tag: tag.data,
    } as Record<string, unknown>;
    const clean = tidy(kind, record);
    const k = keyOf[kind](clean as unknown as Record<string, unknown>);
    const json = JSON.stringify({ ...clean, row: 0 });
    const before = seen.get(k);
    if (before) {
      if (before.json === json) out.repeats++;
      else
        out.errors.push({
          row,
          column: headerOf('tag'),
          message: `${source === 'gpx' ? 'Waypoint' : 'Row'} ${before.row} has the same ${sameWhat[kind]} with other values`,
        });
      continue;
    }
    seen.set(k, { row, json });
    out.records.push(clean as unknown as ImportRow);
  }
  if (kind === 'trees' && index.has('lat'))
    out.warnings = farOutside(boundary, out.records as TreeRow[], headerOf('lat'), source);
  return out;
}

const sameWhat: Record<ImportKind, string> = {
  trees: 'tag',
  measurements: 'tag and date',
  tapholes: 'tag, season, height and side',
};

/** Only the fields the kind keeps, with nulls where nothing was given. */
function tidy(kind: ImportKind, r: Record<string, unknown>): ImportRow {
  if (kind === 'trees')
    return {
      row: r.row as number,
      tag: r.tag as string,
      species: r.species as string,
      lat: (r.lat as number | null | undefined) ?? null,
      lng: (r.lng as number | null | undefined) ?? null,
      status: r.status as string,
    };
  if (kind === 'measurements')
    return {
      row: r.row as number,
      tag: r.tag as string,
      measuredOn: r.measuredOn as string,
      dbhCm: r.dbhCm as number,
      crownDiebackPct: (r.crownDiebackPct as number | null | undefined) ?? null,
      note: (r.note as string | null | undefined) ?? null,
    };
  return {
    row: r.row as number,
    tag: r.tag as string,
    season: r.season as number,
    heightCm: r.heightCm as number,
    azimuthDeg: r.azimuthDeg as number,
    depthCm: r.depthCm as number,
    bitCm: r.bitCm as number,
    collection: r.collection as string,
  };
}
