import { z } from 'zod';
import { complianceFindings, profileKeys, type ComplianceFinding } from '../rules/index';
import { listQuerySchema, type Page } from './list-query';
import { seasonSchema } from './plan';

/** A guideline to hold the tapping against: a built-in profile's key, or the stand's custom set. */
export const guidelineKeySchema = z
  .string()
  .refine((key) => key === 'custom' || (profileKeys as readonly string[]).includes(key), {
    message: `Choose one of ${[...profileKeys, 'custom'].join(', ')}`,
  });

export const complianceFilterKeys = [...complianceFindings, 'any', 'none'] as const;
export type ComplianceFilter = (typeof complianceFilterKeys)[number];

export const complianceSorts = ['tag', '-tag', 'over', '-over', 'dbh', '-dbh'] as const;
export type ComplianceSort = (typeof complianceSorts)[number];

export const complianceQuerySchema = listQuerySchema.extend({
  /** The season whose tapping is read; the one before the upcoming season when left out. */
  season: seasonSchema.optional(),
  /** The stand's own guideline when left out. */
  profile: guidelineKeySchema.optional(),
  /** A second guideline read beside the first. */
  compare: guidelineKeySchema.optional(),
  /** Trees with this finding, with any, or with none. */
  finding: z.enum(complianceFilterKeys).optional(),
  /** `1`: only trees the two guidelines read differently. */
  changed: z.enum(['1']).optional(),
  sort: z.enum(complianceSorts).optional(),
});
export type ComplianceQuery = z.output<typeof complianceQuerySchema>;

/** One tree's tapping in the season under one guideline. */
export interface ComplianceReading {
  tapsAllowed: number | null;
  tapsOver: number;
  holesTooClose: number;
  findings: ComplianceFinding[];
}

/** A tree tapped in the season: what was set, and what the guideline(s) allowed. */
export interface ComplianceItem extends ComplianceReading {
  treeId: number;
  tag: string;
  dbhBeforeCm: number | null;
  dbhMeasuredOn: string | null;
  diebackBeforePct: number | null;
  tapsSet: number;
  compare: ComplianceReading | null;
}

export interface ComplianceTotals {
  treesTapped: number;
  tapsSet: number;
  /** Taps the guideline allowed the tapped trees (trees without a DBH before count none). */
  tapsAllowed: number;
  tapsOver: number;
  treesOver: number;
  holesTooClose: number;
  treesTooClose: number;
  treesTooSmall: number;
  treesDeclining: number;
  treesUnmeasured: number;
  treesWithFindings: number;
  /** Tapped trees with no finding. */
  treesCompliant: number;
}

export interface ComplianceGuideline {
  key: string;
  label: string;
  /** Where the tap table comes from. */
  source: string;
  /** Where the spacing comes from. */
  spacingSource: string;
  /** Crown dieback over this share makes a tree declining (stressed) under the guideline. */
  diebackLimitPct: number;
}

export interface ComplianceReport extends Page<ComplianceItem> {
  season: number;
  sugarbush: { id: number; name: string };
  profile: ComplianceGuideline;
  compare: ComplianceGuideline | null;
  totals: ComplianceTotals;
  compareTotals: ComplianceTotals | null;
  /** Tapped trees the two guidelines read differently (allowed taps or findings); null alone. */
  treesChanged: number | null;
  /** The day the report was made, YYYY-MM-DD (UTC). */
  madeOn: string;
}

/** The CSV's columns, in order; lengths in cm, the guideline by its key. */
export const complianceCsvColumns = [
  'tag',
  'season',
  'profile',
  'dbhBeforeCm',
  'dbhMeasuredOn',
  'crownDiebackBeforePct',
  'tapsSet',
  'tapsAllowed',
  'tapsOver',
  'holesTooClose',
  'findings',
] as const;
export const complianceCsvCompareColumns = [
  'compareProfile',
  'compareTapsAllowed',
  'compareTapsOver',
  'compareHolesTooClose',
  'compareFindings',
] as const;
