import { planTrees } from './build';
import { COBBLE_RUN, COBBLE_RUN_BOUNDARY, cobbleRunSpecs } from './cobble-run';
import { consultantNotes, type NoteDraft } from './notes';
import { OWL_LEDGE, OWL_LEDGE_BOUNDARY, owlLedgeSpecs } from './owl-ledge';
import { COBBLE_RUN_NAME, OWL_LEDGE_NAME } from './people';
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
}

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
    },
  ];
}
