/**
 * The sources the advisor cites, named as the trade figures list them. A warning carries one of
 * these so a reader can see where the rule behind it comes from.
 */
export const sources = {
  namspm:
    'North American Maple Syrup Producers Manual (NAMSPM), 2nd ed. 2006, as summarised by UVM Proctor Maple Research Center',
  namspmTraditional: 'NAMSPM traditional set, same summary',
  omafra: 'OMAFRA guidance',
  omafraLeutyLiu: 'OMAFRA guidance (Leuty, Liu)',
  /**
   * Quebec public land. The text of s.24 in force since 1 January 2023 was not among the official
   * pages read on 2026-12-01; its table is taken from memory as matching the private-land plan
   * standard. The rule until 2022-12-31 (s.58) was read in the version of 2024-11-19.
   */
  quebecPublic:
    'Quebec, Regulation respecting forest management permits, A-18.1 r.8.1 s.24 (in force 2023–; table from memory, as the private-land standard M-35.1 r.8.1 s.6: its current text was not found when read 2026-12-01)',
  /** What s.24 read until 2022-12-31, from its transitional s.58. */
  quebecPublicUntil2022:
    'A-18.1 r.8.1 s.58: until 2022-12-31, s.24 read 19.1–39 cm one tap, 39.1–59 cm two, 59.1–79 cm three, 79.1 cm and more four (version of 2024-11-19, read 2026-12-01)',
  quebecPrivate:
    'Quebec, sugar-bush plan standard for private land, M-35.1 r.8.1 s.6 (in force 2023–; version of 2023-09-20, read 2026-12-01)',
  /** The conditions that go with both Quebec tables (s.24 1°, 4°–6°, 9°, as s.58 reads them). */
  quebecConditions:
    'Quebec, Regulation respecting forest management permits, A-18.1 r.8.1 s.24 (as s.58 reads it, version of 2024-11-19, read 2026-12-01)',
  cornell: 'Cornell (Wild; Chabot, Maple News)',
  chabot: 'Chabot',
  perkins: 'Perkins, UVM Proctor',
  uvmSpacing: 'UVM Proctor sap-yield tips 2020',
  cornellSpacing: 'Cornell, Wild',
  ohioSpacing: 'Ohio State',
  tappingZone: 'van den Berg & Perkins 2014, Maple Syrup Digest 26:18–27',
  minimumGrowth: 'van den Berg, Perkins, Isselhardt, Wilmot 2016, Forest Science 62(1):107–114',
  silvics: 'USFS Silvics of North America, Godman, Yawney & Tubbs 1990',
  crownDieback: 'UVM Forest Ecosystem Monitoring Cooperative',
  crownRating: 'USFS Crown Condition Rating Guide (Millers et al. 1992)',
  commonPractice: 'common practice',
  /** Figures Clearwood's own tapping-zone model computes. */
  ourModel:
    'Clearwood tapping-zone model (docs/decisions/001-tapping-zone-model.md): concept from van den Berg & Perkins 2014; defaults our assumption; floor a calibrated value that reproduces the 2016 Forest Science minimum-growth figures',
  /** A reading far off the tree's others: common practice. */
  plausibility:
    'common practice (a DBH change over about 1 in a year, or a shrink beyond tape error)',
} as const;

export type SourceKey = keyof typeof sources;
