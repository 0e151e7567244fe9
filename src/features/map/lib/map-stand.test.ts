import type { MapColumns } from '@shared/schemas/map';
import { countLegend } from './legend-counts';
import { decodeMapStand } from './map-stand';

/** An answer as the API sends it, written out by hand. */
const answer: MapColumns = {
  season: 2027,
  count: 4,
  codes: {
    verdict: ['tap', 'tap-reduced', 'rest', 'too-small', 'retired', 'unmeasured'],
    warning: [
      'undersized',
      'overtapped',
      'too-close',
      'slow-growth',
    ] as MapColumns['codes']['warning'],
    status: ['active', 'held-out', 'dead', 'removed'],
    species: ['sugar-maple', 'red-maple'] as MapColumns['codes']['species'],
  },
  ids: [31, 7, 12, 40],
  tags: ['10', '2', 'A-3', 'B'],
  lat: [44.312701, 44.3128, null, 44.3131],
  lng: [-72.641801, -72.6419, null, -72.642],
  verdict: [0, 2, 5, 4],
  taps: [2, 0, 0, 0],
  warnings: [0b1010, 0, 0b1010, 0b0100],
  status: [0, 0, 0, 2],
  species: [0, 1, 0, 0],
  outside: [0, 1, 0, 0],
};

describe('the map answer, decoded', () => {
  it('makes one tree of the i-th entry of every column, by the codes the answer carries', () => {
    const stand = decodeMapStand(answer);
    expect(stand.season).toBe(2027);
    expect(stand.byId.get(31)).toEqual({
      id: 31,
      tag: '10',
      lat: 44.312701,
      lng: -72.641801,
      species: 'sugar-maple',
      status: 'active',
      verdict: 'tap',
      taps: 2,
      warnings: ['overtapped', 'slow-growth'],
      outside: false,
    });
    expect(stand.byId.get(7)).toMatchObject({
      tag: '2',
      species: 'red-maple',
      verdict: 'rest',
      warnings: [],
      outside: true,
    });
    expect(stand.byId.get(40)).toMatchObject({
      verdict: 'retired',
      status: 'dead',
      warnings: ['too-close'],
    });
  });

  it('puts the trees in tag order as people read tags, and keeps the mapped ones apart', () => {
    const stand = decodeMapStand(answer);
    expect(stand.trees.map((t) => t.tag)).toEqual(['2', '10', 'A-3', 'B']);
    expect(stand.mapped.map((t) => t.id)).toEqual([7, 31, 40]);
    expect(stand.byId.get(12)).toMatchObject({ lat: null, lng: null, verdict: 'unmeasured' });
    expect(stand.mapped.every((t) => stand.byId.get(t.id) === t)).toBe(true);
  });

  it('shares one list of warnings between trees that carry the same ones', () => {
    const stand = decodeMapStand(answer);
    expect(stand.byId.get(31)!.warnings).toBe(stand.byId.get(12)!.warnings);
    expect(stand.byId.get(7)!.warnings).toHaveLength(0);
  });

  it('reads codes in the order the answer gives them, not the order this page was built with', () => {
    const reordered: MapColumns = {
      ...answer,
      codes: { ...answer.codes, verdict: [...answer.codes.verdict].reverse() },
    };
    const stand = decodeMapStand(reordered);
    expect(stand.byId.get(31)!.verdict).toBe('unmeasured');
    expect(stand.byId.get(40)!.verdict).toBe('tap-reduced');
  });

  it('gives the legend counts that add up to the answer', () => {
    const counts = countLegend(decodeMapStand(answer).trees);
    expect(counts).toMatchObject({ total: 4, mapped: 3, notMapped: 1 });
    expect(counts.byVerdict).toMatchObject({ tap: 1, rest: 1, retired: 1, unmeasured: 0 });
  });
});
