import { conductiveShare, type ZoneHole } from './tapping-zone';
import type { ZoneParams } from './profile-types';

export interface ProjectionInput {
  dbhCm: number;
  radialGrowthCmPerYear: number;
  /** First projected season; holes before it are the record so far. */
  season: number;
  holes: readonly ZoneHole[];
  tapsPerYear: number;
  seasons?: number;
  bitCm?: number;
  depthCm?: number;
  zone?: Partial<ZoneParams>;
}

export interface ProjectedSeason {
  season: number;
  dbhCm: number;
  /** Share before that season's drilling: the chance its new holes find clear wood. */
  shareBefore: number;
  /** Share once that season's holes are drilled. */
  shareAfter: number;
}

/** Season by season, the conductive share if the tree is tapped at this rate from `season` on. */
export function projectConductiveShare(input: ProjectionInput): ProjectedSeason[] {
  const count = input.seasons ?? 20;
  const g = Math.max(0, input.radialGrowthCmPerYear);
  const holes: ZoneHole[] = input.holes.filter((h) => h.season < input.season);
  const newHole = { bitCm: input.bitCm, depthCm: input.depthCm };
  const out: ProjectedSeason[] = [];
  for (let i = 0; i < count; i++) {
    const season = input.season + i;
    const dbhCm = input.dbhCm + 2 * g * i;
    const shape = {
      dbhCm,
      radialGrowthCmPerYear: g,
      season,
      depthCm: input.depthCm,
      zone: input.zone,
    };
    const shareBefore = conductiveShare({ ...shape, holes });
    for (let t = 0; t < input.tapsPerYear; t++) holes.push({ season, ...newHole });
    out.push({ season, dbhCm, shareBefore, shareAfter: conductiveShare({ ...shape, holes }) });
  }
  return out;
}
