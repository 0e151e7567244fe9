import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import { keptByStamp } from '../../lib/kept-by-stamp';
import type { GuidelineProfile } from '../../../shared/rules/index';
import type {
  ComplianceGuideline,
  ComplianceItem,
  ComplianceQuery,
  ComplianceReport,
  ComplianceTotals,
} from '../../../shared/schemas/compliance';
import { upcomingSeason } from '../../../shared/schemas/plan';
import { profileOf } from '../advice/stand-guideline';
import type { GuidelineChoice } from './compliance-task';
import { filterAndSort, readsDifferently, toItems, totalsOf } from './compliance-summary';

interface Evaluated {
  items: ComplianceItem[];
  totals: ComplianceTotals;
  compareTotals: ComplianceTotals | null;
  treesChanged: number | null;
}

const describe = (p: GuidelineProfile): ComplianceGuideline => ({
  key: p.key,
  label: p.label,
  source: p.source,
  spacingSource: p.spacingSource,
  diebackLimitPct: p.stressed.diebackPct,
});

export function complianceService(ctx: AppContext) {
  const kept = keptByStamp(ctx.db);

  async function standRow(sugarbushId: number) {
    const row = await ctx
      .db('sugarbushes')
      .where({ id: sugarbushId })
      .first('name', 'profile', 'custom_profile');
    if (!row) throw new AppError(404, 'not-found', 'Sugarbush not found');
    return row as { name: string; profile: string; custom_profile: string | null };
  }

  /** A guideline by its key; `custom` is the stand's own set, which it must have. */
  function guideline(key: string, field: string, customJson: string | null) {
    if (key === 'custom' && !customJson)
      throw new AppError(400, 'invalid-input', 'Some fields need attention', {
        [field]: 'This stand has no custom guideline: choose a published one',
      });
    const choice: GuidelineChoice = {
      profile: key,
      customJson: key === 'custom' ? customJson : null,
    };
    return { choice, profile: profileOf(key, choice.customJson) };
  }

  /** What the report reads, for the season and guidelines asked: worked out once per change. */
  async function evaluate(sugarbushId: number, q: ComplianceQuery) {
    const stand = await standRow(sugarbushId);
    const season = q.season ?? upcomingSeason() - 1;
    const primary = guideline(q.profile ?? stand.profile, 'profile', stand.custom_profile);
    const other = q.compare ? guideline(q.compare, 'compare', stand.custom_profile) : null;
    const stamp = await kept.stamp(sugarbushId);
    const key = `${stamp}:compliance:${season}:${primary.choice.profile}:${other?.choice.profile ?? '-'}`;
    const evaluated = await kept.keep<Evaluated>(key, async () => {
      const guidelines = other ? [primary.choice, other.choice] : [primary.choice];
      const items = toItems(await ctx.advice.compliance(sugarbushId, season, guidelines));
      return {
        items,
        totals: totalsOf(items, (i) => i),
        compareTotals: other ? totalsOf(items, (i) => i.compare!) : null,
        treesChanged: other ? items.filter(readsDifferently).length : null,
      };
    });
    const filter = {
      q: q.q,
      finding: q.finding,
      changed: q.changed === '1' && other !== null,
      sort: q.sort,
    };
    const list = await kept.keep(`${key}:${JSON.stringify(filter)}`, async () =>
      filterAndSort(evaluated.items, filter),
    );
    return { stand, season, primary, other, evaluated, list };
  }

  return {
    async report(sugarbushId: number, q: ComplianceQuery): Promise<ComplianceReport> {
      const { stand, season, primary, other, evaluated, list } = await evaluate(sugarbushId, q);
      const offset = (q.page - 1) * q.pageSize;
      return {
        season,
        sugarbush: { id: sugarbushId, name: stand.name },
        profile: describe(primary.profile),
        compare: other ? describe(other.profile) : null,
        totals: evaluated.totals,
        compareTotals: evaluated.compareTotals,
        treesChanged: evaluated.treesChanged,
        madeOn: new Date().toISOString().slice(0, 10),
        items: list.slice(offset, offset + q.pageSize),
        total: list.length,
        page: q.page,
        pageSize: q.pageSize,
      };
    },

    /** Every row the filters keep, with the stand and guideline keys the CSV names. */
    async rows(sugarbushId: number, q: ComplianceQuery) {
      const { stand, season, primary, other, list } = await evaluate(sugarbushId, q);
      return {
        standName: stand.name,
        season,
        profileKey: primary.profile.key,
        compareKey: other?.profile.key ?? null,
        items: list,
      };
    },
  };
}
