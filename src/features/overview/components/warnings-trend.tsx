import { Legend, Line, LineChart, Tooltip, XAxis, YAxis } from 'recharts';
import { warningCodes } from '@shared/rules/index';
import type { TrendsResponse } from '@shared/schemas/trends';
import { axisProps, lineProps, tooltipStyle } from '@/components/ui/chart-frame';
import { paths } from '@/config/paths';
import { formatNumber } from '@/lib/units';
import { warningLabel } from '@/lib/warning-labels';
import { leadingWarnings, percent, warningsSentence } from '../lib/trend-words';
import {
  ChartBox,
  chartFont,
  chartMargin,
  dashes,
  seasonTick,
  series,
  legendProps,
  unitTick,
} from './chart-kit';
import { FigureLink, TrendFigure, TrendTable } from './trend-figure';

/** The share of trees whose advice carries each warning; the chart draws the four most common. */
export function WarningsTrend({ trends }: { trends: TrendsResponse }) {
  const id = trends.sugarbushId;
  const drawn = leadingWarnings(trends);
  const listed = warningCodes.filter((c) => trends.items.some((i) => i.warnings[c] > 0));
  const data = trends.items.map((i) => ({
    x: seasonTick(i),
    ...Object.fromEntries(
      drawn.map((c) => [c, i.trees > 0 ? (100 * i.warnings[c]) / i.trees : null]),
    ),
  }));
  return (
    <TrendFigure
      title="Trees with each warning"
      sentence={warningsSentence(trends)}
      chart={
        <ChartBox>
          <LineChart data={data} margin={chartMargin}>
            <XAxis dataKey="x" minTickGap={2} {...axisProps(chartFont)} />
            <YAxis width={56} tickFormatter={unitTick('%')} {...axisProps(chartFont)} />
            <Tooltip
              contentStyle={tooltipStyle}
              formatter={(v) => `${formatNumber(Number(v), 1)} %`}
            />
            <Legend {...legendProps} />
            {drawn.map((c, n) => (
              <Line
                key={c}
                dataKey={c}
                name={warningLabel(c)}
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
          label="Trees with each warning by season"
          items={trends.items}
          columns={listed.map((c) => ({
            key: c,
            header: warningLabel(c),
            cell: (i) => (
              <FigureLink to={paths.plan.href(id, { season: i.season, warning: c })}>
                {formatNumber(i.warnings[c])} ({percent(i.warnings[c], i.trees)})
              </FigureLink>
            ),
          }))}
        />
      }
    />
  );
}
