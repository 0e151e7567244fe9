import { render, screen, within } from '@testing-library/react';
import { defaultZone } from '@shared/rules/index';
import { readTrunkHoles, type RecordedHole } from '@/lib/trunk-holes';
import { TrunkDiagram } from './trunk-diagram';

// 2 in drilled, 0.6 cm of bark: 4.48 cm of wood a new hole reaches; 0.4 cm of growth a year.
const reading = {
  season: 2027,
  depthCm: 5.08,
  radialGrowthCmPerYear: 0.4,
  zone: defaultZone,
  bitCm: 0.79375,
};
const wood = 5.08 - defaultZone.barkCm;

const holes: RecordedHole[] = [
  { id: 1, season: 2010, azimuthDeg: 90, heightCm: 100, bitCm: 0.79375 },
  { id: 2, season: 2020, azimuthDeg: 225, heightCm: 105, bitCm: 0.79375 },
  { id: 3, season: 2025, azimuthDeg: 370, heightCm: 95, bitCm: 1.11125 },
  { id: 4, season: 2027, azimuthDeg: 180, heightCm: 120, bitCm: 0.79375 },
  // A hole recorded for a later season is not on this season's trunk.
  { id: 5, season: 2028, azimuthDeg: 10, heightCm: 90, bitCm: 0.79375 },
];
const placements = [{ azimuthDeg: 160, heightCm: 110 }];

describe('reading a trunk’s holes for the diagram', () => {
  it('fades each earlier hole by the growth laid over it since, and drops it once out of reach', () => {
    const marks = readTrunkHoles(holes, placements, reading);
    expect(marks.map((m) => [m.kind, m.season])).toEqual([
      ['earlier', 2010],
      ['earlier', 2020],
      ['earlier', 2025],
      ['this-season', 2027],
      ['advised', 2027],
    ]);
    const [old, seven, two, now, advised] = marks;
    // 17 seasons × 0.4 cm is past 4.48 cm of reach: grown over.
    expect(old).toMatchObject({ stainLeft: 0, inReach: false });
    expect(seven.stainLeft).toBeCloseTo(1 - (0.4 * 7) / wood, 10);
    expect(two.stainLeft).toBeCloseTo(1 - (0.4 * 2) / wood, 10);
    expect(two).toMatchObject({ inReach: true, azimuthDeg: 10, bitCm: 1.11125 });
    expect(now).toMatchObject({ stainLeft: 1, inReach: false });
    expect(advised).toMatchObject({ azimuthDeg: 160, heightCm: 110, bitCm: 0.79375 });
  });

  it('keeps every hole in reach on a tree that is not growing', () => {
    const marks = readTrunkHoles(holes, [], { ...reading, radialGrowthCmPerYear: 0 });
    expect(marks.filter((m) => m.kind === 'earlier').every((m) => m.inReach)).toBe(true);
  });
});

describe('the trunk diagram', () => {
  const draw = () =>
    render(
      <TrunkDiagram
        marks={readTrunkHoles(holes, placements, reading)}
        season={2027}
        heightBand={{ minCm: 60, maxCm: 150 }}
        dbhCm={40}
        stainLengthCm={30}
        stainMarginCm={1}
        system="metric"
        tag="0412"
      />,
    );

  it('sums the trunk up in its accessible name and lists every hole as text beside it', () => {
    draw();
    expect(screen.getByRole('img')).toHaveAccessibleName(
      'Trunk of tree 0412, unrolled from north round to north: 3 earlier holes, 2 still in reach of new holes; 1 drilled in 2027; 1 advised spot.',
    );
    const items = within(screen.getByRole('list', { name: 'Holes on this trunk' }))
      .getAllByRole('listitem')
      .map((li) => li.textContent);
    expect(items).toEqual([
      'Advised spot: south (160°) at 1.10 m',
      '2027, drilled this season: south (180°) at 1.20 m',
      `2025: north (10°) at 0.95 m, ${Math.round((1 - 0.8 / wood) * 100)} % of its stain still in reach`,
      `2020: south-west (225°) at 1.05 m, ${Math.round((1 - 2.8 / wood) * 100)} % of its stain still in reach`,
      '2010: east (90°) at 1.00 m, grown over, out of reach of new holes',
    ]);
  });

  it('draws older stain fainter, a grown-over hole without its stain, and the advised spot apart', () => {
    const { container } = draw();
    const earlier = [...container.querySelectorAll('[data-mark="earlier"]')];
    const opacity = (season: number) =>
      Number(
        earlier
          .find((g) => g.getAttribute('data-season') === String(season))!
          .querySelector('circle')!
          .getAttribute('fill-opacity'),
      );
    expect(opacity(2025)).toBeGreaterThan(opacity(2020));
    const grownOver = earlier.find((g) => g.getAttribute('data-season') === '2010')!;
    expect(grownOver.querySelector('rect')).toBeNull();
    expect(grownOver.querySelector('circle')).toHaveAttribute('stroke-dasharray', '2 2');
    expect(container.querySelectorAll('[data-mark="advised"]')).toHaveLength(1);
    expect(container.querySelectorAll('[data-mark="this-season"]')).toHaveLength(1);
  });
});
