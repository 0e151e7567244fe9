import { Bar, BarChart, Legend, Tooltip, XAxis, YAxis } from 'recharts';
import { treeStatusLabels, treeStatuses } from '@shared/schemas/enums';
import type { TrendsResponse } from '@shared/schemas/trends';
import { axisProps, tooltipStyle } from '@/components/ui/chart-frame';
import { paths } from '@/config/paths';
import { formatNumber } from '@/lib/units';
import { statusSentence } from '../lib/trend-words';
import { ChartBox, chartFont, chartMargin, seasonTick, series, legendProps } from './chart-kit';
import { FigureLink, TrendFigure, TrendTable } from './trend-figure';

/** Trees in the record each season by their status then: active, held out, dead, removed. */
export function StatusTrend({ trends }: { trends: TrendsResponse }) {
  const id = trends.sugarbushId;
  const data = trends.items.map((i) => ({ x: seasonTick(i), ...i.byStatus }));
  return (
    <TrendFigure
      title="Trees by status"
      sentence={statusSentence(trends)}
      chart={
        <ChartBox>
          <BarChart data={data} margin={chartMargin}>
            <XAxis dataKey="x" minTickGap={2} {...axisProps(chartFont)} />
            <YAxis width={48} {...axisProps(chartFont)} />
            <Tooltip contentStyle={tooltipStyle} />
            <Legend {...legendProps} />
            {treeStatuses.map((s, n) => (
              <Bar
                key={s}
                dataKey={s}
                name={treeStatusLabels[s]}
                stackId="status"
                fill={series[n]}
                isAnimationActive={false}
              />
            ))}
          </BarChart>
        </ChartBox>
      }
      table={
        <TrendTable
          label="Trees by status by season"
          items={trends.items}
          columns={[
            {
              key: 'trees',
              header: 'Trees',
              cell: (i) => (
                <FigureLink to={paths.trees.href(id)}>{formatNumber(i.trees)}</FigureLink>
              ),
            },
            ...treeStatuses.map((s) => ({
              key: s,
              header: treeStatusLabels[s],
              cell: (i: (typeof trends.items)[number]) => (
                <FigureLink to={paths.trees.href(id, { status: s })}>
                  {formatNumber(i.byStatus[s])}
                </FigureLink>
              ),
            })),
          ]}
        />
      }
    />
  );
}
