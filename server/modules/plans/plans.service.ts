import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import {
  adviseTree,
  planStand,
  resolveProfile,
  validateCustomProfile,
  type GuidelineProfile,
} from '../../../shared/rules/index';
import {
  upcomingSeason,
  type PlanItem,
  type PlanQuery,
  type ProfileSummary,
  type StandPlanResponse,
  type TreeAdvice,
} from '../../../shared/schemas/plan';
import type {
  GuidelinePreview,
  GuidelinePreviewInput,
} from '../../../shared/schemas/guideline-preview';
import { shared, standVersion } from '../../lib/stand-changes';
import { profileColumns } from '../sugarbushes/profile-choice';
import { diffPlans } from './plan-diff';
import { loadStandTrees } from './plans.repository';

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

/** Trees the advisor does not tap have no meaningful share: they sort after every tapped one. */
const untappable = new Set(['too-small', 'retired', 'unmeasured']);

const sorters: Record<string, (a: PlanItem, b: PlanItem) => number> = {
  tag: (a, b) => a.tag.localeCompare(b.tag),
  taps: (a, b) => a.taps - b.taps,
  dbh: (a, b) => (a.dbhCm ?? -1) - (b.dbhCm ?? -1),
  share: (a, b) => a.conductiveShare - b.conductiveShare,
  verdict: (a, b) => a.verdict.localeCompare(b.verdict),
};

export function plansService(ctx: AppContext) {
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

  /** The whole stand's plan; concurrent requests on the same record share one computation. */
  function wholePlan(sugarbushId: number, season: number) {
    const key = `plan:${sugarbushId}:${season}:${standVersion(ctx.db, sugarbushId)}`;
    return shared(ctx.db, key, async () => {
      const { profile, sunnyAzimuthDeg, notice } = await standSettings(sugarbushId);
      const trees = await loadStandTrees(ctx.db, sugarbushId);
      return { profile, notice, plan: planStand(trees, { season, profile, sunnyAzimuthDeg }) };
    });
  }

  return {
    async adviceForTree(
      sugarbushId: number,
      treeId: number,
      season = upcomingSeason(),
    ): Promise<TreeAdvice> {
      const { profile, sunnyAzimuthDeg, notice } = await standSettings(sugarbushId);
      const [tree] = await loadStandTrees(ctx.db, sugarbushId, treeId);
      if (!tree) throw new AppError(404, 'not-found', 'Tree not found');
      const advice = adviseTree(tree, { season, profile, sunnyAzimuthDeg, withProjection: true });
      return {
        ...advice,
        treeId: tree.id,
        tag: tree.tag,
        season,
        profile: summary(profile, notice),
      };
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
      const { profile: current, plan: before } = await wholePlan(sugarbushId, season);
      const trees = await loadStandTrees(ctx.db, sugarbushId);
      const after = planStand(trees, {
        season,
        profile: target,
        sunnyAzimuthDeg: row.sunny_azimuth_deg,
      });
      return diffPlans(
        { plan: before, label: current.label },
        { plan: after, label: target.label },
      );
    },

    async planForStand(sugarbushId: number, q: PlanQuery): Promise<StandPlanResponse> {
      const season = q.season ?? upcomingSeason();
      const { profile, notice, plan } = await wholePlan(sugarbushId, season);
      let items = plan.items as PlanItem[];
      if (q.q) items = items.filter((i) => i.tag.toLowerCase().includes(q.q!.toLowerCase()));
      if (q.verdict) items = items.filter((i) => i.verdict === q.verdict);
      if (q.warning) items = items.filter((i) => i.warnings.some((w) => w.code === q.warning));
      if (q.sort) {
        const key = q.sort.replace(/^-/, '');
        const sign = q.sort.startsWith('-') ? -1 : 1;
        items = [...items].sort((a, b) => {
          if (key === 'share' && untappable.has(a.verdict) !== untappable.has(b.verdict)) {
            return untappable.has(a.verdict) ? 1 : -1;
          }
          return sign * sorters[key](a, b) || a.tag.localeCompare(b.tag);
        });
      }
      const start = (q.page - 1) * q.pageSize;
      return {
        season,
        profile: summary(profile, notice),
        totals: plan.totals,
        items: items.slice(start, start + q.pageSize),
        total: items.length,
        page: q.page,
        pageSize: q.pageSize,
      };
    },
  };
}

/** The guideline a stand's columns name; a saved custom set that no longer passes is a 409. */
function profileOf(key: string, customJson: string | null): GuidelineProfile {
  if (key !== 'custom') return resolveProfile(key);
  const result = validateCustomProfile(customJson ? JSON.parse(customJson) : null);
  if (!result.ok)
    throw new AppError(
      409,
      'profile-invalid',
      'The saved custom profile is not valid: fix it in Settings',
    );
  return result.profile;
}
