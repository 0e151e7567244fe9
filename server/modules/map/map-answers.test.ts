import { describe, expect, it } from 'vitest';
import { mapAnswers } from './map-answers';
import type { MapBytes } from './map-task';

const bytesOf = (text: string, gzip: boolean): MapBytes => ({
  json: new TextEncoder().encode(text),
  gzip: gzip ? new TextEncoder().encode(`gz:${text}`) : null,
});

/** A build the test finishes when it chooses, counting how often it was started. */
function builds() {
  const started: { gzip: boolean; finish: () => void; fail: (e: Error) => void }[] = [];
  const build = (tag: string) => (gzip: boolean) =>
    new Promise<MapBytes>((resolve, reject) => {
      started.push({ gzip, finish: () => resolve(bytesOf(tag, gzip)), fail: reject });
    });
  return { started, build };
}

describe('the kept map answers', () => {
  it('when several ask for a tag while it is built, then one build answers them all', async () => {
    const kept = mapAnswers({ size: 4, keepMs: 60_000 });
    const { started, build } = builds();
    const asks = [kept.get('a', true, build('a')), kept.get('a', true, build('a'))];
    asks.push(kept.get('a', false, build('a'))); // gzip or not, the build makes both
    expect(started).toHaveLength(1);
    started[0].finish();
    const answers = await Promise.all(asks);
    expect(answers.every((a) => a === answers[0])).toBe(true);
    // Asked again afterwards: the kept bytes, no build.
    expect(await kept.get('a', true, build('a'))).toBe(answers[0]);
    expect(started).toHaveLength(1);
  });

  it('when gzip is asked for and the answer at hand has none, then it is built again with it', async () => {
    const kept = mapAnswers({ size: 4, keepMs: 60_000 });
    const { started, build } = builds();
    const plain = kept.get('a', false, build('a'));
    const zipped = kept.get('a', true, build('a'));
    expect(started.map((s) => s.gzip)).toEqual([false, true]);
    started.forEach((s) => s.finish());
    expect((await plain).gzip).toBeNull();
    expect((await zipped).gzip).not.toBeNull();
    // The gzipped build is the one kept: it serves a plain request too.
    expect(await kept.get('a', false, build('a'))).toBe(await zipped);
    expect(started).toHaveLength(2);
  });

  it('when more tags are kept than it holds, then the one used longest ago goes', async () => {
    const kept = mapAnswers({ size: 2, keepMs: 60_000 });
    const { started, build } = builds();
    const ask = async (tag: string) => {
      const p = kept.get(tag, true, build(tag));
      started.at(-1)?.finish();
      return p;
    };
    await ask('a');
    await ask('b');
    await ask('a'); // used again: b is now the oldest
    expect(started).toHaveLength(2);
    await ask('c');
    expect(started).toHaveLength(3);
    await ask('a');
    expect(started).toHaveLength(3);
    await ask('b');
    expect(started).toHaveLength(4);
  });

  it('when an answer has been kept its while, then it is built again', async () => {
    let now = 1_000;
    const kept = mapAnswers({ size: 4, keepMs: 100, now: () => now });
    const { started, build } = builds();
    const first = kept.get('a', true, build('a'));
    started[0].finish();
    await first;
    now += 100;
    await kept.get('a', true, build('a'));
    expect(started).toHaveLength(1);
    now += 1;
    const again = kept.get('a', true, build('a'));
    expect(started).toHaveLength(2);
    started[1].finish();
    await again;
  });

  it('when a build fails, then its askers hear so and nothing is kept', async () => {
    const kept = mapAnswers({ size: 4, keepMs: 60_000 });
    const { started, build } = builds();
    const asks = [kept.get('a', true, build('a')), kept.get('a', true, build('a'))];
    started[0].fail(new Error('worker gone'));
    for (const ask of asks) await expect(ask).rejects.toThrow('worker gone');
    const next = kept.get('a', true, build('a'));
    expect(started).toHaveLength(2);
    started[1].finish();
    expect((await next).gzip).not.toBeNull();
  });
});
