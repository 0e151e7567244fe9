import seedrandom from 'seedrandom';

/** The one seed behind every demo figure; change it and the whole demo changes. */
export const DEMO_SEED = 'clearwood-demo-owl-ledge-v1';

/**
 * A small deterministic random source. Each part of the demo draws from its own named stream
 * (`Rng.for('tree', 17)`), so changing how one tree is generated never shifts any other tree.
 */
export class Rng {
  private readonly next: () => number;

  constructor(seed: string) {
    this.next = seedrandom(seed);
  }

  static for(...keys: (string | number)[]): Rng {
    return new Rng([DEMO_SEED, ...keys].join('/'));
  }

  /** Uniform in [0, 1). */
  float(): number {
    return this.next();
  }

  /** Uniform in [min, max). */
  range(min: number, max: number): number {
    return min + (max - min) * this.next();
  }

  /** Integer in [min, max], both ends included. */
  int(min: number, max: number): number {
    return min + Math.floor(this.next() * (max - min + 1));
  }

  chance(p: number): boolean {
    return this.next() < p;
  }

  /** Normal draw (Box–Muller). */
  normal(mean = 0, sd = 1): number {
    const u = 1 - this.next();
    const v = this.next();
    return mean + sd * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
  }

  /** Normal draw kept inside [min, max]. */
  clampedNormal(mean: number, sd: number, min: number, max: number): number {
    return Math.min(max, Math.max(min, this.normal(mean, sd)));
  }

  pick<T>(items: readonly T[]): T {
    return items[Math.floor(this.next() * items.length)];
  }

  /** Pick by weight: `weighted([['a', 3], ['b', 1]])` returns 'a' three times in four. */
  weighted<T>(entries: readonly (readonly [T, number])[]): T {
    const total = entries.reduce((s, [, w]) => s + w, 0);
    let x = this.next() * total;
    for (const [item, w] of entries) {
      x -= w;
      if (x < 0) return item;
    }
    return entries[entries.length - 1][0];
  }
}

export const round = (x: number, digits: number): number => {
  const f = 10 ** digits;
  return Math.round(x * f) / f;
};
