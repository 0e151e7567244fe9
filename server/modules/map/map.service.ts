import type { AppContext } from '../../context';
import { isOutside } from '../../../shared/geo/inside';
import { standFigures } from '../../../shared/geo/stand-figures';
import {
  MAP_COORD_DECIMALS,
  mapCodes,
  type MapColumns,
  type StandFigures,
} from '../../../shared/schemas/map';
import { upcomingSeason } from '../../../shared/schemas/plan';
import { standGuideline } from '../advice/stand-guideline';
import { mapRepository, type StandRow } from './map.repository';

/** Bumped when the map answer changes shape, so no browser keeps an answer of the old shape. */
const MAP_FORMAT = 1;

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

export interface MapVersion {
  /** The guideline version whose stored rows are complete for the season. */
  adviceVersion: number;
  etag: string;
}

export function mapService(ctx: AppContext) {
  const repo = mapRepository(ctx.db);

  /** A saved custom guideline that no longer passes is a 409 here too, as on the plan. */
  async function currentVersion(sugarbushId: number, season: number) {
    await standGuideline(ctx.db, sugarbushId);
    return ctx.advice.ensure(sugarbushId, season);
  }

  /**
   * The season's stored advice for every tree. A tree without a current row means a write went
   * around the services: the stand is checked again once, as the plan does.
   */
  async function stand(sugarbushId: number, season: number, adviceVersion?: number) {
    let version = adviceVersion ?? (await currentVersion(sugarbushId, season));
    let rows = await repo.standRows(sugarbushId, season, version);
    if (rows.some((r) => r.verdict === null)) {
      version = await ctx.advice.ensure(sugarbushId, season, { recheck: true });
      rows = await repo.standRows(sugarbushId, season, version);
    }
    return rows;
  }

  return {
    /**
     * What the map answer is made of: the stand's change counter (bumped by every write to a
     * tree's record, the boundary or the stored advice), the guideline version and the season.
     * The counter is read before the rows, so an answer is never older than its tag.
     */
    async mapVersion(sugarbushId: number, season: number): Promise<MapVersion> {
      const adviceVersion = await currentVersion(sugarbushId, season);
      const seq = await repo.recordSeq(sugarbushId);
      return {
        adviceVersion,
        etag: `W/"map-${MAP_FORMAT}-${sugarbushId}-${season}-${adviceVersion}-${seq}"`,
      };
    },

    async map(
      sugarbushId: number,
      season = upcomingSeason(),
      adviceVersion?: number,
    ): Promise<MapColumns> {
      const [rows, boundary] = await Promise.all([
        stand(sugarbushId, season, adviceVersion),
        repo.boundary(sugarbushId),
      ]);
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
      rows.forEach((r: StandRow, i) => {
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
    },

    async figures(sugarbushId: number, season = upcomingSeason()): Promise<StandFigures> {
      const [rows, boundary] = await Promise.all([
        stand(sugarbushId, season),
        repo.boundary(sugarbushId),
      ]);
      return standFigures(
        boundary,
        rows.map((r) => ({
          id: Number(r.id),
          tag: r.tag,
          lat: r.lat,
          lng: r.lng,
          status: r.status,
          // The season's standing DBH as the advisor read it (an unconfirmed outlier left out).
          dbhCm: r.dbh_cm,
          taps: Number(r.taps ?? 0),
        })),
      );
    },
  };
}
