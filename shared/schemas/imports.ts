import { z } from 'zod';
import { speciesSchema, treeStatusSchema } from './enums';
import type { Permission } from './permissions';

/** What a CSV file can bring into a stand's record. */
export const importKinds = ['trees', 'measurements', 'tapholes'] as const;
export type ImportKind = (typeof importKinds)[number];

/** Who may import each kind: the same actions as recording one row by hand. */
export const importPermission: Record<ImportKind, Permission> = {
  trees: 'edit-trees',
  measurements: 'record-measurements',
  tapholes: 'record-tapholes',
};

export type LengthUnit = 'cm' | 'in';

/**
 * The fields a column can fill. A length field names its unit (`dbhIn` is a DBH in inches), so a
 * unit is always said — by the header or by the mapping — and never guessed from the numbers.
 */
export const importFields = {
  trees: ['tag', 'species', 'lat', 'lng', 'status'],
  measurements: [
    'tag',
    'measuredOn',
    'dbhCm',
    'dbhIn',
    'circumferenceCm',
    'circumferenceIn',
    'crownDiebackPct',
    'note',
  ],
  tapholes: [
    'tag',
    'season',
    'heightCm',
    'heightIn',
    'azimuthDeg',
    'depthCm',
    'depthIn',
    'bitCm',
    'bitIn',
    'collection',
  ],
} as const satisfies Record<ImportKind, readonly string[]>;
export type ImportField = (typeof importFields)[ImportKind][number];

/** What each field is, in the words an import page shows (the unit is part of the choice). */
export const importFieldLabels: Record<ImportField, string> = {
  tag: 'Tag',
  species: 'Species',
  lat: 'Latitude',
  lng: 'Longitude',
  status: 'Status',
  measuredOn: 'Date measured (YYYY-MM-DD)',
  dbhCm: 'DBH in centimetres',
  dbhIn: 'DBH in inches',
  circumferenceCm: 'Circumference in centimetres',
  circumferenceIn: 'Circumference in inches',
  crownDiebackPct: 'Crown dieback (%)',
  note: 'Note',
  season: 'Season',
  heightCm: 'Height in centimetres',
  heightIn: 'Height in inches',
  azimuthDeg: 'Side (azimuth, degrees from north)',
  depthCm: 'Depth in centimetres',
  depthIn: 'Depth in inches',
  bitCm: 'Bit in centimetres',
  bitIn: 'Bit in inches',
  collection: 'Collection (bucket, gravity, vacuum)',
};

export const importKindLabels: Record<ImportKind, string> = {
  trees: 'Trees (the register)',
  measurements: 'Readings (DBH and crown dieback)',
  tapholes: 'Tapholes',
};

/** The header of each kind as exported (and so as an export imports again). */
export const exportHeaders = {
  trees: ['tag', 'species', 'lat', 'lng', 'status'],
  measurements: ['tag', 'measuredOn', 'dbhCm', 'crownDiebackPct', 'note'],
  tapholes: ['tag', 'season', 'heightCm', 'azimuthDeg', 'depthCm', 'bitCm', 'collection'],
} as const satisfies Record<ImportKind, readonly ImportField[]>;

/** A length field's unit, from its name; null for a field that is not a length. */
export function unitOf(field: string): LengthUnit | null {
  if (/(Cm)$/.test(field) && field !== 'crownDiebackPct') return 'cm';
  if (/(In)$/.test(field)) return 'in';
  return null;
}

/** The one or two columns a kind cannot do without (DBH: any one of its four fields). */
export const requiredFields: Record<ImportKind, readonly (readonly ImportField[])[]> = {
  trees: [['tag'], ['species']],
  measurements: [['tag'], ['measuredOn'], ['dbhCm', 'dbhIn', 'circumferenceCm', 'circumferenceIn']],
  tapholes: [
    ['tag'],
    ['season'],
    ['heightCm', 'heightIn'],
    ['azimuthDeg'],
    ['depthCm', 'depthIn'],
    ['bitCm', 'bitIn'],
    ['collection'],
  ],
};

const allFields = [...new Set(Object.values(importFields).flat())] as [string, ...string[]];

/**
 * The optional form field `mapping`: which field each column of the file fills (`null` leaves a
 * column out), and for trees whether a tag already in the register with other data is updated
 * (otherwise it is reported and nothing is written). Columns not named keep what their header says.
 * A bare object of column → field is read as `columns`.
 */
const columnsSchema = z.record(
  z.string().max(200),
  z.enum(allFields, { error: `Map a column to one of: ${allFields.join(', ')}` }).nullable(),
);
export const importMappingSchema = z.preprocess(
  (v) =>
    v &&
    typeof v === 'object' &&
    !Array.isArray(v) &&
    !('columns' in v) &&
    !('updateExisting' in v) &&
    !('defaults' in v)
      ? { columns: v }
      : v,
  z.object({
    columns: columnsSchema.default({}),
    updateExisting: z.boolean().default(false),
    defaults: z
      .object({ species: speciesSchema.optional(), status: treeStatusSchema.optional() })
      .default({}),
  }),
);
export type ImportMapping = z.infer<typeof importMappingSchema>;

