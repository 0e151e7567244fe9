import { adviseTree, type AdviseOptions, type Advice } from './advise-tree';
import { resolveProfile } from './profiles';
import type { AdvisorTree } from './tree-record';
import { warningCodes, type WarningCode } from './warnings';

export interface StandTree extends AdvisorTree {
  id?: number | string;
  treeId?: number | string;
  tag?: string;
}

export interface PlanItem extends Advice {
  treeId?: number | string;
  tag?: string;
}

export interface PlanTotals {
  trees: number;
  treesToTap: number;
  taps: number;
  reduced: number;
  rested: number;
  tooSmall: number;
  retired: number;
  unmeasured: number;
  warningsByCode: Record<WarningCode, number>;
}

export interface StandPlan {
  season: number;
  profileKey: string;
  items: PlanItem[];
  totals: PlanTotals;
}

/** The advisor over a whole stand: one item per tree, in the order given, and the season's totals. */
export function planStand(trees: readonly StandTree[], options: AdviseOptions): StandPlan {
  const profile = resolveProfile(options.profile);
  const opts = { ...options, profile };
  const warningsByCode = Object.fromEntries(warningCodes.map((c) => [c, 0])) as Record<
    WarningCode,
    number
  >;
  const totals: PlanTotals = {
    trees: trees.length,
    treesToTap: 0,
    taps: 0,
    reduced: 0,
    rested: 0,
    tooSmall: 0,
    retired: 0,
    unmeasured: 0,
    warningsByCode,
  };
  const items: PlanItem[] = new Array(trees.length);
  for (let i = 0; i < trees.length; i++) {
    const tree = trees[i];
    const advice: PlanItem = adviseTree(tree, opts);
    const treeId = tree.treeId ?? tree.id;
    if (treeId !== undefined) advice.treeId = treeId;
    if (tree.tag !== undefined) advice.tag = tree.tag;
    items[i] = advice;
    totals.taps += advice.taps;
    if (advice.taps > 0) totals.treesToTap++;
    if (advice.verdict === 'tap-reduced') totals.reduced++;
    else if (advice.verdict === 'rest') totals.rested++;
    else if (advice.verdict === 'too-small') totals.tooSmall++;
    else if (advice.verdict === 'retired') totals.retired++;
    else if (advice.verdict === 'unmeasured') totals.unmeasured++;
    for (const w of advice.warnings) warningsByCode[w.code]++;
  }
  return { season: options.season, profileKey: profile.key, items, totals };
}
