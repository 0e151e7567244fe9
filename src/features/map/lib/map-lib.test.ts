import { columnsOf, mapTree as treeOf } from '../map-fixtures';
import {
  availableBackground,
  boundsOf,
  demoCovers,
  readBackground,
  storeBackground,
} from './background';
import { compassPoint, describePlacement } from './compass';
import { gridLines, gridStepM } from './grid';
import { countLegend } from './legend-counts';
import { filtersFromParams, findByTag, stepFrom, visibleTrees, withFilters } from './map-filters';
import { decodeMapStand, type MapTree } from './map-stand';
import { markerRadius, showsLetters, verdictStyles } from './verdict-style';

const at = (lat: number | null, lng: number | null) => ({ lat, lng });
const mapTree = (overrides: Partial<MapTree> = {}): MapTree =>
  treeOf({ ...at(44.31, -72.64), taps: 1, ...overrides });

const stand: MapTree[] = [
  mapTree({ id: 1, tag: '10', verdict: 'tap' }),
  mapTree({ id: 2, tag: '2', verdict: 'tap', species: 'red-maple' }),
  mapTree({ id: 3, tag: '0003', verdict: 'rest', warnings: ['zone-depleted'] }),
  mapTree({ id: 4, tag: '4', verdict: 'too-small', taps: 0 }),
  mapTree({ id: 5, tag: '5', verdict: 'tap', ...at(null, null) }),
];

describe('the legend counts', () => {
  it('count mapped trees per verdict, put trees without a position under Not mapped, and add up to the stand', () => {
    const counts = countLegend(stand);
    expect(counts.total).toBe(5);
    expect(counts.byVerdict).toEqual({
      tap: 2,
      'tap-reduced': 0,
      rest: 1,
      'too-small': 1,
      retired: 0,
      unmeasured: 0,
    });
    expect(counts.notMapped).toBe(1);
    const dots = Object.values(counts.byVerdict).reduce((a, b) => a + b, 0);
    expect(dots).toBe(counts.mapped);
    expect(dots + counts.notMapped).toBe(counts.total);
  });

  it('with a filter, count only the matching trees but keep the stand total', () => {
    const counts = countLegend(stand, { species: 'red-maple' });
    expect(counts.total).toBe(5);
    expect(counts.matching).toBe(1);
    expect(counts.byVerdict.tap).toBe(1);
    expect(counts.notMapped).toBe(0);
  });
});

describe('the map filters in the URL', () => {
  it('read known values and ignore unknown ones', () => {
    const params = new URLSearchParams(
      'species=red-maple&status=bogus&verdict=rest&warning=too-close',
    );
    expect(filtersFromParams(params)).toEqual({
      species: 'red-maple',
      status: undefined,
      verdict: 'rest',
      warning: 'too-close',
    });
  });

  it('write a change and keep the other parameters, dropping a filter set back to all', () => {
    const next = withFilters(new URLSearchParams('tree=7&verdict=rest'), {
      verdict: undefined,
      species: 'sugar-maple',
    });
    expect(next.toString()).toBe('tree=7&species=sugar-maple');
  });
});

describe('stepping through the trees', () => {
  it('goes in tag order, numbers by value, skips unmapped trees and wraps round', () => {
    const { mapped } = decodeMapStand(columnsOf(stand));
    const order = visibleTrees(mapped, {}).map((t) => t.tag);
    expect(order).toEqual(['2', '0003', '4', '10']);
    expect(visibleTrees(mapped, { verdict: 'tap' }).map((t) => t.tag)).toEqual(['2', '10']);
    const trees = visibleTrees(mapped, {});
    expect(stepFrom(trees, undefined, 1)?.tag).toBe('2');
    expect(stepFrom(trees, undefined, -1)?.tag).toBe('10');
    expect(stepFrom(trees, 1, 1)?.tag).toBe('2');
    expect(stepFrom(trees, 2, -1)?.tag).toBe('10');
    expect(stepFrom([], 2, 1)).toBeUndefined();
  });

  it('finds a tag as typed, without its leading zeros, or by its number alone when only one tag carries it', () => {
    expect(findByTag(stand, '0003')?.id).toBe(3);
    expect(findByTag(stand, '3')?.id).toBe(3);
    expect(findByTag(stand, ' 10 ')?.id).toBe(1);
    expect(findByTag(stand, '99')).toBeUndefined();
    const prefixed = [
      { id: 8, tag: 'OL-0412' },
      { id: 9, tag: 'OL-0413' },
      { id: 10, tag: 'CR-0413' },
    ];
    expect(findByTag(prefixed, '412')?.id).toBe(8);
    expect(findByTag(prefixed, 'ol-0412')?.id).toBe(8);
    expect(findByTag(prefixed, '413')).toBeUndefined();
  });
});

