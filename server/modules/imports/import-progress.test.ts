import { describe, expect, it } from 'vitest';
import { importProgressStore } from './import-progress';

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
