/** Trees and answers for the map's tests, built the way the API sends them. */
import { mapCodes, type MapColumns } from '@shared/schemas/map';
import type { TreeAdvice } from '@shared/schemas/plan';
import type { Tree } from '@shared/schemas/tree';
import type { MapTree } from './lib/map-stand';

export const mapTree = (overrides: Partial<MapTree> = {}): MapTree => ({
  id: 1,
  tag: '0001',
  lat: 44.3127,
  lng: -72.6418,
  species: 'sugar-maple',
  status: 'active',
  verdict: 'tap',
  taps: 2,
  warnings: [],
  outside: false,
  ...overrides,
});

const codeOf = (codes: readonly string[], code: string) => {
  const at = codes.indexOf(code);
  if (at === -1) throw new Error(`no code for ${code}`);
  return at;
};

/** The map's answer for these trees, column by column, in the order given. */
export function columnsOf(trees: readonly MapTree[], season = 2027): MapColumns {
  return {
    season,
    count: trees.length,
    codes: mapCodes,
    ids: trees.map((t) => t.id),
    tags: trees.map((t) => t.tag),
    lat: trees.map((t) => t.lat),
    lng: trees.map((t) => t.lng),
    verdict: trees.map((t) => codeOf(mapCodes.verdict, t.verdict)),
    taps: trees.map((t) => t.taps),
    warnings: trees.map((t) =>
      t.warnings.reduce((mask, code) => mask | (1 << codeOf(mapCodes.warning, code)), 0),
    ),
    status: trees.map((t) => codeOf(mapCodes.status, t.status)),
    species: trees.map((t) => codeOf(mapCodes.species, t.species)),
    outside: trees.map((t) => (t.outside ? 1 : 0)),
  };
}

/** The tree's record as `GET /api/trees/:id` answers it. */
export const treeRecordOf = (tree: MapTree, extra: Partial<Tree> = {}): Tree => ({
  id: tree.id,
  sugarbushId: 3,
  tag: tree.tag,
  species: tree.species,
  lat: tree.lat,
  lng: tree.lng,
  status: tree.status,
  latestDbhCm: 45.72,
  latestMeasuredOn: '2026-10-03',
  latestCrownDiebackPct: 0,
  ...extra,
});

/** The parts of `GET /api/trees/:id/advice` the card reads. */
export const treeAdviceOf = (
  tree: MapTree,
  extra: Partial<Pick<TreeAdvice, 'dbhCm' | 'placements'>> = {},
): TreeAdvice =>
  ({
    treeId: tree.id,
    tag: tree.tag,
    season: 2027,
    verdict: tree.verdict,
    taps: tree.taps,
    dbhCm: 45.72,
    placements: [],
    warnings: tree.warnings.map((code) => ({ code, message: code })),
    ...extra,
  }) as unknown as TreeAdvice;
