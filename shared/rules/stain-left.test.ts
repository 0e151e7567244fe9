import { describe, expect, it } from 'vitest';
import { defaultZone } from './profiles';
import { holesInReach, stainLeftInReach } from './tapping-zone';

// 2 in drilled, bark off: the wood depth a new hole reaches.
const depthCm = 5.08;
const wood = depthCm - defaultZone.barkCm;

describe('how much of an old hole’s stain a new hole can still reach', () => {
  it('is all of it the season it was drilled and falls by g·k/d each season after', () => {
    const g = 0.25;
    const at = (season: number) =>
      stainLeftInReach({ season: 2020 }, { season, depthCm, radialGrowthCmPerYear: g });
    expect(at(2020)).toBe(1);
    expect(at(2022)).toBeCloseTo(1 - (g * 2) / wood, 10);
    expect(at(2019)).toBe(0);
    expect(at(2020 + Math.ceil(wood / g))).toBe(0);
  });

  it('stays whole in a tree that does not grow', () => {
    expect(
      stainLeftInReach({ season: 2001 }, { season: 2027, depthCm, radialGrowthCmPerYear: 0 }),
    ).toBe(1);
  });

  it('is above 0 for exactly the earlier holes the advisor keeps new holes clear of', () => {
    const holes = Array.from({ length: 30 }, (_, i) => ({ season: 1998 + i }));
    for (const g of [0.05, 0.13, 0.4]) {
      const options = { season: 2027, depthCm, radialGrowthCmPerYear: g };
      const inReach = new Set(holesInReach(holes, options).map((h) => h.season));
      const earlier = holes.filter((h) => h.season < 2027);
      for (const h of earlier) expect(stainLeftInReach(h, options) > 0).toBe(inReach.has(h.season));
    }
  });
});
