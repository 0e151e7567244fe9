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
/** Do not drill a trunk colder than about −5 °C (OMAFRA). */
export const FROZEN_TRUNK_C = -5;

export interface DrillingInput {
  profile: GuidelineProfile;
  collection: Collection;
  /** Small, stressed or slow-growing: drill about 1 in deep. */
  shallow: boolean;
}

export interface DrillingAdvice {
  /** Drilled depth including bark, cm. */
  depthCm: number;
  /** The depth for this collection method on a tree that is neither small, stressed nor slow. */
  normalDepthCm: number;
  bitCm: number;
  /** The advised bit is itself 7/16 in or about (a custom profile's choice): one tap at most. */
  wideBit: boolean;
}

/**
 * Depth (incl. bark) and bit for this season, by collection method and the tree's condition.
 * New holes always take the profile's own bit (5/16 in in every built-in set), whatever bit the
 * tree's earlier holes were drilled with.
 */
export function adviseDrilling(input: DrillingInput): DrillingAdvice {
  const { profile, collection, shallow } = input;
  const base = profile.drill[collection];
  const normalDepthCm = Math.min(base.depthCm, profile.limits.maxDepthCm);
  const depthCm = shallow
    ? Math.min(normalDepthCm, SHALLOW_DEPTH_CM, SMALL_OR_SLOW_MAX_DEPTH_CM)
    : normalDepthCm;
  const bitCm = Math.min(base.bitCm, profile.limits.maxBitCm);
  return { depthCm, normalDepthCm, bitCm, wideBit: bitCm >= WIDE_SPOUT_BIT_CM };
}
