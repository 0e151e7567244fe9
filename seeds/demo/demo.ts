import { planTrees } from './build';
import { COBBLE_RUN, COBBLE_RUN_BOUNDARY, cobbleRunSpecs } from './cobble-run';
import { consultantNotes, type NoteDraft } from './notes';
import { OWL_LEDGE, OWL_LEDGE_BOUNDARY, owlLedgeSpecs } from './owl-ledge';
import { COBBLE_RUN_NAME, OWL_LEDGE_NAME } from './people';
import { demoSeasonLog, type SeasonLogPlan } from './season-log';
import type { StandLayout } from './stand';
import { BIT_CM, DEPTH_CM, conservativeTaps, traditionalTaps } from './tapping';
import type { TreePlan } from './types';

export interface StandPlan {
  name: typeof OWL_LEDGE_NAME | typeof COBBLE_RUN_NAME;
  layout: StandLayout;
  boundary: string;
  profile: string;
  sunnyAzimuthDeg: number;
  createdAt: string;
  trees: TreePlan[];
  notes: NoteDraft[];
  /** Weather and sap of the 2025 and 2026 seasons. */
  seasonLog: SeasonLogPlan;
}

/** The invented weather station (GHCN-Daily id format) whose daily summaries Owl Ledge imports. */
export const OWL_LEDGE_STATION = 'USC00999999';

/** The whole demo as plain data; the same every time. */
export function buildDemo(): StandPlan[] {
  const owl = planTrees(OWL_LEDGE.origin, owlLedgeSpecs(), {
    key: OWL_LEDGE.key,
    table: conservativeTaps,
    lastSeason: OWL_LEDGE.lastSeason,
    bitCm: BIT_CM,
    depthCm: DEPTH_CM,
    treesPerDay: 80,
  });
  const cobble = planTrees(COBBLE_RUN.origin, cobbleRunSpecs(), {
    key: COBBLE_RUN.key,
    table: traditionalTaps,
    lastSeason: COBBLE_RUN.lastSeason,
    bitCm: BIT_CM,
    depthCm: DEPTH_CM,
    treesPerDay: 25,
  });
  return [
    {
      name: OWL_LEDGE_NAME,
      layout: OWL_LEDGE,
      boundary: OWL_LEDGE_BOUNDARY,
      profile: 'conservative',
      sunnyAzimuthDeg: 180,
      createdAt: '2018-09-04 09:30:00',
      trees: owl,
      notes: consultantNotes(owl),
      seasonLog: demoSeasonLog(OWL_LEDGE.key, owl, OWL_LEDGE_STATION),
    },
    {
      name: COBBLE_RUN_NAME,
      layout: COBBLE_RUN,
      boundary: COBBLE_RUN_BOUNDARY,
      profile: 'traditional',
      sunnyAzimuthDeg: 165,
      createdAt: '2023-08-21 18:05:00',
      trees: cobble,
      notes: [],
      // A thermometer on the sugarhouse wall, read by hand.
      seasonLog: demoSeasonLog(COBBLE_RUN.key, cobble, null),
    },
  ];
}
