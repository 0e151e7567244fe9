import { CsvError, parse } from 'csv-parse/sync';
import type { ImportRowError, LengthUnit } from '../../../shared/schemas/imports';

export interface CsvRecord {
  /** The row as a spreadsheet numbers it (the header is row 1; a quoted newline stays in its row). */
  row: number;
  cells: string[];
}

export interface CsvTable {
  header: string[];
  records: CsvRecord[];
  /** The file could not be read as CSV at all (an unclosed quote): nothing else is reported. */
  error: ImportRowError | null;
}

const candidates = [',', ';', '\t'] as const;

/**
 * The separator of the header line: the most frequent of `,` `;` and tab outside quotes. A
 * spreadsheet set to a language with decimal commas writes `;`.
 */
export function detectDelimiter(text: string): string {
  const counts = new Map<string, number>(candidates.map((c) => [c, 0]));
  let quoted = false;
  for (const ch of text) {
    if (ch === '"') quoted = !quoted;
    else if (!quoted && (ch === '\n' || ch === '\r')) break;
    else if (!quoted && counts.has(ch)) counts.set(ch, counts.get(ch)! + 1);
  }
  let best = ',';
  for (const c of candidates) if (counts.get(c)! > counts.get(best)!) best = c;
  return best;
}

/**
 * UTF-8, as every current spreadsheet writes it; a file that is not valid UTF-8 is read as
 * Windows-1252, which older spreadsheet versions write for "CSV", so `Érable` survives either way.
 */
function decode(bytes: Uint8Array): string {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return new TextDecoder('windows-1252').decode(bytes);
  }
}

/** Read a CSV file, with or without a byte-order mark; blank rows keep their number. */
export function readCsv(bytes: Uint8Array): CsvTable {
  const text = decode(bytes).replace(/^\uFEFF/, '');
  let rows: string[][];
  try {
    rows = parse(text, {
      delimiter: detectDelimiter(text),
      relax_column_count: true,
      // `12"` is twelve inches, not the start of a quoted field.
      relax_quotes: true,
      skip_empty_lines: false,
      trim: true,
    }) as string[][];
  } catch (err) {
    if (!(err instanceof CsvError)) throw err;
    const line = (err as CsvError & { lines?: number }).lines;
    return {
      header: [],
      records: [],
      error: {
        row: line ?? 1,
        column: null,
        message: `The file is not readable as CSV: ${err.message}`,
      },
    };
  }
  const [header = [], ...data] = rows;
  return {
    header,
    records: data.map((cells, i) => ({ row: i + 2, cells })),
    error: null,
  };
}

const suffixes: { re: RegExp; unit: LengthUnit | '%' | 'deg' }[] = [
  { re: /\s*(cm)$/i, unit: 'cm' },
  { re: /\s*(in|inch|inches|"|″|'')$/i, unit: 'in' },
  { re: /\s*%$/, unit: '%' },
  { re: /\s*(°|deg)$/i, unit: 'deg' },
];

const unitName: Record<string, string> = {
  cm: 'centimetres',
  in: 'inches',
  '%': 'a percentage',
  deg: 'degrees',
};

export type NumberKind = LengthUnit | '%' | 'deg' | 'plain';

/**
 * A number as people type it in a spreadsheet: a decimal comma (`31,5`), a fraction (`5/16`,
 * `1 1/2`), a unit after it (`12 in`, `12"`, `31 cm`, `15 %`). A unit that is not the column's is
 * an error: the value is never converted on the strength of its suffix.
 */
export function readNumber(
  raw: string,
  kind: NumberKind,
): { value: number } | { error: string } | null {
  let s = raw.trim();
  if (s === '') return null;
  for (const { re, unit } of suffixes) {
    if (!re.test(s)) continue;
    if (unit !== kind) {
      const holds = kind === 'plain' ? 'a plain number' : unitName[kind];
      return {
        error: `"${raw}" is in ${unitName[unit]}, but this column holds ${holds}${
          kind === 'cm' || kind === 'in'
            ? ': map the column to the field in that unit, or fix the value'
            : ''
        }`,
      };
    }
    s = s.replace(re, '');
    break;
  }
  if (/^[+-]?\d+,\d+$/.test(s)) s = s.replace(',', '.');
  const mixed = /^(\d+)\s+(\d+)\/(\d+)$/.exec(s);
  const fraction = /^(\d+)\/(\d+)$/.exec(s);
  let value: number;
  if (mixed) value = Number(mixed[1]) + Number(mixed[2]) / Number(mixed[3]);
  else if (fraction) value = Number(fraction[1]) / Number(fraction[2]);
  else value = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(s) ? Number(s) : NaN;
  if (!Number.isFinite(value)) return { error: `"${raw}" is not a number` };
  return { value };
}
