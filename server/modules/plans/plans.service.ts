import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import { adviseTree, type GuidelineProfile } from '../../../shared/rules/index';
import {
  upcomingSeason,
  type PlanQuery,
  type ProfileSummary,
  type StandPlanResponse,
  type TreeAdvice,
} from '../../../shared/schemas/plan';
import type {
  GuidelinePreview,
  GuidelinePreviewInput,
} from '../../../shared/schemas/guideline-preview';
import { profileColumns } from '../sugarbushes/profile-choice';
import { keptByStamp } from '../../lib/kept-by-stamp';
import { adviceRepository } from '../advice/advice.repository';
import { profileOf } from '../advice/stand-guideline';
import { loadStandTrees } from './plans.repository';
import { notesRepository } from '../notes/notes.repository';

const summary = (p: GuidelineProfile, notice: string | null): ProfileSummary => ({
  key: p.key,
  label: p.label,
  source: p.source,
  heightBand: { minCm: p.heightBand.minCm, maxCm: p.heightBand.maxCm },
  floor: p.zone.floor,
  unit: p.unit,
  spacing: p.spacing,
  stainLengthCm: p.zone.stainLengthCm,
  stainMarginCm: p.zone.stainMarginCm,
  seasonRules: p.seasonRules,
  notice,
});

/**
 * Where a walk starts, to about 10 m (four decimals of a degree): finer is noise in a phone's
 * fix, and each start is an order kept of its own.
 */
function walkStart(q: PlanQuery) {
  if (q.fromLat === undefined || q.fromLng === undefined) return null;
  const round = (deg: number) => Math.round(deg * 1e4) / 1e4;
  return { lat: round(q.fromLat), lng: round(q.fromLng) };
}