describe('the plain grid', () => {
  it('draws lines every 10, 50, 100 or 500 m as the zoom allows, and none when zoomed far out', () => {
    const lat = 44.31;
    expect(gridStepM(20, lat)).toBe(10);
    expect(gridStepM(19, lat)).toBe(10);
    expect(gridStepM(18, lat)).toBe(50);
    expect(gridStepM(17, lat)).toBe(50);
    expect(gridStepM(16, lat)).toBe(100);
    expect(gridStepM(15, lat)).toBe(500);
    expect(gridStepM(14, lat)).toBe(500);
    expect(gridStepM(12, lat)).toBeNull();
  });

  it('puts lines on whole multiples of the step, every fifth one heavier', () => {
    const view = { west: -72.6425, south: 44.3122, east: -72.6405, north: 44.3135 };
    const { meridians, parallels } = gridLines(view, 50, 44.31);
    expect(meridians.length).toBeGreaterThan(2);
    expect(parallels.length).toBeGreaterThan(2);
    const ys = parallels.map((p) => p.lat * 111_132);
    for (const y of ys) expect(Math.abs(y / 50 - Math.round(y / 50))).toBeLessThan(1e-6);
    for (const p of parallels) expect(p.major).toBe(Math.round((p.lat * 111_132) / 50) % 5 === 0);
  });
});

describe('markers and words on the card', () => {
  it('give every verdict its own shape and letter, and show letters only up close', () => {
    expect(new Set(verdictStyles.map((s) => s.shape)).size).toBe(verdictStyles.length);
    expect(new Set(verdictStyles.map((s) => s.letter)).size).toBe(verdictStyles.length);
    expect(showsLetters(18)).toBe(false);
    expect(showsLetters(19)).toBe(true);
    expect(markerRadius(15)).toBeLessThan(markerRadius(20));
  });

  it('say where to drill as a compass point and a height in the chosen unit', () => {
    expect(compassPoint(190)).toBe('S');
    expect(compassPoint(-20)).toBe('N');
    expect(compassPoint(300)).toBe('NW');
    expect(describePlacement({ azimuthDeg: 180, heightCm: 110 }, 'cm')).toBe(
      'south at 1.1 m (180°)',
    );
    expect(describePlacement({ azimuthDeg: 45, heightCm: 110 }, 'in')).toBe(
      'north-east at 43 in (45°)',
    );
  });
});

describe('the background choice', () => {
  it('is remembered per sugarbush and falls back to the plain grid when no longer on offer', () => {
    storeBackground(3, 'basemap:12');
    expect(readBackground(3)).toBe('basemap:12');
    expect(readBackground(4)).toBe('plain');
    const basemap = { id: 12 } as never;
    expect(availableBackground('basemap:12', { demo: false, basemaps: [basemap] })).toBe(
      'basemap:12',
    );
    expect(availableBackground('basemap:12', { demo: false, basemaps: [] })).toBe('plain');
    expect(availableBackground('demo', { demo: false, basemaps: [] })).toBe('plain');
    expect(availableBackground('demo', { demo: undefined, basemaps: undefined })).toBe('demo');
  });

  it('offers the demo tiles only where they cover the trees', () => {
    const demo = {
      name: 'x',
      minZoom: 14,
      maxZoom: 19,
      bounds: [-72.65, 44.3, -72.63, 44.32] as [number, number, number, number],
      attribution: '',
    };
    expect(demoCovers(demo, boundsOf([{ lat: 44.31, lng: -72.64 }]))).toBe(true);
    expect(demoCovers(demo, boundsOf([{ lat: 46.1, lng: -70.2 }]))).toBe(false);
    expect(demoCovers(demo, null)).toBe(false);
  });
});
