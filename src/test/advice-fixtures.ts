import { warningCodes, type PlanTotals, type WarningCode } from '@shared/rules/index';
import type { PlanItem, StandPlanResponse, TreeAdvice } from '@shared/schemas/plan';

/** Test data for advice and plans: a healthy 18-in tree advised two taps. */

const profile = {
  key: 'conservative',
  label: 'Conservative (one tap from 12 in, two from 18 in)',
  source: 'NAMSPM 2nd ed. 2006, as summarised by UVM Proctor',
  heightBand: { minCm: 60, maxCm: 150 },
  floor: 0.82,
  unit: 'in' as const,
  spacing: { sidewaysCm: 10.16, verticalCm: 30.48, rule: 'either' as const },
  stainLengthCm: 30,
  stainMarginCm: 1,
  seasonRules: [],
  notice: null,
};

export const planItem = (overrides: Partial<PlanItem> = {}): PlanItem => ({
  treeId: 7,
  tag: '0412',
  taps: 2,
  verdict: 'tap',
  depthCm: 5.08,
  bitCm: 0.79375,
  placements: [
    { azimuthDeg: 180, heightCm: 110 },
    { azimuthDeg: 0, heightCm: 80 },
  ],
  conductiveShare: 0.94,
  warnings: [],
  reasons: [],
  profileKey: 'conservative',
  tableTaps: 2,
  guidelineTaps: 2,
  dbhCm: 47,
  collection: 'vacuum',
  growth: null,
  radialGrowthCmPerYear: 0.25,
  growthAssumed: false,
  basalAreaGrowthIn2: 7.05,
  minimumGrowthIn2: 2.6,
  minimumGrowthTaps: 2,
  shareAfter: 0.93,
  steadyStateShare: 0.92,
  maxSustainableTaps: 6,
  stainReachSeasons: 18,
  drillingNotes: [
    {
      text: 'Do not drill a frozen trunk: wait until it is no colder than about −5 °C.',
      source: 'OMAFRA guidance',
    },
  ],
  frozen: null,
  hazards: [],
  ...overrides,
});

export const treeAdvice = (overrides: Partial<TreeAdvice> = {}): TreeAdvice => ({
  ...planItem(),
  season: 2027,
  profile,
  projection: Array.from({ length: 20 }, (_, i) => ({
    season: 2027 + i,
    dbhCm: 47 + i * 0.5,
    shareBefore: 0.94 - i * 0.001,
    shareAfter: 0.93 - i * 0.001,
  })),
  holesInReach: [],
  ...overrides,
});

const noWarnings = Object.fromEntries(warningCodes.map((c) => [c, 0])) as Record<
  WarningCode,
  number
>;

export const planTotals = (overrides: Partial<PlanTotals> = {}): PlanTotals => ({
  trees: 1187,
  treesToTap: 993,
  taps: 1497,
  reduced: 18,
  rested: 13,
  tooSmall: 167,
  retired: 11,
  unmeasured: 3,
  warningsByCode: { ...noWarnings, undersized: 167, overtapped: 17, 'zone-depleted': 1 },
  ...overrides,
});

export const standPlan = (
  items: PlanItem[],
  overrides: Partial<StandPlanResponse> = {},
): StandPlanResponse => ({
  season: 2027,
  profile,
  totals: planTotals(),
  items,
  total: items.length,
  page: 1,
  pageSize: 50,
  ...overrides,
});
