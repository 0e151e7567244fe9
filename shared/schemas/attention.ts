import { z } from 'zod';
import { warningCodes, type VerdictKey, type WarningCode } from '../rules/index';
import type { treeStatusSchema } from './enums';
import { listQuerySchema } from './list-query';
import { seasonSchema } from './plan';

/**
 * Why a tree is in the "needs a look" queue, most pressing first: an unresolved hazard note, a
 * follow-up past its date, a follow-up coming due, a warning in the season's advice.
 */
export const attentionReasons = ['hazard', 'overdue', 'due', 'warning'] as const;
export type AttentionReason = (typeof attentionReasons)[number];

/**
 * The advice warnings that put a tree in the queue: all but those the verdict or the record
 * already answer (too small to tap; growth unknown until a second season's reading).
 */
export const attentionWarnings: readonly WarningCode[] = warningCodes.filter(
  (c) => c !== 'undersized' && c !== 'growth-unknown',
);

export const attentionSorts = ['priority', 'tag', '-tag', 'followUp', '-followUp'] as const;

export const attentionQuerySchema = listQuerySchema.extend({
  season: seasonSchema.optional(),
  sort: z.enum(attentionSorts).optional(),
  reason: z.enum(attentionReasons).optional(),
  /** Only trees whose advice carries this warning (any warning, also those the queue leaves out). */
  warning: z.enum(warningCodes).optional(),
});
export type AttentionQuery = z.output<typeof attentionQuerySchema>;

export interface AttentionItem {
  treeId: number;
  tag: string;
  status: z.infer<typeof treeStatusSchema>;
  verdict: VerdictKey | null;
  taps: number | null;
  warnings: WarningCode[];
  openHazards: number;
  /** The earliest follow-up date among the tree's open notes. */
  nextFollowUpOn: string | null;
  reasons: AttentionReason[];
}

export interface AttentionPage {
  items: AttentionItem[];
  total: number;
  page: number;
  pageSize: number;
  season: number;
  /** The day the queue was worked out for, and the last follow-up date that counts as due. */
  today: string;
  dueBy: string;
}
