import { z } from 'zod';
import type { VerdictKey } from '../rules/index';
import { seasonNumberSchema } from './plan';

/**
 * `POST /api/sugarbushes/:id/guideline-preview` (owner): what choosing this guideline would do to
 * the season's plan, before saving. `profile` is a profile key or `custom` with `customProfile`.
 */
export const guidelinePreviewInputSchema = z.object({
  season: seasonNumberSchema.optional(),
  profile: z.string().min(1).max(40),
  customProfile: z.unknown().optional(),
});
export type GuidelinePreviewInput = z.infer<typeof guidelinePreviewInputSchema>;

export interface GuidelineSide {
  profile: string;
  label: string;
  /** Taps planned for the season over the stand. */
  taps: number;
  /** Trees getting at least one tap. */
  tappedTrees: number;
}

export interface TreeTapChange {
  treeId: number;
  tag: string;
  dbhCm: number | null;
  fromTaps: number;
  toTaps: number;
  fromVerdict: VerdictKey;
  toVerdict: VerdictKey;
}

export interface GuidelinePreview {
  season: number;
  from: GuidelineSide;
  to: GuidelineSide;
  /** Sum of the increases over trees that gain taps. */
  tapsAdded: number;
  /** Sum of the decreases over trees that lose taps. */
  tapsRemoved: number;
  /** Trees whose tap count changes. */
  treesChanged: number;
  /** Trees tapped today that the new guideline calls too small. */
  treesBecomeTooSmall: number;
  /** The changed trees, biggest change first, at most 200 (`changesTotal` counts all). */
  changes: TreeTapChange[];
  changesTotal: number;
}
