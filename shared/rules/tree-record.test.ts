import { describe, expect, it } from 'vitest';
import { adviseTree } from './advise-tree';
import { statusInSeason } from './tree-record';

describe('statusInSeason', () => {
  const tree = {
    status: 'removed' as const,
    statusHistory: [{ on: '2022-01-18', status: 'removed' as const }],
  };
  it('reads a tree removed in a later season as in production in an earlier one', () => {
    expect(statusInSeason(tree, 2021)).toBe('active');
    expect(statusInSeason(tree, 2022)).toBe('removed');
    expect(statusInSeason({ status: 'dead' }, 2018)).toBe('dead');
    expect(
      statusInSeason(
        {
          status: 'active',
          statusHistory: [
            { on: '2025-05-01', status: 'held-out', created: true },
            { on: '2026-02-01', status: 'active' },
          ],
        },
        2024,
      ),
    ).toBe('held-out');
  });

  it('advises a season by the status the tree had then', () => {
    const measured = {
      measurements: [
        { measuredOn: '2019-10-02', dbhCm: 50 },
        { measuredOn: '2020-10-02', dbhCm: 50.6 },
      ],
      tapholes: [],
      ...tree,
    };
    expect(adviseTree(measured, { season: 2021, profile: 'conservative' }).verdict).not.toBe(
      'retired',
    );
    expect(adviseTree(measured, { season: 2022, profile: 'conservative' }).verdict).toBe('retired');
  });
});
