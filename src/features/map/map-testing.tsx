/** The woods map opened on a small stand with a stubbed API, for the map's tests. */
import { WoodsMapRoute } from '@/app/routes/woods-map';
import { json, mockApi } from '@/test/api-mock';
import { meAs, page, sugarbush } from '@/test/fixtures';
import { renderPage } from '@/test/render';
import type { Role } from '@shared/schemas/enums';
import type { Sugarbush } from '@shared/schemas/sugarbush';
import type { MapTree } from './lib/map-stand';
import { columnsOf, mapTree, treeAdviceOf, treeRecordOf } from './map-fixtures';

export const trees: MapTree[] = [
  mapTree({ id: 1, tag: '0412', warnings: ['slow-growth'] }),
  mapTree({ id: 2, tag: '0007', verdict: 'rest', taps: 0 }),
  mapTree({ id: 3, tag: '0100', verdict: 'too-small', taps: 0 }),
  mapTree({ id: 4, tag: '0050', verdict: 'tap', lat: null, lng: null }),
];

/** What the card asks for when a tree is chosen: its record and its advice (where to drill). */
export const cardRoutes = {
  'GET /api/trees/1': treeRecordOf(trees[0]),
  'GET /api/trees/1/advice': treeAdviceOf(trees[0], {
    dbhCm: 45.72,
    placements: [
      { azimuthDeg: 180, heightCm: 110 },
      { azimuthDeg: 0, heightCm: 80 },
    ],
  }),
  'GET /api/trees/2': treeRecordOf(trees[1]),
  'GET /api/trees/2/advice': treeAdviceOf(trees[1]),
  'GET /api/trees/3': treeRecordOf(trees[2], { latestDbhCm: 20 }),
  'GET /api/trees/3/advice': treeAdviceOf(trees[2], { dbhCm: 20 }),
};

export const figures = {
  boundary: true,
  areaHa: 2,
  areaAcres: 4.94,
  trees: 4,
  mappedTrees: 3,
  treesInside: 2,
  treesOutside: [{ id: 3, tag: '0100' }],
  tapsPlanned: 4,
  treesPerHa: 1,
  treesPerAcre: 0.4,
  tapsPerHa: 2,
  tapsPerAcre: 0.8,
  basalAreaM2PerHa: 0.3,
  basalAreaFt2PerAcre: 1.3,
  nearestNeighbourM: { mean: 6.2, median: 5.8, min: 1.2, max: 14 },
};

export function openMap({
  role = 'forester' as Role,
  unitSystem = 'metric' as 'metric' | 'imperial',
  url = '/sugarbushes/3/map',
  routes = {} as Record<string, unknown>,
  stand = trees,
  bush = {} as Partial<Sugarbush>,
} = {}) {
  const api = mockApi({
    'GET /api/auth/me': meAs(role, unitSystem),
    'GET /api/sugarbushes/3': sugarbush({ role, ...bush }),
    'GET /api/sugarbushes/3/map': columnsOf(stand),
    'GET /api/sugarbushes/3/figures': figures,
    'GET /api/sugarbushes/3/basemaps': page([]),
    'GET /tiles/owl-ledge/tiles.json': json(404),
    ...cardRoutes,
    ...routes,
  });
  const view = renderPage({ path: '/sugarbushes/:id/map', url, element: <WoodsMapRoute /> });
  return { api, ...view };
}

export const params = (router: { state: { location: { search: string } } }) =>
  new URLSearchParams(router.state.location.search);
