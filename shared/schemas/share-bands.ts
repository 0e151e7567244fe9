/**
 * Bands of the tapping zone's conductive share (the share of clear wood a new hole meets) that
 * the overview counts trees in and the season plan filters by (`?share=`). They count the trees
 * big enough to tap (verdicts tap, tap fewer and rest): for a tree out of production, unmeasured
 * or too small the share says nothing. `max` is exclusive; the last band has none.
 */
export const shareBands = [
  { key: 'under-80', label: 'under 80 %', min: 0, max: 0.8 },
  { key: '80-85', label: '80–85 %', min: 0.8, max: 0.85 },
  { key: '85-90', label: '85–90 %', min: 0.85, max: 0.9 },
  { key: '90-95', label: '90–95 %', min: 0.9, max: 0.95 },
  { key: '95-up', label: '95 % and more', min: 0.95, max: null },
] as const;

export type ShareBand = (typeof shareBands)[number];
export type ShareBandKey = ShareBand['key'];
export const shareBandKeys = shareBands.map((b) => b.key) as [ShareBandKey, ...ShareBandKey[]];

/** The verdicts whose trees carry a meaningful conductive share. */
export const sharedVerdicts = ['tap', 'tap-reduced', 'rest'] as const;

export const shareBandOf = (share: number): ShareBandKey =>
  shareBands.find((b) => share >= b.min && (b.max === null || share < b.max))?.key ?? 'under-80';
