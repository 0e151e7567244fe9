import { z } from 'zod';
import { verdicts } from '../rules/verdicts';
import { warningCodes } from '../rules/warnings';
import type { DistanceSummary } from '../geo/nearest-neighbour';
import { species, treeStatuses } from './enums';
import { adviceQuerySchema } from './plan';

/** `?season=` for the map and the stand figures; the upcoming season when left out. */
export const mapQuerySchema = adviceQuerySchema;
export type MapQuery = z.output<typeof mapQuerySchema>;

/** Decimals of degree the map sends: 6 is about 0.1 m on the ground, well inside a GPS fix. */
export const MAP_COORD_DECIMALS = 6;

/**
 * The codes of the map's coded columns, in index order: `verdict[i]` is an index into
 * `codes.verdict`, bit `b` of `warnings[i]` stands for `codes.warning[b]`. The answer carries
 * them, so a page built before a code was added still reads a newer answer.
 */
export const mapCodes = {
  verdict: verdicts.map((v) => v.key),
  warning: [...warningCodes],
  status: [...treeStatuses],
  species: [...species],
};
export type MapCodes = typeof mapCodes;

/**
 * Every tree of a stand as the map draws it, column by column: the i-th entry of each array
 * is the same tree, in tag order. Only what the map, its legend and its filters need; the
 * tree card asks for a tree's details when it is chosen.
 */
export interface MapColumns {
  season: number;
  count: number;
  codes: MapCodes;
  ids: number[];
  tags: string[];
  /** Degrees, rounded to MAP_COORD_DECIMALS; null where the tree has no position. */
  lat: (number | null)[];
  lng: (number | null)[];
  verdict: number[];
  taps: number[];
  /** The warnings of each tree as a bitmask over `codes.warning`. */
  warnings: number[];
  status: number[];
  species: number[];
  /** 1 where the tree is mapped outside the stand's boundary. */
  outside: (0 | 1)[];
}

/**
 * Figures of the stand within its boundary. Area fields are null without a boundary. Per-area
 * figures count the trees inside the boundary: densities every tree still standing (not
 * `removed`), basal area the living ones (`active` or `held-out`) with a DBH on record.
 */
export interface StandFigures {
  boundary: boolean;
  areaHa: number | null;
  areaAcres: number | null;
  /** Every tree in the register. */
  trees: number;
  /** Trees with a position. */
  mappedTrees: number;
  /** Mapped trees inside the boundary (all mapped trees when there is no boundary). */
  treesInside: number;
  /** Mapped trees outside the boundary: likely mapping errors. */
  treesOutside: { id: number; tag: string }[];
  /** Taps the advisor plans for the season over the whole register. */
  tapsPlanned: number;
  treesPerHa: number | null;
  treesPerAcre: number | null;
  tapsPerHa: number | null;
  tapsPerAcre: number | null;
  basalAreaM2PerHa: number | null;
  basalAreaFt2PerAcre: number | null;
  /** Distance from each standing tree inside the boundary to its nearest such neighbour, metres. */
  nearestNeighbourM: DistanceSummary | null;
}

export const basemapFormats = ['png', 'jpg', 'webp'] as const;
export type BasemapFormat = (typeof basemapFormats)[number];
export const basemapMimeTypes: Record<BasemapFormat, string> = {
  png: 'image/png',
  jpg: 'image/jpeg',
  webp: 'image/webp',
};

/** An uploaded offline basemap (raster MBTiles). */
export interface Basemap {
  id: number;
  sugarbushId: number;
  name: string;
  format: BasemapFormat;
  minZoom: number;
  maxZoom: number;
  /** [west, south, east, north], degrees. */
  bounds: [number, number, number, number];
  /** [lng, lat, zoom] when the file names a centre. */
  center: [number, number, number] | null;
  sizeBytes: number;
  createdAt: string;
}

/** Text fields beside the uploaded file. */
export const basemapUploadSchema = z.object({
  name: z.string().trim().max(120, 'A name has at most 120 characters').optional(),
});

/** Web-map zoom levels an MBTiles basemap may carry. */
export const MAX_TILE_ZOOM = 24;
