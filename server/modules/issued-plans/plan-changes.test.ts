import { describe, expect, it } from 'vitest';
import { kindsOfChange, planChanges, type CalledTree } from './plan-changes';

const tree = (treeId: number, tag: string, call: Partial<CalledTree> = {}): CalledTree => ({
  treeId,
  tag,
  verdict: 'tap',
  taps: 1,
  placements: [{ azimuthDeg: 180, heightCm: 110 }],
  ...call,
});

describe('what changed since a plan was issued', () => {
  it('when nothing differs, or a hole moves by less than a tenth, then there is no change', () => {
    const was = tree(1, 'A');
    expect(kindsOfChange(was, tree(1, 'A'))).toEqual([]);
    expect(
      kindsOfChange(was, tree(1, 'A', { placements: [{ azimuthDeg: 180.04, heightCm: 110.02 }] })),
    ).toEqual([]);
  });

  it('names each kind of change with both calls, in tag order, and counts them by kind', () => {
    const issued = [
      tree(1, 'T-10', { taps: 2, placements: [] }),
      tree(2, 'T-2'),
      tree(3, 'T-3', { verdict: 'rest', taps: 0, placements: [] }),
      tree(4, 'T-4'),
      tree(5, 'T-5'),
      tree(6, 'T-6', { verdict: 'too-small', taps: 0, placements: [] }),
    ];
    const current = [
      tree(1, 'T-10', { taps: 1, verdict: 'tap-reduced' }),
      tree(2, 'T-2', { placements: [{ azimuthDeg: 0, heightCm: 80 }] }),
      tree(3, 'T-3'),
      tree(4, 'T-4', { verdict: 'retired', taps: 0, placements: [] }),
      // T-5 left the register; T-6 is still too small; T-7 is new.
      tree(6, 'T-6', { verdict: 'too-small', taps: 0, placements: [] }),
      tree(7, 'T-7'),
    ];
    const { changes, byKind } = planChanges(issued, current);
    expect(changes.map((c) => [c.tag, c.kinds])).toEqual([
      ['T-2', ['placements']],
      ['T-3', ['added', 'verdict']],
      ['T-4', ['removed', 'verdict']],
      ['T-5', ['removed']],
      ['T-7', ['added']],
      ['T-10', ['taps', 'verdict']],
    ]);
    expect(changes.find((c) => c.tag === 'T-5')!.current).toBeNull();
    expect(changes.find((c) => c.tag === 'T-7')!.issued).toBeNull();
    expect(changes.find((c) => c.tag === 'T-10')).toMatchObject({
      issued: { taps: 2, verdict: 'tap' },
      current: { taps: 1, verdict: 'tap-reduced' },
    });
    expect(byKind).toEqual({ added: 2, removed: 2, taps: 1, placements: 1, verdict: 3 });
  });
});
