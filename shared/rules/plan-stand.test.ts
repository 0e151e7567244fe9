import { describe, expect, it } from 'vitest';
import { adviseTree } from './advise-tree';
import { planStand, type StandTree } from './plan-stand';

const measured = (dbhCm: number, crownDiebackPct = 0) => [
  { measuredOn: '2023-06-01', dbhCm: dbhCm - 2, crownDiebackPct },
  { measuredOn: '2026-06-01', dbhCm, crownDiebackPct },
];

const stand: StandTree[] = [
  { id: 1, tag: 'A-001', measurements: measured(50), tapholes: [] },
  { id: 2, tag: 'A-002', measurements: measured(35), tapholes: [] },
  { id: 3, tag: 'A-003', measurements: measured(22), tapholes: [] },
  { id: 4, tag: 'A-004', status: 'dead', measurements: measured(60), tapholes: [] },
  { id: 5, tag: 'A-005', measurements: measured(50, 60), tapholes: [] },
  { id: 6, tag: 'A-006', measurements: [], tapholes: [] },
];

describe('planStand', () => {
  it('when a stand is planned, then each tree gets its own advice with its id and tag', () => {
    const plan = planStand(stand, { season: 2027, profile: 'conservative' });
    expect(plan.items.map((i) => i.tag)).toEqual(stand.map((t) => t.tag));
    expect(plan.items[0].treeId).toBe(1);
    expect(plan.items[1]).toMatchObject(
      adviseTree(stand[1], { season: 2027, profile: 'conservative' }),
    );
  });

  it('adds up the season', () => {
    const { totals } = planStand(stand, { season: 2027, profile: 'conservative' });
    expect(totals).toMatchObject({
      trees: 6,
      treesToTap: 2,
      taps: 3,
      rested: 1,
      tooSmall: 1,
      retired: 1,
      unmeasured: 1,
    });
    expect(totals.warningsByCode.undersized).toBe(1);
    expect(totals.warningsByCode['crown-dieback']).toBe(1);
    expect(totals.warningsByCode['no-measurement']).toBe(1);
  });

  it('plans a large stand quickly', () => {
    const trees: StandTree[] = Array.from({ length: 2000 }, (_, t) => ({
      id: t,
      measurements: measured(30 + (t % 40)),
      tapholes: Array.from({ length: 8 }, (_, k) => ({
        season: 2018 + k,
        heightCm: 70 + ((k * 23) % 70),
        azimuthDeg: (k * 41 + t) % 360,
        depthCm: 5,
        bitCm: 0.79,
        collection: 'vacuum' as const,
      })),
    }));
    const started = performance.now();
    const plan = planStand(trees, { season: 2027, profile: 'traditional' });
    expect(plan.items).toHaveLength(2000);
    expect(performance.now() - started).toBeLessThan(5000);
  });
});
