import type { Boundary } from '../../../shared/geo/boundary';
import { isOutside } from '../../../shared/geo/inside';
import { MAP_COORD_DECIMALS, mapCodes, type MapColumns } from '../../../shared/schemas/map';
import type { StandRow } from './map.repository';

const scale = 10 ** MAP_COORD_DECIMALS;
const degrees = (v: number | null) => (v === null ? null : Math.round(v * scale) / scale);

const indexOf = <T extends string>(codes: readonly T[]) => {
  const at = new Map<string, number>(codes.map((c, i) => [c, i]));
  return (code: string) => at.get(code) ?? -1;
};
const verdictIndex = indexOf(mapCodes.verdict);
const statusIndex = indexOf(mapCodes.status);
const speciesIndex = indexOf(mapCodes.species);
const UNMEASURED = verdictIndex('unmeasured');

/** The map's answer, column by column, from the stand's rows in tag order and its boundary. */
export function mapColumns(
  season: number,
  rows: readonly StandRow[],
  boundary: Boundary | null,
): MapColumns {
  const n = rows.length;
  const out: MapColumns = {
    season,
    count: n,
    codes: mapCodes,
    ids: new Array<number>(n),
    tags: new Array<string>(n),
    lat: new Array<number | null>(n),
    lng: new Array<number | null>(n),
    verdict: new Array<number>(n),
    taps: new Array<number>(n),
    warnings: new Array<number>(n),
    status: new Array<number>(n),
    species: new Array<number>(n),
    outside: new Array<0 | 1>(n),
  };
  rows.forEach((r, i) => {
    out.ids[i] = Number(r.id);
    out.tags[i] = r.tag;
    out.lat[i] = degrees(r.lat);
    out.lng[i] = degrees(r.lng);
    out.verdict[i] = r.verdict === null ? UNMEASURED : verdictIndex(r.verdict);
    out.taps[i] = Number(r.taps ?? 0);
    out.warnings[i] = Number(r.warning_mask ?? 0);
    out.status[i] = statusIndex(r.status);
    out.species[i] = speciesIndex(r.species);
    // The stored position, not the rounded one, decides: as the stand figures do.
    out.outside[i] = isOutside(boundary, r.lng, r.lat) ? 1 : 0;
  });
  return out;
}
