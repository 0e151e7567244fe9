import { sources } from './sources';

/**
 * The published reference points of the 2016 Forest Science study (van den Berg, Perkins,
 * Isselhardt, Wilmot 2016, Forest Science 62(1):107–114). The minimum figures belong to the taps
 * the conservative table gives at those sizes — one tap at 10 in, two at 18 in — so they are
 * check values of `minimumSustainableGrowth` (tests/checks/minimum-growth.test.ts), never a line
 * over DBH. What healthy trees grew is context for the reader, not a rule.
 */
export const publishedGrowth = {
  source: sources.minimumGrowth,
  minimum: [
    { dbhIn: 10, taps: 1, in2PerYear: 1.4 },
    { dbhIn: 18, taps: 2, in2PerYear: 2.6 },
  ],
  healthy: [
    { dbhIn: 10, in2PerYear: 1.8 },
    { dbhIn: 18, in2PerYear: 3.5 },
  ],
} as const;
