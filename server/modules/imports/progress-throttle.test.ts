import { describe, expect, it } from 'vitest';
import type { ProgressStep } from './import-progress';
import { throttled } from './progress-throttle';

describe('the import steps sent to the request thread', () => {
  it('when a loop reports every row, then counts go at most every 100 ms, and each step its first and last', () => {
    let clock = 0;
    const sent: ProgressStep[] = [];
    const report = throttled(
      (s) => sent.push(s),
      100,
      () => clock,
    );
    for (let done = 1; done <= 1000; done++) {
      clock += 1; // a row a millisecond: a second of checking
      report({ phase: 'checking', done, total: 1000 });
    }
    report({ phase: 'writing', done: 0, total: 1000 });
    const checking = sent.filter((s) => s.phase === 'checking');
    expect(checking[0].done).toBe(1);
    expect(checking.at(-1)!.done).toBe(1000);
    // 1 s of rows: the first, one per 100 ms after it, and the last.
    expect(checking.length).toBeLessThanOrEqual(1 + 10 + 1);
    expect(checking.length).toBeGreaterThanOrEqual(10);
    expect(sent.at(-1)).toEqual({ phase: 'writing', done: 0, total: 1000 });
  });
});
