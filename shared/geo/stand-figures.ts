import type { TreeStatus } from '../schemas/enums';
import type { StandFigures } from '../schemas/map';
import { acresFromM2, boundaryAreaM2, hectaresFromM2, perArea } from './area';
import type { Boundary, LngLat } from './boundary';
import { isOutside } from './inside';
import { nearestNeighbourSummary } from './nearest-neighbour';
import { basalAreaPerArea } from './stand-basal-area';

export interface FigureTree {
  id: number;
  tag: string;
  lat: number | null;
  lng: number | null;
  status: TreeStatus;
  dbhCm: number | null;
  /** Taps the advisor plans for this tree this season. */
  taps: number;
}

const standing = (t: FigureTree) => t.status !== 'removed';
const living = (t: FigureTree) => t.status === 'active' || t.status === 'held-out';

/** A stand's area, densities, basal area and spacing from its boundary and its trees. */
export function standFigures(
  boundary: Boundary | null,
  trees: readonly FigureTree[],
): StandFigures {
  const areaM2 = boundary ? boundaryAreaM2(boundary) : null;
  const mapped = trees.filter((t) => t.lat !== null && t.lng !== null);
  const inside: FigureTree[] = [];
  const outside: { id: number; tag: string }[] = [];
  for (const t of mapped) {
    if (isOutside(boundary, t.lng, t.lat)) outside.push({ id: t.id, tag: t.tag });
    else inside.push(t);
  }
  const counted = inside.filter(standing);
  const treeDensity = perArea(counted.length, areaM2);
  const tapDensity = perArea(
    counted.reduce((s, t) => s + t.taps, 0),
    areaM2,
  );
  const basal = basalAreaPerArea(
    inside.filter((t) => living(t) && t.dbhCm !== null).map((t) => t.dbhCm!),
    areaM2,
  );
  const spaced = counted.map((t): LngLat => [t.lng!, t.lat!]);
  return {
    boundary: boundary !== null,
    areaHa: areaM2 === null ? null : hectaresFromM2(areaM2),
    areaAcres: areaM2 === null ? null : acresFromM2(areaM2),
    trees: trees.length,
    mappedTrees: mapped.length,
    treesInside: inside.length,
    treesOutside: outside,
    tapsPlanned: trees.reduce((s, t) => s + t.taps, 0),
    treesPerHa: treeDensity?.perHa ?? null,
    treesPerAcre: treeDensity?.perAcre ?? null,
    tapsPerHa: tapDensity?.perHa ?? null,
    tapsPerAcre: tapDensity?.perAcre ?? null,
    basalAreaM2PerHa: basal?.m2PerHa ?? null,
    basalAreaFt2PerAcre: basal?.ft2PerAcre ?? null,
    nearestNeighbourM: nearestNeighbourSummary(spaced),
  };
}
