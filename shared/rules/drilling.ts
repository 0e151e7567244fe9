import type { Collection } from '../schemas/enums';
import type { GuidelineProfile } from './profile-types';
import { inToCm } from './units';

/** About 1 in deep on small or slow trees, never over 2 in (Chabot). */
export const SHALLOW_DEPTH_CM = inToCm(1);
export const SMALL_OR_SLOW_MAX_DEPTH_CM = inToCm(2);
/** Trees under one foot DBH count as small for drilling. */
export const SMALL_TREE_CM = inToCm(12);
/** 7/16 in spouts and anything near their width. */
export const WIDE_SPOUT_BIT_CM = 1.1;

export interface DrillingInput {
  profile: GuidelineProfile;
  collection: Collection;
  smallOrSlow: boolean;
  /** Bit of the tree's most recent hole, if any. */
  lastBitCm: number | null;
}

export interface DrillingAdvice {
  depthCm: number;
  bitCm: number;
  /** The bit follows 7/16 in spouts already in use on this tree. */
  wideSpout: boolean;
  /** The last holes were wider than the profile allows. */
  spoutTooWide: boolean;
}

/** Depth (incl. bark) and bit for this season, by collection method and the tree's condition. */
export function adviseDrilling(input: DrillingInput): DrillingAdvice {
  const { profile, collection, smallOrSlow, lastBitCm } = input;
  const base = profile.drill[collection];
  let depthCm = Math.min(base.depthCm, profile.limits.maxDepthCm);
  if (smallOrSlow) depthCm = Math.min(depthCm, SHALLOW_DEPTH_CM, SMALL_OR_SLOW_MAX_DEPTH_CM);
  const wide = lastBitCm !== null && lastBitCm >= WIDE_SPOUT_BIT_CM;
  const allowed = wide && lastBitCm <= profile.limits.maxBitCm + 1e-9;
  return {
    depthCm,
    bitCm: allowed ? lastBitCm : Math.min(base.bitCm, profile.limits.maxBitCm),
    wideSpout: allowed,
    spoutTooWide: wide && !allowed,
  };
}
