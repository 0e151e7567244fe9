import {
  planChangeKinds,
  type IssuedPlacement,
  type PlanChange,
  type PlanChangeKind,
  type TreeCall,
} from '../../../shared/schemas/issued-plan';

export interface CalledTree extends TreeCall {
  treeId: number;
  tag: string;
}

/** Placements the crew would drill alike: the same number, each within a tenth of a unit. */
const near = (a: number, b: number) => Math.round(a * 10) === Math.round(b * 10);
export function samePlacements(a: readonly IssuedPlacement[], b: readonly IssuedPlacement[]) {
  return (
    a.length === b.length &&
    a.every((p, i) => near(p.azimuthDeg, b[i].azimuthDeg) && near(p.heightCm, b[i].heightCm))
  );
}

const call = (t: CalledTree): TreeCall => ({
  verdict: t.verdict,
  taps: t.taps,
  placements: t.placements,
});

/** What one tree's advice today changes against the issued copy; empty when nothing does. */
export function kindsOfChange(issued: TreeCall | null, current: TreeCall | null): PlanChangeKind[] {
  const wasIn = (issued?.taps ?? 0) > 0;
  const isIn = (current?.taps ?? 0) > 0;
  const kinds: PlanChangeKind[] = [];
  if (!wasIn && isIn) kinds.push('added');
  else if (wasIn && !isIn) kinds.push('removed');
  else if (wasIn && isIn) {
    if (issued!.taps !== current!.taps) kinds.push('taps');
    else if (!samePlacements(issued!.placements, current!.placements)) kinds.push('placements');
  }
  if (issued && current && issued.verdict !== current.verdict) kinds.push('verdict');
  return kinds;
}

const byTag = (a: { tag: string }, b: { tag: string }) =>
  a.tag.localeCompare(b.tag, undefined, { numeric: true });

/**
 * Tree by tree, what today's advice says that the issued copy does not: a tree added to the plan
 * or taken out of it, other taps, holes moved, another verdict. In tag order.
 */
export function planChanges(
  issued: readonly CalledTree[],
  current: readonly CalledTree[],
): { changes: PlanChange[]; byKind: Record<PlanChangeKind, number> } {
  const now = new Map(current.map((t) => [t.treeId, t]));
  const changes: PlanChange[] = [];
  for (const was of issued) {
    const is = now.get(was.treeId) ?? null;
    now.delete(was.treeId);
    const kinds = kindsOfChange(was, is);
    if (kinds.length > 0)
      changes.push({
        treeId: was.treeId,
        tag: is?.tag ?? was.tag,
        kinds,
        issued: call(was),
        current: is && call(is),
      });
  }
  // Trees the register gained since the plan was issued.
  for (const is of now.values()) {
    const kinds = kindsOfChange(null, is);
    if (kinds.length > 0)
      changes.push({ treeId: is.treeId, tag: is.tag, kinds, issued: null, current: call(is) });
  }
  changes.sort(byTag);
  const byKind = Object.fromEntries(planChangeKinds.map((k) => [k, 0])) as Record<
    PlanChangeKind,
    number
  >;
  for (const c of changes) for (const k of c.kinds) byKind[k]++;
  return { changes, byKind };
}
