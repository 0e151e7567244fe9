import {
  arcDistanceCm,
  holesInReach,
  isProfileKey,
  keepsClear,
  profiles,
  validateCustomProfile,
  type GuidelineProfile,
  type Spot,
} from '@shared/rules/index';
import type { Taphole } from '@shared/schemas/taphole';

export type SpacingRules = Pick<GuidelineProfile, 'spacing' | 'zone'>;

/** The spacing and zone model of the stand's guideline: a built-in one, or the saved custom set. */
export function spacingRulesFor(profileKey: string, customProfile: unknown): SpacingRules | null {
  if (isProfileKey(profileKey)) return profiles[profileKey];
  const custom = validateCustomProfile(customProfile);
  return custom.ok ? custom.profile : null;
}

export interface CrowdedHole {
  hole: Taphole;
  /** Bark arc between the two, the short way round. */
  sidewaysCm: number;
  /** Positive when the earlier hole is below the new spot. */
  belowCm: number;
}

/**
 * Holes a new hole at `spot` comes too close to: those drilled earlier in the same season, and
 * those of earlier seasons whose stain it can still reach, nearer than the guideline's spacing
 * (read as the guideline words it) or inside their stain column. Nearest first.
 */
export function crowdedHoles(
  spot: Spot,
  holes: readonly Taphole[],
  options: {
    season: number;
    dbhCm: number;
    depthCm: number;
    /** Bit of the new hole. */
    bitCm: number;
    radialGrowthCmPerYear: number;
    rules: SpacingRules;
  },
): CrowdedHole[] {
  const { rules } = options;
  const circumference = Math.PI * options.dbhCm;
  const nearby = [
    ...holes.filter((h) => h.season === options.season),
    ...holesInReach(holes, { ...options, zone: rules.zone }),
  ];
  const keepOut = {
    spacing: rules.spacing,
    column: { stainLengthCm: rules.zone.stainLengthCm, stainMarginCm: rules.zone.stainMarginCm },
  };
  return nearby
    .filter((h) => !keepsClear(spot, options.bitCm, h, keepOut, circumference))
    .map((hole) => ({
      hole,
      sidewaysCm: arcDistanceCm(spot.azimuthDeg, hole.azimuthDeg, circumference),
      belowCm: spot.heightCm - hole.heightCm,
    }))
    .sort(
      (a, b) =>
        Math.hypot(a.sidewaysCm, a.belowCm) - Math.hypot(b.sidewaysCm, b.belowCm) ||
        b.hole.season - a.hole.season,
    );
}

/** What the advisor says of a hole as it is entered, before it is saved. */
export interface DrilledHoleCheck {
  /** Holes it comes too close to, nearest first. */
  crowded: CrowdedHole[];
  /** It would be this season's hole number … */
  holeNumber: number;
  /** … of this many the advice gives the tree; over when `holeNumber` is larger. */
  advisedTaps: number;
  over: boolean;
}

/**
 * A hole being entered, checked the way the advisor checks a plan: spacing and stain against
 * the season's holes and the earlier holes still in reach (`crowdedHoles`), and its count
 * against the taps the season's advice gives the tree.
 */
export function checkDrilledHole(
  spot: Spot,
  holes: readonly Taphole[],
  options: Parameters<typeof crowdedHoles>[2] & { advisedTaps: number },
): DrilledHoleCheck {
  const holeNumber = holes.filter((h) => h.season === options.season).length + 1;
  return {
    crowded: crowdedHoles(spot, holes, options),
    holeNumber,
    advisedTaps: options.advisedTaps,
    over: holeNumber > options.advisedTaps,
  };
}
