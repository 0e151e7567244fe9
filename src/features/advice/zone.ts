import {
  defaultZone,
  isProfileKey,
  profiles,
  woodDepthCm,
  type GuidelineProfile,
  type ZoneHole,
} from '@shared/rules/index';

/** Roughly 2–5 ft above ground, as the built-in profiles hold it. */
const DEFAULT_HEIGHT_BAND = { minCm: 60, maxCm: 150 };

/** The parts of a guideline the advice card draws: its tapping-zone model and height band. */
export function profileShape(key: string): Pick<GuidelineProfile, 'zone' | 'heightBand'> {
  // A stand's custom profile is not sent whole with the advice; its zone model uses the defaults.
  const profile = isProfileKey(key) ? profiles[key] : undefined;
  return {
    zone: profile?.zone ?? defaultZone,
    heightBand: profile?.heightBand ?? DEFAULT_HEIGHT_BAND,
  };
}

/**
 * Holes drilled before `season` whose stain a new hole of this depth can still reach: growth
 * has not yet laid `woodDepth` of clear wood over them. The advisor spaces new holes from these.
 */
export function holesInReach<H extends ZoneHole>(
  holes: readonly H[],
  options: {
    season: number;
    depthCm: number;
    radialGrowthCmPerYear: number;
    zone: GuidelineProfile['zone'];
  },
): H[] {
  const depth = woodDepthCm(options.depthCm, options.zone);
  return holes.filter(
    (h) =>
      h.season < options.season &&
      options.radialGrowthCmPerYear * (options.season - h.season) < depth,
  );
}
