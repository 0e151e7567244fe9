import type { AppContext } from '../../context';
import { standFigures } from '../../../shared/geo/stand-figures';
import type { StandFigures } from '../../../shared/schemas/map';
import { upcomingSeason } from '../../../shared/schemas/plan';
import { standGuideline } from '../advice/stand-guideline';
import { mapAnswers } from './map-answers';
import type { MapBytes } from './map-task';
import { mapRepository } from './map.repository';

/** Bumped when the map answer changes shape, so no browser keeps an answer of the old shape. */
const MAP_FORMAT = 1;

export interface MapVersion {
  /** The guideline version whose stored rows are complete for the season. */
  adviceVersion: number;
  etag: string;
}

/** Answers kept: a few stands or seasons open at once, each a minute at most. */
const KEPT_ANSWERS = 4;
const KEEP_MS = 60_000;

export function mapService(ctx: AppContext) {
  const repo = mapRepository(ctx.db);
  const answers = mapAnswers({ size: KEPT_ANSWERS, keepMs: KEEP_MS });

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

    /**
     * The map's answer at a version, as bytes ready to send (gzipped too when `gzip`): built,
     * serialised and compressed in an advice worker, kept a short while by its tag, and shared
     * by requests that ask for the same version while it is built.
     */
    mapBytes(
      sugarbushId: number,
      season: number,
      version: MapVersion,
      gzip: boolean,
    ): Promise<MapBytes> {
      return answers.get(version.etag, gzip, async (withGzip) => {
        const built = await ctx.advice.mapBytes(
          sugarbushId,
          season,
          version.adviceVersion,
          withGzip,
        );
        if (built.complete) return built;
        const recheck = await ctx.advice.ensure(sugarbushId, season, { recheck: true });
        return ctx.advice.mapBytes(sugarbushId, season, recheck, withGzip);
      });
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
