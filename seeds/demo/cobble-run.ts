import type { Species } from '../../shared/schemas/enums';
import { polygonGeoJson } from './geo';
import type { Rng } from './random';
import { ordinaryStand, type StandLayout } from './stand';
import type { TreeSpec } from './types';

/** A small bucket stand of another owner, a few seasons on record. */
export const COBBLE_RUN: StandLayout = {
  key: 'cobble-run',
  tagPrefix: 'CR',
  tagDigits: 3,
  // Invented, some way from Owl Ledge; nothing here describes a real property.
  origin: { lat: 44.2391, lng: -72.5127 },
  // Under half an acre behind the house: 25 maples, standing as close as in a sugarbush.
  ring: [
    [-26, -17],
    [6, -22],
    [28, -11],
    [24, 15],
    [-2, 20],
    [-24, 9],
  ],
  gaps: [],
  treeCount: 25,
  clusterCount: 3,
  clusterSd: 8,
  clusteredShare: 0.6,
  minSpacingM: 5,
  bandM: 12,
  firstSeason: 2023,
  lastSeason: 2026,
  speciesAt: (_xy, rng: Rng): Species => (rng.chance(0.88) ? 'sugar-maple' : 'red-maple'),
  collectionAt: () => 'bucket',
};

export const COBBLE_RUN_BOUNDARY = polygonGeoJson(COBBLE_RUN.origin, COBBLE_RUN.ring);

export const cobbleRunSpecs = (): TreeSpec[] => ordinaryStand(COBBLE_RUN);
