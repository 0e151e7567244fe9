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
  quebec: 'Quebec regulation A-18.1 r.2 (2004)',
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
  ourModel: 'Clearwood tapping-zone model (our assumption)',
} as const;

export type SourceKey = keyof typeof sources;
