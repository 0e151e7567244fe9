import { CsvError, parse } from 'csv-parse/sync';
import { fToC } from '../../../shared/rules/units';
import { isoDateSchema, isoDay } from '../../../shared/schemas/iso-date';
import { WEATHER_LIMITS_C } from '../../../shared/schemas/weather';
import { AppError } from '../../errors';

export type Unit = 'F' | 'C';

export interface StationReading {
  date: string;
  minC: number;
  maxC: number;
}

export interface StationFile {
  station: string | null;
  unit: Unit;
  readings: StationReading[];
  skipped: { row: number; reason: string }[];
}

const invalid = (message: string, fields: Record<string, string>) =>
  new AppError(400, 'invalid-input', message, fields);

/**
 * A temperature column's name and the unit it states, if any: `TMAX`, `TMAX (°F)`, `TMAX_F`,
 * `tmin [degC]`, `TMIN (C)`. Only °F and °C are read; any other wording beside TMAX/TMIN is not
 * the column.
 */
const TEMPERATURE = /^(TMAX|TMIN)(?:\s*[_ ]\s*|\s*)(?:[([]\s*)?(?:°|º|deg\s*)?([FC])?\s*[)\]]?$/i;

interface Header {
  station: number | null;
  date: number;
  tmax: number;
  tmin: number;
  /** The unit the header names, if it names one. */
  unit: Unit | null;
}

function readHeader(names: string[]): Header {
  const find = (name: string) => names.findIndex((n) => n.trim().toUpperCase() === name);
  if (find('ELEMENT') >= 0 && find('DATA_VALUE') >= 0)
    throw invalid(
      'This is the GHCN-Daily element-per-row layout (tenths of °C): export the daily summaries instead, with STATION, DATE, TMAX and TMIN columns',
      { file: 'Use the daily summaries layout: STATION, DATE, TMAX, TMIN' },
    );
  const temps = new Map<string, { index: number; unit: Unit | null }>();
  names.forEach((raw, index) => {
    const m = TEMPERATURE.exec(raw.trim());
    if (m && !temps.has(m[1].toUpperCase()))
      temps.set(m[1].toUpperCase(), { index, unit: (m[2]?.toUpperCase() as Unit) ?? null });
  });
  const date = find('DATE');
  const tmax = temps.get('TMAX');
  const tmin = temps.get('TMIN');
  const missing = [date < 0 && 'DATE', !tmax && 'TMAX', !tmin && 'TMIN'].filter(Boolean);
  if (missing.length > 0)
    throw invalid(
      `The file has no ${missing.join(', ')} column: a station's daily summary has STATION, DATE, TMAX and TMIN`,
      { file: `Missing column${missing.length > 1 ? 's' : ''}: ${missing.join(', ')}` },
    );
  if (tmax!.unit && tmin!.unit && tmax!.unit !== tmin!.unit)
    throw invalid('The header gives TMAX and TMIN in different units', {
      file: `TMAX is in °${tmax!.unit} but TMIN in °${tmin!.unit}: fix the header`,
    });
  const station = find('STATION');
  return {
    station: station >= 0 ? station : null,
    date,
    tmax: tmax!.index,
    tmin: tmin!.index,
    unit: tmax!.unit ?? tmin!.unit,
  };
}

/** The unit to read: the form's and the header's must agree; with neither, the import waits for one. */
function chooseUnit(given: Unit | undefined, named: Unit | null): Unit {
  if (given && named && given !== named)
    throw invalid(`The file's header says °${named}, not °${given}`, {
      unit: `The file's header gives the temperatures in °${named}: choose °${named}, or check the file`,
    });
  const unit = given ?? named;
  if (!unit)
    throw new AppError(
      400,
      'unit-required',
      'Say whether the file is in °F or °C: a station’s daily summary does not always say, and Clearwood never guesses',
      { unit: 'Choose °F (a “standard” download) or °C (a “metric” one)' },
    );
  return unit;
}

const decode = (bytes: Uint8Array) => {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return new TextDecoder('windows-1252').decode(bytes);
  }
};

/**
 * A weather station's daily summaries as NOAA NCEI's Climate Data Online and GHCN-Daily CSV
 * files lay them out: a header naming `STATION`, `DATE` (YYYY-MM-DD), `TMAX` and `TMIN` among any
 * others (NAME, PRCP, SNOW, `*_ATTRIBUTES`, …), values quoted or not. One station per file. A row
 * with no TMAX or TMIN, or one that cannot be a reading, is skipped and reported by its row number
 * (the header is row 1).
 */
export function readStationFile(bytes: Uint8Array, unitGiven: Unit | undefined): StationFile {
  let rows: string[][];
  try {
    rows = parse(decode(bytes), {
      bom: true,
      relax_column_count: true,
      skip_empty_lines: false,
      trim: true,
    }) as string[][];
  } catch (err) {
    if (!(err instanceof CsvError)) throw err;
    throw invalid(`The file is not readable as CSV: ${err.message}`, {
      file: 'The file is not readable as CSV',
    });
  }
  const [names = [], ...data] = rows;
  const header = readHeader(names);
  const unit = chooseUnit(unitGiven, header.unit);
  const toC = (v: number) => (unit === 'F' ? fToC(v) : v);

  const stations = new Set<string>();
  const seen = new Set<string>();
  const readings: StationReading[] = [];
  const skipped: StationFile['skipped'] = [];
  const latest = isoDay(new Date(), 1);
  data.forEach((cells, i) => {
    const row = i + 2;
    if (cells.every((c) => c === '')) return;
    const station = header.station === null ? '' : (cells[header.station] ?? '');
    if (station) stations.add(station);
    const date = cells[header.date] ?? '';
    const maxRaw = cells[header.tmax] ?? '';
    const minRaw = cells[header.tmin] ?? '';
    const skip = (reason: string) => skipped.push({ row, reason });
    if (!isoDateSchema.safeParse(date).success)
      return skip(`DATE "${date}" is not a date as YYYY-MM-DD`);
    if (maxRaw === '' || minRaw === '')
      return skip(
        `${date}: no ${maxRaw === '' && minRaw === '' ? 'TMAX or TMIN' : maxRaw === '' ? 'TMAX' : 'TMIN'} reading`,
      );
    const max = Number(maxRaw);
    const min = Number(minRaw);
    if (!Number.isFinite(max) || !Number.isFinite(min))
      return skip(`${date}: "${Number.isFinite(max) ? minRaw : maxRaw}" is not a temperature`);
    const maxC = toC(max);
    const minC = toC(min);
    if (minC > maxC) return skip(`${date}: TMIN is above TMAX`);
    if (minC < WEATHER_LIMITS_C.min || maxC > WEATHER_LIMITS_C.max)
      return skip(`${date}: ${min} to ${max} °${unit} is beyond any reading the log takes`);
    if (date < '1950-01-01' || date > latest)
      return skip(`${date}: outside the dates the log takes`);
    if (seen.has(date)) return skip(`${date}: the date is given twice; the first row was kept`);
    seen.add(date);
    readings.push({ date, minC, maxC });
  });
  if (stations.size > 1)
    throw invalid(
      `The file holds ${stations.size} stations (${[...stations].slice(0, 3).join(', ')}${stations.size > 3 ? ', …' : ''}): import one station at a time`,
      { file: 'Download the daily summaries of one station only' },
    );
  readings.sort((a, b) => (a.date < b.date ? -1 : 1));
  return { station: stations.size === 1 ? [...stations][0] : null, unit, readings, skipped };
}
