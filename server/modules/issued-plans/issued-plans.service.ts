import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import { keptByStamp } from '../../lib/kept-by-stamp';
import type {
  FieldSheetLine,
  FieldSheetPage,
  FieldSheetQuery,
  IssuedItem,
  IssuedPlanHeader,
  IssuedPlanQuery,
  IssuedPlanResponse,
  IssuedPlanVersions,
  SeasonProgress,
} from '../../../shared/schemas/issued-plan';
import { upcomingSeason } from '../../../shared/schemas/plan';
import type { Advice } from '../../../shared/rules/index';
import { adviceRepository } from '../advice/advice.repository';
import { standGuideline } from '../advice/stand-guideline';
import { notesRepository } from '../notes/notes.repository';
import type { ChangesResult, IssueResult, ProgressResult, SheetOrder } from './issued-plan-tasks';
import { issuedPlansRepository } from './issued-plans.repository';

const notIssued = (season: number) =>
  new AppError(404, 'not-found', `No plan has been issued for ${season}`);

export function issuedPlansService(ctx: AppContext) {
  const repo = issuedPlansRepository(ctx.db);
  const advice = adviceRepository(ctx.db);
  const notes = notesRepository(ctx.db);
  // The diff, the progress and the sheet's order walk the stand: kept until it changes.
  const kept = keptByStamp(ctx.db);

  /** The season's advice made current, with the stamp the kept answers are filed under. */
  async function current(sugarbushId: number, season: number) {
    const version = await ctx.advice.ensure(sugarbushId, season);
    return { version, stamp: await kept.stamp(sugarbushId) };
  }

  return {
    async issue(sugarbushId: number, userId: number, season: number): Promise<IssuedPlanHeader> {
      const user = await ctx.db('users').where({ id: userId }).first('name');
      for (let attempt = 0; attempt < 3; attempt++) {
        // Recheck: a write that went around the services must not leave a tree out of the copy.
        const standVersion = await ctx.advice.ensure(sugarbushId, season, { recheck: true });
        const result = await ctx.advice.issuedPlan<IssueResult>({
          kind: 'issue',
          sugarbushId,
          season,
          standVersion,
          issuedBy: { id: userId, name: String(user?.name ?? '') },
        });
        if ('issued' in result)
          return (await repo.header(sugarbushId, season, result.issued.version))!;
      }
      throw new AppError(503, 'advice-busy', 'The stand keeps changing: try again in a moment');
    },

    async versions(sugarbushId: number): Promise<IssuedPlanVersions> {
      const all = await repo.versions(sugarbushId);
      return { items: all.map(({ totals: _totals, ...head }) => head) };
    },

    async read(
      sugarbushId: number,
      season: number,
      q: IssuedPlanQuery,
    ): Promise<IssuedPlanResponse> {
      const plan = await repo.header(sugarbushId, season, q.version);
      if (!plan) throw notIssued(season);
      const [items, latestVersion, { version, stamp }] = await Promise.all([
        repo.itemsPage(plan.id, (q.page - 1) * q.pageSize, q.pageSize),
        repo.latestVersion(sugarbushId, season),
        current(sugarbushId, season),
      ]);
      const all = await kept.keep(`${stamp}:${season}:${version}:${plan.id}:changes`, () =>
        ctx.advice.issuedPlan<ChangesResult>({
          kind: 'changes',
          sugarbushId,
          season,
          standVersion: version,
          issuedPlanId: plan.id,
        }),
      );
      const from = (q.changesPage - 1) * q.changesPageSize;
      return {
        plan,
        latestVersion,
        // The copy holds a row for every tree it counted.
        items: { items, total: plan.totals.trees, page: q.page, pageSize: q.pageSize },
        changes: {
          items: all.changes.slice(from, from + q.changesPageSize),
          total: all.changes.length,
          page: q.changesPage,
          pageSize: q.changesPageSize,
          byKind: all.byKind,
        },
      };
    },

    async progress(sugarbushId: number, season = upcomingSeason()): Promise<SeasonProgress> {
      const plan = await repo.header(sugarbushId, season);
      const { version, stamp } = await current(sugarbushId, season);
      const figures = await kept.keep(`${stamp}:${season}:${version}:${plan?.id}:progress`, () =>
        ctx.advice.issuedPlan<ProgressResult>({
          kind: 'progress',
          sugarbushId,
          season,
          standVersion: version,
          issuedPlanId: plan?.id ?? null,
        }),
      );
      return {
        season,
        plannedFrom: plan ? 'issued' : 'advice',
        issuedVersion: plan?.version ?? null,
        ...figures,
      };
    },

    /**
     * A page of the printed field sheet: the issued copy when the season has one, else today's
     * advice; trees to tap through the plan's filters, in walking order.
     */
    async fieldSheet(sugarbushId: number, q: FieldSheetQuery): Promise<FieldSheetPage> {
      const season = q.season ?? upcomingSeason();
      const [plan, stand, guideline] = await Promise.all([
        repo.header(sugarbushId, season),
        ctx.db('sugarbushes').where({ id: sugarbushId }).first('name'),
        standGuideline(ctx.db, sugarbushId),
      ]);
      const { version, stamp } = await current(sugarbushId, season);
      const filter = { q: q.q, verdict: q.verdict, warning: q.warning, share: q.share };
      const order = await kept.keep(
        `${stamp}:${season}:${version}:${plan?.id}:sheet:${JSON.stringify(filter)}`,
        () =>
          ctx.advice.issuedPlan<SheetOrder>({
            kind: 'sheet-order',
            sugarbushId,
            season,
            standVersion: version,
            issuedPlanId: plan?.id ?? null,
            filter,
          }),
      );
      const offset = (q.page - 1) * q.pageSize;
      const pageIds = order.ids.slice(offset, offset + q.pageSize);
      const [lines, hazards] = await Promise.all([
        plan ? repo.itemsOf(plan.id, pageIds) : adviceLines(season, version, pageIds),
        notes.openHazards(pageIds),
      ]);
      const items: FieldSheetLine[] = pageIds.flatMap((id, n) => {
        const line = lines.get(id);
        if (!line) return [];
        // A hazard noted since the plan was issued is printed too: the crew reads it first.
        const open = (hazards.get(id) ?? []).map((h) => h.body);
        return [
          { ...line, hazards: [...new Set([...line.hazards, ...open])], position: offset + n + 1 },
        ];
      });
      return {
        season,
        printing: plan ? 'issued' : 'advice',
        issued: plan
          ? { version: plan.version, issuedAt: plan.issuedAt, issuedBy: plan.issuedBy.name }
          : null,
        profile: plan
          ? { key: plan.profile.key, label: plan.profile.label, source: plan.profile.source }
          : {
              key: guideline.profile.key,
              label: guideline.profile.label,
              source: guideline.profile.source,
            },
        standName: String(stand?.name ?? ''),
        taps: order.taps,
        items,
        total: order.ids.length,
        page: q.page,
        pageSize: q.pageSize,
      };
    },
  };

  /** Today's stored advice of these trees, as sheet lines. */
  async function adviceLines(season: number, version: number, ids: number[]) {
    const rows = await advice.payloads(season, version, ids);
    const lines = new Map<number, IssuedItem>();
    for (const [id, row] of rows) {
      const a = JSON.parse(row.payload) as Advice;
      lines.set(id, {
        treeId: id,
        tag: row.tag,
        verdict: a.verdict,
        taps: a.taps,
        placements: a.placements.map((p) => ({ azimuthDeg: p.azimuthDeg, heightCm: p.heightCm })),
        bitCm: a.bitCm,
        depthCm: a.depthCm,
        hazards: [],
      });
    }
    return lines;
  }
}
