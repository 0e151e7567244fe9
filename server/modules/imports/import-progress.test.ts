import { describe, expect, it } from 'vitest';
import { importProgressStore, MAX_PER_USER } from './import-progress';

const at = { sugarbushId: 4, userId: 9, importId: '0b7c3f5e-8a7d-4c39-9d1e-2f4a6b8c0d12' };

describe("an import's kept progress", () => {
  it('when steps arrive out of order, then the state never goes back', () => {
    const store = importProgressStore();
    expect(store.start(at, { kind: 'trees', dryRun: false })).toBe('started');
    store.step(4, at.importId, { phase: 'checking', done: 400, total: 1000 });
    store.step(4, at.importId, { phase: 'checking', done: 300, total: 1000 });
    store.step(4, at.importId, { phase: 'reading', done: 0, total: 0 });
    expect(store.read(4, at.importId, 9)).toMatchObject({ phase: 'checking', done: 400 });
    store.step(4, at.importId, { phase: 'writing', done: 2000, total: 1000 });
    expect(store.read(4, at.importId, 9)).toMatchObject({ phase: 'writing', done: 1000 });
    expect(store.start(at, { kind: 'trees', dryRun: false })).toBe('running');
    store.finish(4, at.importId, true);
    expect(store.read(4, at.importId, 9)).toMatchObject({ phase: 'done', done: 1000, total: 1000 });
  });

  it('when another user or another stand asks, then nothing is known', () => {
    const store = importProgressStore();
    store.start(at, { kind: 'trees', dryRun: true });
    expect(store.read(4, at.importId, 10)).toBeNull();
    expect(store.read(5, at.importId, 9)).toBeNull();
  });
});

describe('imports one user runs at once', () => {
  it('when a user has the most running, then one more is refused until one finishes', () => {
    const store = importProgressStore();
    const id = (i: number) => `0b7c3f5e-8a7d-4c39-9d1e-${String(i).padStart(12, '0')}`;
    for (let i = 0; i < MAX_PER_USER; i++)
      expect(store.start({ ...at, importId: id(i) }, { kind: 'trees', dryRun: true })).toBe(
        'started',
      );
    expect(store.start({ ...at, importId: id(99) }, { kind: 'trees', dryRun: true })).toBe(
      'too-many',
    );
    // Finished checks do not count: a user checking a file again and again is not refused.
    store.finish(4, id(0), true);
    expect(store.start({ ...at, importId: id(99) }, { kind: 'trees', dryRun: true })).toBe(
      'started',
    );
  });
});