export function plansService(ctx: AppContext) {
  const store = adviceRepository(ctx.db);
  const notes = notesRepository(ctx.db);
  async function standRow(sugarbushId: number) {
    const row = await ctx
      .db('sugarbushes')
      .where({ id: sugarbushId })
      .first('profile', 'custom_profile', 'sunny_azimuth_deg', 'profile_notice');
    if (!row) throw new AppError(404, 'not-found', 'Sugarbush not found');
    return row as {
      profile: string;
      custom_profile: string | null;
      sunny_azimuth_deg: number;
      profile_notice: string | null;
    };
  }

  async function standSettings(sugarbushId: number) {
    const row = await standRow(sugarbushId);
    return {
      profile: profileOf(row.profile, row.custom_profile),
      sunnyAzimuthDeg: row.sunny_azimuth_deg,
      notice: row.profile_notice ?? null,
    };
  }

  /**
   * Whole-stand reads (totals, a filtered or re-sorted order, the tree count) change only with
   * the stand's record or guideline: each is worked out once (in a worker where it is heavy) and
   * kept until the stand's change counter moves.
   */
  const kept = keptByStamp(ctx.db);
  const keep = kept.keep;
  async function totalsFor(sugarbushId: number, season: number, version: number, stamp?: string) {
    const key = `${stamp ?? (await kept.stamp(sugarbushId))}:${season}:${version}:totals`;
    return keep(key, () => ctx.advice.totals(sugarbushId, season, version));
  }

  /** The page's trees: straight from the tag index when unfiltered, else from the kept order. */
  async function pageOfPlan(
    sugarbushId: number,
    season: number,
    version: number,
    q: PlanQuery,
    stamp: string,
  ) {
    const offset = (q.page - 1) * q.pageSize;
    const sortKey = (q.sort ?? 'tag').replace(/^-/, '');
    if (!q.q && !q.verdict && !q.warning && !q.share && sortKey === 'tag') {
      const [items, totals] = await Promise.all([
        store.tagPage(sugarbushId, season, version, {
          descending: q.sort === '-tag',
          offset,
          limit: q.pageSize,
        }),
        totalsFor(sugarbushId, season, version, stamp),
      ]);
      return { items, total: totals.trees };
    }
    const filter = {
      q: q.q,
      verdict: q.verdict,
      warning: q.warning,
      share: q.share,
      sort: q.sort,
      ...(sortKey === 'walk' && { from: walkStart(q) }),
    };
    const key = `${stamp}:${season}:${version}:order:${JSON.stringify(filter)}`;
    const ids = await keep(key, () => ctx.advice.orderedIds(sugarbushId, season, version, filter));
    const pageIds = ids.slice(offset, offset + q.pageSize);
    const rows = await store.payloads(season, version, pageIds);
    return {
      items: pageIds.flatMap((id) => {
        const row = rows.get(id);
        return row ? [{ treeId: id, ...row }] : [];
      }),
      total: ids.length,
    };
  }

  type KeptAdvice = Omit<TreeAdvice, 'hazards'>;
  const treeAdvice = new Map<string, Promise<KeptAdvice>>();
  function keepTreeAdvice(key: string, work: () => Promise<KeptAdvice>): Promise<KeptAdvice> {
    let value = treeAdvice.get(key);
    if (!value) {
      value = work();
      treeAdvice.set(key, value);
      value.catch(() => treeAdvice.delete(key));
      while (treeAdvice.size > 500) treeAdvice.delete(treeAdvice.keys().next().value!);
    }
    return value;
  }

  async function adviceFromRecord(
    sugarbushId: number,
    treeId: number,
    season: number,
  ): Promise<KeptAdvice> {
    const { profile, sunnyAzimuthDeg, notice } = await standSettings(sugarbushId);
    const [tree] = await loadStandTrees(ctx.db, sugarbushId, treeId);
    if (!tree) throw new AppError(404, 'not-found', 'Tree not found');
    const advice = adviseTree(tree, { season, profile, sunnyAzimuthDeg, withProjection: true });
    return { ...advice, treeId: tree.id, tag: tree.tag, season, profile: summary(profile, notice) };
  }

  async function complete(sugarbushId: number, season: number, version: number, stamp: string) {
    const key = `${stamp}:trees`;
    const [totals, trees] = await Promise.all([
      totalsFor(sugarbushId, season, version, stamp),
      keep(key, async () =>
        Number((await ctx.db('trees').where({ sugarbush_id: sugarbushId }).count({ n: '*' }))[0].n),
      ),
    ]);
    return totals.trees === trees;
  }

  return {
    async adviceForTree(
      sugarbushId: number,
      treeId: number,
      season = upcomingSeason(),
    ): Promise<TreeAdvice> {
      // A tree's advice with its projection is a pure function of its record, the guideline and
      // the season: kept by their versions, so it is worked out once per change.
      const [versions, stand] = await Promise.all([
        ctx.db('trees').where({ id: treeId, sugarbush_id: sugarbushId }).first('record_version'),
        ctx.db('sugarbushes').where({ id: sugarbushId }).first('advice_version'),
      ]);
      if (!versions) throw new AppError(404, 'not-found', 'Tree not found');
      const key = `${treeId}:${versions.record_version}:${stand?.advice_version}:${season}`;
      // Hazard notes change without the record: read each time, beside the kept advice.
      const [advice, hazards] = await Promise.all([
        keepTreeAdvice(key, () => adviceFromRecord(sugarbushId, treeId, season)),
        notes.openHazards([treeId]),
      ]);
      return { ...advice, hazards: hazards.get(treeId) ?? [] };
    },

    /** The season's plan under another guideline, against today's, before the owner saves it. */
    async previewGuideline(
      sugarbushId: number,
      input: GuidelinePreviewInput,
    ): Promise<GuidelinePreview> {
      const season = input.season ?? upcomingSeason();
      const row = await standRow(sugarbushId);
      const stored = row.custom_profile ? JSON.parse(row.custom_profile) : null;
      const columns = profileColumns(input, { profile: row.profile, customProfile: stored });
      const target = profileOf(
        input.profile,
        (columns.custom_profile as string | undefined) ?? row.custom_profile,
      );
      const current = profileOf(row.profile, row.custom_profile);
      const version = await ctx.advice.ensure(sugarbushId, season);
      return ctx.advice.preview(sugarbushId, season, version, {
        profile: input.profile,
        customJson: (columns.custom_profile as string | undefined) ?? row.custom_profile,
        from: { profile: current.key, label: current.label },
        label: target.label,
      });
    },

    /**
     * The plan page as the JSON text it is sent as: each item is the stored advice's own JSON
     * with the tree's id and tag added, so a page is never parsed and written out again.
     */
    async planForStandJson(sugarbushId: number, q: PlanQuery): Promise<string> {
      const season = q.season ?? upcomingSeason();
      const { profile, notice } = await standSettings(sugarbushId);
      let version = await ctx.advice.ensure(sugarbushId, season);
      let stamp = await kept.stamp(sugarbushId);
      // Every tree must have a current row; a write that went around the services shows here.
      if (!(await complete(sugarbushId, season, version, stamp))) {
        version = await ctx.advice.ensure(sugarbushId, season, { recheck: true });
        stamp = await kept.stamp(sugarbushId);
      }
      const [page, totals] = await Promise.all([
        pageOfPlan(sugarbushId, season, version, q, stamp),
        totalsFor(sugarbushId, season, version, stamp),
      ]);
      const head: Omit<StandPlanResponse, 'items'> = {
        season,
        profile: summary(profile, notice),
        totals,
        total: page.total,
        page: q.page,
        pageSize: q.pageSize,
      };
      // The page's trees' open hazard notes, in one query: the tapper reads them at the tree.
      const hazards = await notes.openHazards(page.items.map((i) => i.treeId));
      const items = page.items.map(
        // The payload is an object's JSON: close it with the fields every item carries.
        (i) =>
          `${i.payload.slice(0, -1)},"treeId":${i.treeId},"tag":${JSON.stringify(i.tag)},` +
          `"hazards":${JSON.stringify(hazards.get(i.treeId) ?? [])}}`,
      );
      return `${JSON.stringify(head).slice(0, -1)},"items":[${items.join(',')}]}`;
    },
  };
}
