import { useSearchParams } from 'react-router';
import { DEFAULT_BIT_CM, DEFAULT_DEPTH_CM } from '@shared/rules/index';
import type { Taphole } from '@shared/schemas/taphole';
import { useSugarbush } from '@/lib/get-sugarbush';
import { useTreeAdvice } from '@/lib/get-tree-advice';
import { parseSeason } from '@/lib/season';
import { useTapholes } from '@/lib/get-tapholes';
import { crowdedHoles, spacingRulesFor, type CrowdedHole } from '@/lib/spacing-check';
import {
  bitSizes,
  matchBit,
  readAzimuth,
  readDepth,
  readHeight,
  readSeason,
  type TapholeDefaults,
  type TapholeFormValues,
} from './taphole-form-values';

const latestHole = (holes: readonly Taphole[] = []) =>
  holes.reduce<Taphole | undefined>(
    (best, h) =>
      !best || h.season > best.season || (h.season === best.season && h.id > best.id) ? h : best,
    undefined,
  );

/**
 * What the taphole form draws on: the season the advice card shows (`?season=`), the advised
 * drill, the tree's record and the stand's spacing rule. The queries are the advice card's own,
 * so nothing extra is fetched.
 */
export function useDrillingContext(treeId: number, sugarbushId: number) {
  const [params] = useSearchParams();
  const adviceSeason = parseSeason(params.get('season'));
  const advice = useTreeAdvice(treeId, adviceSeason).data;
  const tapholes = useTapholes(treeId).data?.items;
  const customProfile = useSugarbush(sugarbushId).data?.customProfile;

  const adviceBit = advice?.bitCm ?? DEFAULT_BIT_CM;
  const defaults: TapholeDefaults = {
    season: adviceSeason,
    depthCm: advice?.depthCm ?? DEFAULT_DEPTH_CM,
    bitCm: matchBit(adviceBit) ?? adviceBit,
    collection: latestHole(tapholes)?.collection ?? advice?.collection ?? 'vacuum',
  };
  // A guideline may advise a bit outside the three sold sizes: offer it too.
  const bitOptions = matchBit(defaults.bitCm) ? bitSizes : [...bitSizes, defaults.bitCm];
  const rules = advice ? spacingRulesFor(advice.profile.key, customProfile) : null;

  /** Earlier holes the spot typed so far comes too close to; none until the spot is complete. */
  const crowdedAt = (values: TapholeFormValues): CrowdedHole[] => {
    const season = readSeason(values, defaults);
    const height = readHeight(values);
    const azimuth = readAzimuth(values);
    const depth = readDepth(values, defaults);
    const bit = values.bitCm !== undefined ? Number(values.bitCm) : defaults.bitCm;
    if (!rules || !advice?.dbhCm || !tapholes || season === undefined) return [];
    if (!('cm' in height) || !('cm' in azimuth)) return [];
    return crowdedHoles({ heightCm: height.cm, azimuthDeg: azimuth.cm }, tapholes, {
      season,
      dbhCm: advice.dbhCm,
      depthCm: 'cm' in depth ? depth.cm : defaults.depthCm,
      bitCm: Number.isFinite(bit) ? bit : defaults.bitCm,
      radialGrowthCmPerYear: advice.radialGrowthCmPerYear,
      rules,
    });
  };

  return { adviceSeason, defaults, bitOptions, spacing: rules?.spacing, crowdedAt };
}
