import type { PlanItem, StandPlan } from '../../../shared/rules/index';
import type {
  GuidelinePreview,
  GuidelineSide,
  TreeTapChange,
} from '../../../shared/schemas/guideline-preview';

const MAX_LISTED = 200;

const side = (plan: StandPlan, label: string): GuidelineSide => ({
  profile: plan.profileKey,
  label,
  taps: plan.totals.taps,
  tappedTrees: plan.totals.treesToTap,
});

/** What moving from one plan of a stand to another changes, tree by tree (same trees, same order). */
export function diffPlans(
  from: { plan: StandPlan; label: string },
  to: { plan: StandPlan; label: string },
): GuidelinePreview {
  const before = new Map<unknown, PlanItem>(from.plan.items.map((i) => [i.treeId, i]));
  const changes: TreeTapChange[] = [];
  let tapsAdded = 0;
  let tapsRemoved = 0;
  let treesBecomeTooSmall = 0;
  for (const after of to.plan.items) {
    const was = before.get(after.treeId);
    if (!was || was.taps === after.taps) continue;
    if (after.taps > was.taps) tapsAdded += after.taps - was.taps;
    else tapsRemoved += was.taps - after.taps;
    if (was.taps > 0 && after.verdict === 'too-small') treesBecomeTooSmall++;
    changes.push({
      treeId: Number(after.treeId),
      tag: after.tag ?? '',
      dbhCm: after.dbhCm ?? null,
      fromTaps: was.taps,
      toTaps: after.taps,
      fromVerdict: was.verdict,
      toVerdict: after.verdict,
    });
  }
  changes.sort(
    (a, b) =>
      Math.abs(b.toTaps - b.fromTaps) - Math.abs(a.toTaps - a.fromTaps) ||
      a.tag.localeCompare(b.tag, undefined, { numeric: true }),
  );
  return {
    season: to.plan.season,
    from: side(from.plan, from.label),
    to: side(to.plan, to.label),
    tapsAdded,
    tapsRemoved,
    treesChanged: changes.length,
    treesBecomeTooSmall,
    changes: changes.slice(0, MAX_LISTED),
    changesTotal: changes.length,
  };
}
