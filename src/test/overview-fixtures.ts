import { warningCodes, type WarningCode } from '@shared/rules/index';
import type { AuditItem, AuditPage } from '@shared/schemas/audit';
import type {
  ComplianceItem,
  ComplianceReport,
  ComplianceTotals,
} from '@shared/schemas/compliance';
import type { TrendSeason, TrendsResponse } from '@shared/schemas/trends';
import { SUGARBUSH_ID } from './fixtures';

const noWarnings = Object.fromEntries(warningCodes.map((c) => [c, 0])) as Record<
  WarningCode,
  number
>;

/** 1 ft²/acre = 0.229568 m²/ha. */
const M2HA_PER_FT2ACRE = 0.09290304 / 0.40468564224;

export const trendSeason = (
  season: number,
  over: Partial<TrendSeason> & { basalFt2?: number } = {},
): TrendSeason => {
  const { basalFt2 = 86, ...rest } = over;
  return {
    season,
    planned: false,
    trees: 1000,
    byStatus: { active: 990, 'held-out': 4, dead: 4, removed: 2 },
    dbhCm: { trees: 990, q1: 35, median: 42.5, q3: 50 },
    basalAreaGrowthCm2: { trees: 980, q1: 20, median: 30, q3: 45 },
    basalAreaFt2PerAcre: basalFt2,
    basalAreaM2PerHa: basalFt2 * M2HA_PER_FT2ACRE,
    treesPerAcre: 60,
    treesPerHa: 148.3,
    tapsSetPerAcre: 75,
    tapsSetPerHa: 185.3,
    tapsAdvisedPerAcre: 74,
    tapsAdvisedPerHa: 182.9,
    tapsSet: 1250,
    treesTapped: 820,
    tapsAdvised: 1240,
    treesAdvisedToTap: 815,
    treesOverAdvice: 12,
    tapsOverAdvice: 14,
    warnings: { ...noWarnings, 'slow-growth': 60, 'crown-dieback': 20 },
    sharedTrees: 850,
    shareBands: { 'under-80': 2, '80-85': 8, '85-90': 10, '90-95': 30, '95-up': 800 },
    crownRated: 1000,
    crownClasses: [
      { pct: 0, trees: 700 },
      { pct: 5, trees: 200 },
      { pct: 10, trees: 80 },
      { pct: 20, trees: 20 },
    ],
    ...rest,
  };
};

export const trendsResponse = (over: Partial<TrendsResponse> = {}): TrendsResponse => ({
  sugarbushId: SUGARBUSH_ID,
  profile: {
    key: 'conservative',
    label: 'Conservative (one tap from 12 in, two from 18 in)',
    source: 'NAMSPM',
  },
  upcoming: 2027,
  boundary: true,
  areaHa: 8.1,
  areaAcres: 20,
  items: [
    trendSeason(2024, { basalFt2: 86 }),
    trendSeason(2025, {
      basalFt2: 89,
      basalAreaGrowthCm2: { trees: 980, q1: 10, median: 19.4, q3: 30 },
    }),
    trendSeason(2026, { basalFt2: 92, tapsSet: 1300, tapsAdvised: 1280, treesOverAdvice: 15 }),
    trendSeason(2027, {
      basalFt2: 92,
      planned: true,
      tapsSet: 0,
      treesTapped: 0,
      tapsAdvised: 1310,
      basalAreaGrowthCm2: null,
      crownRated: 0,
      crownClasses: [],
      warnings: { ...noWarnings, 'slow-growth': 120, 'crown-dieback': 25 },
    }),
  ],
  ...over,
});

export const complianceTotals = (over: Partial<ComplianceTotals> = {}): ComplianceTotals => ({
  treesTapped: 820,
  tapsSet: 1300,
  tapsAllowed: 1290,
  tapsOver: 14,
  treesOver: 9,
  holesTooClose: 6,
  treesTooClose: 4,
  treesTooSmall: 1,
  treesDeclining: 3,
  treesUnmeasured: 0,
  treesWithFindings: 15,
  treesCompliant: 805,
  ...over,
});

export const complianceItem = (over: Partial<ComplianceItem> = {}): ComplianceItem => ({
  treeId: 64,
  tag: '0064',
  dbhBeforeCm: 57.4,
  dbhMeasuredOn: '2025-10-05',
  diebackBeforePct: 0,
  tapsSet: 3,
  tapsAllowed: 2,
  tapsOver: 1,
  holesTooClose: 0,
  findings: ['over'],
  compare: null,
  ...over,
});

export const complianceReport = (over: Partial<ComplianceReport> = {}): ComplianceReport => ({
  season: 2026,
  sugarbush: { id: SUGARBUSH_ID, name: 'Hollow Creek' },
  profile: {
    key: 'conservative',
    label: 'Conservative (one tap from 12 in, two from 18 in)',
    source: 'North American Maple Syrup Producers Manual (NAMSPM), 2nd ed. 2006',
    spacingSource: 'UVM Proctor sap-yield tips 2020',
    diebackLimitPct: 15,
  },
  compare: null,
  totals: complianceTotals(),
  compareTotals: null,
  treesChanged: null,
  madeOn: '2026-12-02',
  items: [
    complianceItem(),
    complianceItem({
      treeId: 118,
      tag: '0118',
      dbhBeforeCm: 47.9,
      diebackBeforePct: 35,
      tapsSet: 1,
      tapsOver: 0,
      findings: ['declining'],
    }),
  ],
  total: 2,
  page: 1,
  pageSize: 50,
  ...over,
});

export const auditItem = (over: Partial<AuditItem> = {}): AuditItem => ({
  id: 1,
  at: '2026-10-02T16:30:00Z',
  userId: 12,
  userName: 'Ines Forester',
  action: 'create',
  kind: 'measurement',
  entityId: 501,
  tree: { id: 7, tag: '0412' },
  detail: { measuredOn: '2026-10-02', dbhCm: 41.2, crownDiebackPct: 5 },
  ...over,
});

export const auditPage = (items: AuditItem[], over: Partial<AuditPage> = {}): AuditPage => ({
  items,
  total: items.length,
  page: 1,
  pageSize: 25,
  people: [
    { id: 11, name: 'Pat owner' },
    { id: 12, name: 'Ines Forester' },
  ],
  ...over,
});
