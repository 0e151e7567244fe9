import { roundTo } from './units';

/** The steps an axis may take, times a power of ten: 1, 2 or 5 keep every label short. */
const STEPS = [1, 2, 5, 10];

/**
 * Evenly spaced round ticks that cover `min`–`max`, about `count` of them, and how many decimals
 * their labels need so that no two read alike. A range narrower than `minSpan` is widened around
 * its middle first, so one reading or a flat run still gets a readable axis.
 */
export function niceTicks(
  min: number,
  max: number,
  { count = 5, minSpan }: { count?: number; minSpan: number },
): { ticks: number[]; decimals: number } {
  let low = Math.min(min, max);
  let high = Math.max(min, max);
  if (high - low < minSpan) {
    const middle = (low + high) / 2;
    low = middle - minSpan / 2;
    high = middle + minSpan / 2;
  }
  const rough = (high - low) / Math.max(1, count - 1);
  const power = 10 ** Math.floor(Math.log10(rough));
  const step = (STEPS.find((s) => s * power >= rough) ?? 10) * power;
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  const first = Math.floor(low / step + 1e-9);
  const last = Math.ceil(high / step - 1e-9);
  const ticks = Array.from({ length: last - first + 1 }, (_, i) =>
    roundTo((first + i) * step, decimals),
  );
  return { ticks, decimals };
}
