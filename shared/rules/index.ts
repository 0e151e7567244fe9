/**
 * The advisor's public entry: the one index file in the codebase, so callers import the
 * advisor's contract from `shared/rules` without reaching into its modules.
 */
export {
  profiles,
  profileKeys,
  isProfileKey,
  resolveProfile,
  defaultZone,
  type ProfileKey,
} from './profiles';
export type {
  GuidelineProfile,
  GuidelineRule,
  TapBand,
  DrillSetting,
  ProfileSpacing,
  SpacingRule,
  StressedTreeRules,
  ZoneParams,
} from './profile-types';
export { tapsForDbh, bandForDbh } from './tap-table';
export {
  customProfileSchema,
  validateCustomProfile,
  CUSTOM_LIMITS,
  type CustomProfile,
  type CustomProfileInput,
  type CustomProfileResult,
} from './custom-profile';
export {
  basalAreaM2,
  basalAreaCm2,
  basalAreaFt2FromIn,
  standBasalAreaFt2PerAcre,
  dbhFromCircumference,
  circumferenceFromDbh,
  basalAreaGrowthCm2,
} from './basal-area';
export { sapPerSyrup, type SapRule } from './sap';
export {
  freezeThaw,
  sapRunLabels,
  sapSpoilage,
  type SapRunOutlook,
  type SapSpoilage,
} from './weather';
export {
  classifyDay,
  expectedSyrup,
  sapHoldingCautions,
  summarizeSap,
  formatTemperature,
  galToL,
  lToGal,
  L_PER_US_GAL,
  SAP_COOL_LIMIT_F,
  SAP_WARM_LIMIT_F,
  type RunClass,
  type DayRun,
  type ExpectedSyrup,
  type SapCaution,
  type SapCautionCode,
  type SapDay,
  type SapSummary,
  type TemperatureUnit,
} from './season-log';
export {
  cmToIn,
  inToCm,
  cm2ToIn2,
  in2ToCm2,
  cToF,
  fToC,
  CM_PER_IN,
  azimuthGapDeg,
  normalizeAzimuth,
} from './units';
export { seasonOf, fractionalYear } from './dates';
export { growth, type Growth, type GrowthFlag, type DatedDbh } from './growth';
export { publishedGrowth } from './minimum-growth';
export {
  checkReading,
  checkNewReading,
  screenReadings,
  readingQuestion,
  OUTLIER_CHANGE_CM_PER_YEAR,
  OUTLIER_SHRINK_CM,
  type DatedReading,
  type ReadingCheck,
} from './plausibility';
export {
  conductiveShare,
  holesInReach,
  stainLeftInReach,
  steadyStateShare,
  minimumSustainableGrowth,
  minimumSustainableRadialGrowth,
  maxSustainableTaps,
  stainAgeSum,
  zoneVolumeCm3,
  stainVolumeCm3,
  woodDepthCm,
  DEFAULT_BIT_CM,
  DEFAULT_DEPTH_CM,
  type ZoneHole,
  type ConductiveShareInput,
  type RateInput,
} from './tapping-zone';
export {
  projectConductiveShare,
  type ProjectionInput,
  type ProjectedSeason,
} from './zone-projection';
export {
  isClearOf,
  isInStainColumn,
  keepsClear,
  arcDistanceCm,
  type Spot,
  type HoleSpot,
  type Spacing,
  type SpacingRules,
  type StainColumn,
} from './spacing';
export {
  placeTapholes,
  SAME_SEASON_HEIGHT_GAP_CM,
  type PlacementInput,
  type PlacementResult,
} from './placement';
export { adviseDrilling, FROZEN_TRUNK_C, SHALLOW_DEPTH_CM, WIDE_SPOUT_BIT_CM } from './drilling';
export {
  adviseTree,
  STALE_AFTER_SEASONS,
  ASSUMED_RADIAL_GROWTH_CM,
  LONG_REACH_SEASONS,
  FAST_GROWER_DBH_CM_PER_YEAR,
  type Advice,
  type AdviseOptions,
} from './advise-tree';
export { statusInSeason } from './tree-record';
export type { AdvisorTree, AdvisorMeasurement, AdvisorTaphole, StatusChange } from './tree-record';
export {
  planStand,
  type StandTree,
  type PlanItem,
  type PlanTotals,
  type StandPlan,
} from './plan-stand';
export {
  seasonCompliance,
  complianceFindings,
  type ComplianceFinding,
  type SeasonCompliance,
} from './season-compliance';
export { verdicts, verdictByKey, type VerdictKey, type Verdict } from './verdicts';
export { warningCodes, bitWords, type WarningCode, type AdvisorWarning } from './warnings';
export { sources } from './sources';
