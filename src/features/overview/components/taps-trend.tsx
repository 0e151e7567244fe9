import { Bar, BarChart, Legend, Tooltip, XAxis, YAxis } from 'recharts';
import type { TrendsResponse } from '@shared/schemas/trends';
import { axisProps, tooltipStyle } from '@/components/ui/chart-frame';
import { paths } from '@/config/paths';
import { formatNumber } from '@/lib/units';
import { tapsSentence } from '../lib/trend-words';
import { ChartBox, chartFont, chartMargin, seasonTick, series, legendProps } from './chart-kit';
import { FigureLink, TrendFigure, TrendTable } from './trend-figure';

/** Tapholes recorded each season beside the taps the season's advice allowed. */
export function TapsTrend({ trends }: { trends: TrendsResponse }) {
  const id = trends.sugarbushId;
  const data = trends.items.map((i) => ({
    x: seasonTick(i),
    set: i.planned ? null : i.tapsSet,
    advised: i.tapsAdvised,
  }));
  const report = (season: number, extra: Record<string, string> = {}) =>
    `${paths.overview.href(id, { season, ...extra })}#compliance`;
  return (
    <TrendFigure
      title="Taps set against the advice"
      sentence={tapsSentence(trends)}
      chart={
        <ChartBox>
          <BarChart data={data} margin={chartMargin}>
            <XAxis dataKey="x" minTickGap={2} {...axisProps(chartFont)} />
            <YAxis width={48} {...axisProps(chartFont)} />
            <Tooltip contentStyle={tooltipStyle} />
            <Legend {...legendProps} />
            <Bar dataKey="set" name="Taps set" fill={series[0]} isAnimationActive={false} />
            <Bar
              dataKey="advised"
              name="Taps the advice allowed"
              fill={series[1]}
              isAnimationActive={false}
            />
          </BarChart>
        </ChartBox>
      }
      table={
        <TrendTable
          label="Taps set and advised by season"
          items={trends.items}
          columns={[
            {
              key: 'set',
              header: 'Taps set',
              cell: (i) =>
                i.planned ? (
                  '—'
                ) : (
                  <FigureLink to={report(i.season)}>{formatNumber(i.tapsSet)}</FigureLink>
                ),
            },
            {
              key: 'tapped',
              header: 'Trees tapped',
              cell: (i) =>
                i.planned ? (
                  '—'
                ) : (
                  <FigureLink to={report(i.season)}>{formatNumber(i.treesTapped)}</FigureLink>
                ),
            },
            {
              key: 'advised',
              header: 'Taps advised',
              cell: (i) => (
                <FigureLink to={paths.plan.href(id, { season: i.season, sort: '-taps' })}>
                  {formatNumber(i.tapsAdvised)}
                </FigureLink>
              ),
            },
            {
              key: 'over',
              header: 'Trees over the advice',
              cell: (i) =>
                i.planned ? (
                  '—'
                ) : (
                  <FigureLink to={report(i.season, { finding: 'over' })}>
                    {formatNumber(i.treesOverAdvice)}
                  </FigureLink>
                ),
            },
          ]}
        />
      }
    />
  );
}
