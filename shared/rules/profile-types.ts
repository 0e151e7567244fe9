import type { Collection } from '../schemas/enums';

/** One row of a guideline table: from this DBH up to the next row's edge, this many taps. */
export interface TapBand {
  /** Lower edge in the table's own unit, as the guideline writes it (12 for "12–<18 in"). */
  from: number;
  /** The same edge in centimetres (for display and sorting; lookups compare in the table's unit). */
  fromCm: number;
  taps: number;
  /**
   * The table allows `taps` here only for healthy, fast-growing trees; otherwise `taps - 1`.
   * `tapsForDbh` still returns `taps`: the table lookup alone. The advisor applies the condition.
   */
  fullOnlyForHealthyFastGrowers?: boolean;
}

export interface DrillSetting {
  /** Drilled depth including bark, cm. */
  depthCm: number;
  bitCm: number;
}

export interface StressedTreeRules {
  /** Most taps for a stressed tree (crown dieback above `diebackPct`, or flagged as stressed). */
  maxTaps: number;
  /** Stressed trees below this DBH get none. */
  noneBelowCm: number;
  /** Dieback above this share (%) makes a tree stressed. */
  diebackPct: number;
  /** Dieback at or above this share (%) rests the tree entirely (severe decline). */
  restAtDiebackPct: number;
}

/** Parameters of the tapping-zone model (docs/decisions/001-tapping-zone-model.md). */
export interface ZoneParams {
  barkCm: number;
  stainLengthCm: number;
  stainMarginCm: number;
  zoneHeightCm: number;
  /** Lowest steady-state conductive share that counts as sustainable. */
  floor: number;
}

/**
 * How a spacing is read. `either`: a new hole is clear of an old one with at least the sideways
 * spacing of bark arc OR the vertical spacing of height between them ("2–4 in to the side or
 * 6–12 in above/below"). `both`: the diagonal step ("3 in over and 6 in up"): near an old hole
 * both distances are required (docs/decisions/001-tapping-zone-model.md).
 */
export type SpacingRule = 'either' | 'both';

export interface ProfileSpacing {
  sidewaysCm: number;
  verticalCm: number;
  rule: SpacingRule;
}

/** A rule of the guideline that is not a figure the advisor computes with, shown where it applies. */
export interface GuidelineRule {
  text: string;
  source: string;
}

export interface GuidelineProfile {
  key: string;
  label: string;
  /** The unit the guideline table is written in. */
  unit: 'in' | 'cm';
  /** The table reads DBH to this step (Quebec writes its edges to 0.1 cm: 23.0 is none, 23.1 one). */
  dbhStepCm?: number;
  /** Ascending lower edges; the first band is the smallest tappable size. */
  bands: TapBand[];
  minimumDbhCm: number;
  maxTaps: number;
  /** Distance a new hole keeps from every hole still in reach, read as `rule` says. */
  spacing: ProfileSpacing;
  heightBand: { minCm: number; maxCm: number };
  drill: Record<Collection, DrillSetting>;
  /** Deepest drilled depth (incl. bark) and widest bit the guideline allows. */
  limits: { maxDepthCm: number; maxBitCm: number };
  stressed: StressedTreeRules;
  zone: ZoneParams;
  /** Where the table comes from, as the trade figures name it. */
  source: string;
  /** Where the spacing and depth figures come from. */
  spacingSource: string;
  depthSource: string;
  /** Where the spacing, depth and stressed-tree figures come from. */
  notes: string[];
  /** Rules for the season as a whole (when to tap, when spouts come out): shown with the plan. */
  seasonRules: GuidelineRule[];
  /** Rules for drilling each hole: shown with the drilling advice. */
  drillingRules: GuidelineRule[];
}
