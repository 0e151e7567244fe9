import { z } from 'zod';
import type { VerdictKey, WarningCode } from '../rules/index';
import type { DistanceSummary } from '../geo/nearest-neighbour';
import type { Species, TreeStatus } from './enums';
import { adviceQuerySchema } from './plan';

/** `?season=` for the map and the stand figures; the upcoming season when left out. */
export const mapQuerySchema = adviceQuerySchema;
export type MapQuery = z.output<typeof mapQuerySchema>;

/** One tree as the map draws it: where it stands and what the advisor says for the season. */
export interface MapTree {
  id: number;
  tag: string;
  lat: number | null;
  lng: number | null;
  species: Species;
  status: TreeStatus;
  /** Latest standing DBH, cm. */
  dbhCm: number | null;
  verdict: VerdictKey;
  taps: number;
  placements: { azimuthDeg: number; heightCm: number }[];
  /** Warning codes only; the tree's advice has the messages. */
  warnings: WarningCode[];
  /** Mapped outside the stand's boundary (false when there is no boundary or no position). */
  outside: boolean;
}

export interface MapResponse {
  season: number;
  trees: MapTree[];
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
