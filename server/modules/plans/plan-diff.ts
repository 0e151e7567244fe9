import type { VerdictKey } from '../../../shared/rules/index';
import type {
  GuidelinePreview,
  GuidelineSide,
  TreeTapChange,
} from '../../../shared/schemas/guideline-preview';

const MAX_LISTED = 200;

/** One tree's taps and verdict under one guideline. */
export interface TreeTaps {
  treeId: number;
  tag: string;
  taps: number;
  verdict: string;
  dbhCm: number | null;
}

interface Side {
  label: string;
  profile: string;
  items: readonly TreeTaps[];
}

const side = (s: Side): GuidelineSide => ({
  profile: s.profile,
  label: s.label,
  taps: s.items.reduce((sum, i) => sum + i.taps, 0),
  tappedTrees: s.items.filter((i) => i.taps > 0).length,
});

/** What moving from one plan of a stand to another changes, tree by tree. */
export function diffPlans(from: Side, to: Side, season: number): GuidelinePreview {
  const before = new Map(from.items.map((i) => [i.treeId, i]));
  const changes: TreeTapChange[] = [];
  let tapsAdded = 0;
  let tapsRemoved = 0;
  let treesBecomeTooSmall = 0;
  for (const after of to.items) {
    const was = before.get(after.treeId);
    if (!was || was.taps === after.taps) continue;
    if (after.taps > was.taps) tapsAdded += after.taps - was.taps;
    else tapsRemoved += was.taps - after.taps;
    if (was.taps > 0 && after.verdict === 'too-small') treesBecomeTooSmall++;
    changes.push({
      treeId: after.treeId,
      tag: after.tag,
      dbhCm: after.dbhCm,
      fromTaps: was.taps,
      toTaps: after.taps,
      fromVerdict: was.verdict as VerdictKey,
      toVerdict: after.verdict as VerdictKey,
    });
  }
  changes.sort(
    (a, b) =>
      Math.abs(b.toTaps - b.fromTaps) - Math.abs(a.toTaps - a.fromTaps) ||
      a.tag.localeCompare(b.tag, undefined, { numeric: true }),
  );
  return {
    season,
    from: side(from),
    to: side(to),
    tapsAdded,
    tapsRemoved,
    treesChanged: changes.length,
    treesBecomeTooSmall,
    changes: changes.slice(0, MAX_LISTED),
    changesTotal: changes.length,
  };
}
