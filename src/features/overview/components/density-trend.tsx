import { Legend, Line, LineChart, Tooltip, XAxis, YAxis } from 'recharts';
import type { TrendSeason, TrendsResponse } from '@shared/schemas/trends';
import { axisProps, lineProps, tooltipStyle } from '@/components/ui/chart-frame';
import { paths } from '@/config/paths';
import { formatNumber, type UnitSystem } from '@/lib/units';
import {
  areaWords,
  densitySentence,
  tapsAdvisedPerArea,
  tapsSetPerArea,
  treesPerArea,
} from '../lib/trend-words';
import {
  ChartBox,
  chartFont,
  chartMargin,
  dashes,
  seasonTick,
  series,
  legendProps,
} from './chart-kit';
import { FigureLink, TrendFigure, TrendTable } from './trend-figure';

/** Trees standing, taps set and taps advised per acre or hectare within the boundary. */
export function DensityTrend({ trends, system }: { trends: TrendsResponse; system: UnitSystem }) {
  const { per } = areaWords(system);
  const id = trends.sugarbushId;
  const lines = [
    { key: 'trees', name: `Trees per ${per}`, value: (i: TrendSeason) => treesPerArea(i, system) },
    {
      key: 'set',
      name: `Taps set per ${per}`,
      value: (i: TrendSeason) => (i.planned ? null : tapsSetPerArea(i, system)),
    },
    {
      key: 'advised',
      name: `Taps advised per ${per}`,
      value: (i: TrendSeason) => tapsAdvisedPerArea(i, system),
    },
  ];
  const data = trends.items.map((i) => ({
    x: seasonTick(i),
    ...Object.fromEntries(lines.map((l) => [l.key, l.value(i)])),
  }));
  const show = (v: number | null) => (v === null ? '—' : formatNumber(v, 1));
  return (
    <TrendFigure
      title={`Trees and taps per ${per}`}
      sentence={densitySentence(trends, system)}
      chart={
        <ChartBox>
          <LineChart data={data} margin={chartMargin}>
            <XAxis dataKey="x" minTickGap={2} {...axisProps(chartFont)} />
            <YAxis width={40} {...axisProps(chartFont)} />
            <Tooltip contentStyle={tooltipStyle} formatter={(v) => show(Number(v))} />
            <Legend {...legendProps} />
            {lines.map((l, n) => (
              <Line
                key={l.key}
                dataKey={l.key}
                name={l.name}
                stroke={series[n]}
                strokeDasharray={dashes[n]}
                dot={{ r: 2 }}
                {...lineProps}
              />
            ))}
          </LineChart>
        </ChartBox>
      }
      table={
        <TrendTable
          label={`Trees and taps per ${per} by season`}
          items={trends.items}
          columns={lines.map((l) => ({
            key: l.key,
            header: l.name,
            cell: (i) => (
              <FigureLink
                to={
                  l.key === 'trees'
                    ? paths.trees.href(id)
                    : paths.plan.href(id, { season: i.season, sort: '-taps' })
                }
              >
                {show(l.value(i))}
              </FigureLink>
            ),
          }))}
        />
      }
    />
  );
}
