import type { AppContext } from '../../context';
import type { AttentionPage, AttentionQuery } from '../../../shared/schemas/attention';
import { upcomingSeason } from '../../../shared/schemas/plan';
import { attentionRepository } from './attention.repository';
import { followUpDays } from './notes.service';

export function attentionService(ctx: AppContext) {
  const repo = attentionRepository(ctx.db);
  return {
    /** The stand's trees that need a look, for the season's advice (made current first). */
    async queue(sugarbushId: number, q: AttentionQuery): Promise<AttentionPage> {
      const season = q.season ?? upcomingSeason();
      const standVersion = await ctx.advice.ensure(sugarbushId, season);
      const days = followUpDays();
      const range = { offset: (q.page - 1) * q.pageSize, limit: q.pageSize };
      const { items, total } = await repo.page(
        { sugarbushId, season, standVersion },
        q,
        days,
        range,
      );
      return { items, total, page: q.page, pageSize: q.pageSize, season, ...days };
    },
  };
}