/** The import page's form: the kind of file and the mapping it sends with it. */
export const importFormSchema = z.object({
  kind: z.enum(importKinds),
  columns: columnsSchema,
  updateExisting: z.boolean(),
  /** For trees: the species and status of a row (or waypoint) that gives none; '' is "none stated". */
  defaultSpecies: z.union([speciesSchema, z.literal('')]),
  defaultStatus: z.union([treeStatusSchema, z.literal('')]),
});
export type ImportForm = z.infer<typeof importFormSchema>;

const flag = z
  .enum(['1', '0', 'true', 'false'])
  .transform((v) => v === '1' || v === 'true')
  .optional();

export const importQuerySchema = z.object({ dryRun: flag });
export type ImportQuery = z.infer<typeof importQuerySchema>;

/**
 * The header `x-import-id`: a random id the browser makes for one import, under which the
 * server keeps that import's progress while the POST is pending (`importProgressPath`).
 */
export const IMPORT_ID_HEADER = 'x-import-id';
export const importIdSchema = z.uuid({ error: 'An import id is a UUID' });
export const importProgressParamsSchema = z.object({ importId: importIdSchema });

export interface ImportRowError {
  /**
   * CSV: the row as a spreadsheet numbers it (the header is row 1, where a problem of a column
   * is reported). GPX: the waypoint's number in the file's order, from 1; 0 for a problem of the
   * whole file (no column holds a field), which is about no waypoint.
   */
  row: number;
  /** The column's header as in the file, or the field it lacks when no column holds it. */
  column: string | null;
  message: string;
  /** GPX only: the waypoint's name as the file gives it ('' when it has none). */
  waypoint?: string;
}

export interface ImportColumn {
  header: string;
  /** The field it fills, or null when it is left out. */
  field: ImportField | null;
}

/** A tree file is a spreadsheet's CSV or a handheld GPS's GPX waypoints, told apart by content. */
export type ImportSource = 'csv' | 'gpx';

/**
 * A waypoint (or CSV row) this far outside the stand's boundary, in metres, is flagged: a GPS
 * reading under a canopy strays by tens of metres, so a tree just past the line is not one.
 */
export const OUTSIDE_BOUNDARY_WARN_M = 100;

export interface ImportResult {
  kind: ImportKind;
  dryRun: boolean;
  /** `gpx`: each row is a waypoint, numbered from 1 in the file's order. */
  source: ImportSource;
  /** Data rows read (blank rows are not counted). */
  rows: number;
  /** Rows written as new records (or that would be, in a dry run). */
  created: number;
  /** Rows already on record as they are: nothing to write. */
  unchanged: number;
  /** Trees whose register entry was changed (only with `updateExisting`). */
  updated: number;
  /**
   * Empty when every row could be taken; when not, nothing was written. At most the problems of
   * the first `REPORTED_ROWS` rows with one, in row order (`truncated` says when more were left out).
   */
  errors: ImportRowError[];
  /** Every problem found (one per cell, or per row where the row itself is wrong), reported or not. */
  totalErrors: number;
  /** Rows (or waypoints) with at least one problem, reported or not. */
  rowsWithErrors: number;
  /** Rows that can be imported but deserve a look (a tree far outside the boundary), capped as `errors`. */
  warnings: ImportRowError[];
  totalWarnings: number;
  /** `errors` or `warnings` holds only the first `REPORTED_ROWS` rows' entries. */
  truncated: boolean;
  /** The species and status given to rows that name none, as the mapping stated them. */
  defaults: { species: string | null; status: string };
  columns: ImportColumn[];
  /** The first data rows as read, cell by cell in the file's column order (for a preview). */
  preview: string[][];
}

/** Data rows a report shows as they were read. */
export const PREVIEW_ROWS = 5;

/**
 * Rows whose problems a report lists: a file of 10,000 wrong rows answers the first 200 rows'
 * problems and the counts of all, not a list no one reads that weighs megabytes.
 */
export const REPORTED_ROWS = 200;

/**
 * The steps of an import, in order: the file arriving (the browser counts its bytes), read,
 * each row checked, written (not in a dry run), the advice brought up to date, then done — or
 * failed at any step (the POST's answer says why).
 */
export const importPhases = [
  'receiving',
  'reading',
  'checking',
  'writing',
  'advising',
  'done',
  'failed',
] as const;
export type ImportPhase = (typeof importPhases)[number];

/** `GET /api/sugarbushes/:id/imports/:importId/progress`, while the import's POST is pending. */
export interface ImportProgress {
  importId: string;
  kind: ImportKind;
  dryRun: boolean;
  phase: ImportPhase;
  /**
   * How far the phase has come: rows checked or written, seasons advised, each of `total`; both
   * 0 where a phase is not counted (receiving, reading). Never goes back within a phase.
   */
  done: number;
  total: number;
}

/** What a step is called on the page. */
export const importPhaseLabels: Record<ImportPhase, string> = {
  receiving: 'Sending the file',
  reading: 'Reading the file',
  checking: 'Checking rows',
  writing: 'Writing rows',
  advising: 'Bringing the advice up to date',
  done: 'Done',
  failed: 'Stopped',
};
