import type { AppContext } from '../../context';
import { isOutside } from '../../../shared/geo/inside';
import { standFigures } from '../../../shared/geo/stand-figures';
import type { MapResponse, StandFigures } from '../../../shared/schemas/map';
import { upcomingSeason, type PlanItem } from '../../../shared/schemas/plan';
import { plansService } from '../plans/plans.service';
import { mapRepository } from './map.repository';

export function mapService(ctx: AppContext) {
  const plans = plansService(ctx);
  const repo = mapRepository(ctx.db);

  /** The season's advice for every tree (the plans service, unpaged), joined to positions. */
  async function standWithAdvice(sugarbushId: number, season: number) {
    const [plan, trees, boundary] = await Promise.all([
      plans.planForStand(sugarbushId, { season, page: 1, pageSize: Number.MAX_SAFE_INTEGER }),
      repo.placedTrees(sugarbushId),
      repo.boundary(sugarbushId),
    ]);
    const advice = new Map<number, PlanItem>(plan.items.map((i) => [i.treeId, i]));
    return { trees, advice, boundary };
  }

  return {
    async map(sugarbushId: number, season = upcomingSeason()): Promise<MapResponse> {
      const { trees, advice, boundary } = await standWithAdvice(sugarbushId, season);
      return {
        season,
        trees: trees.map((t) => {
          const a = advice.get(t.id);
          return {
            id: t.id,
            tag: t.tag,
            lat: t.lat,
            lng: t.lng,
            species: t.species,
            status: t.status,
            dbhCm: a?.dbhCm ?? null,
            verdict: a?.verdict ?? 'unmeasured',
            taps: a?.taps ?? 0,
            placements: (a?.placements ?? []).map((p) => ({
              azimuthDeg: p.azimuthDeg,
              heightCm: p.heightCm,
            })),
            warnings: (a?.warnings ?? []).map((w) => w.code),
            outside: isOutside(boundary, t.lng, t.lat),
          };
        }),
      };
    },

    async figures(sugarbushId: number, season = upcomingSeason()): Promise<StandFigures> {
      const { trees, advice, boundary } = await standWithAdvice(sugarbushId, season);
      return standFigures(
        boundary,
        trees.map((t) => ({
          id: t.id,
          tag: t.tag,
          lat: t.lat,
          lng: t.lng,
          status: t.status,
          dbhCm: advice.get(t.id)?.dbhCm ?? null,
          taps: advice.get(t.id)?.taps ?? 0,
        })),
      );
    },
  };
}
