import type { AppContext } from '../../context';
import { keptByStamp } from '../../lib/kept-by-stamp';
import { acresFromM2, hectaresFromM2 } from '../../../shared/geo/area';
import { upcomingSeason } from '../../../shared/schemas/plan';
import type { TrendsResponse } from '../../../shared/schemas/trends';
import { standGuideline } from '../advice/stand-guideline';

/** The most seasons the trends go back: a long record shows its last fifteen. */
export const MAX_TREND_SEASONS = 15;

export function trendsService(ctx: AppContext) {
  const kept = keptByStamp(ctx.db);

  /**
   * The stand's seasons on record, and each one's stored advice made current: the first read of
   * a season advises the stand for it in worker threads; from then on every write keeps it
   * current, as it does the plan's.
   */
  async function currentSeasons(sugarbushId: number, upcoming: number, recheck: number[] = []) {
    const stamp = await kept.stamp(sugarbushId);
    const recorded = await kept.keep(`${stamp}:recorded-seasons`, () =>
      ctx.advice.recordedSeasons(sugarbushId),
    );
    const seasons = [...recorded.filter((s) => s < upcoming), upcoming].slice(
      -MAX_TREND_SEASONS - 1,
    );
    const versions: number[] = [];
    for (const season of seasons)
      versions.push(
        await ctx.advice.ensure(sugarbushId, season, { recheck: recheck.includes(season) }),
      );
    return seasons.map((season, i) => ({ season, standVersion: versions[i] }));
  }

  return {
    async trends(sugarbushId: number): Promise<TrendsResponse> {
      const upcoming = upcomingSeason();
      const { profile } = await standGuideline(ctx.db, sugarbushId); // a broken custom set: 409
      const figures = async (recheck?: number[]) => {
        const seasons = await currentSeasons(sugarbushId, upcoming, recheck);
        const stamp = await kept.stamp(sugarbushId);
        const key = `${stamp}:trends:${upcoming}:${JSON.stringify(seasons)}`;
        return kept.keep(key, () => ctx.advice.trends(sugarbushId, seasons, upcoming));
      };
      let result = await figures();
      // A tree without a current row means a write went around the services: check those again.
      if (result.incomplete.length > 0) result = await figures(result.incomplete);
      const { areaM2 } = result;
      return {
        sugarbushId,
        profile: { key: profile.key, label: profile.label, source: profile.source },
        upcoming,
        boundary: areaM2 !== null,
        areaHa: areaM2 === null ? null : hectaresFromM2(areaM2),
        areaAcres: areaM2 === null ? null : acresFromM2(areaM2),
        items: result.items,
      };
    },
  };
}
