import type { ReactElement } from 'react';
import { Bar, BarChart, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { TrendSeason } from '@shared/schemas/trends';
import { axisProps, tooltipStyle } from '@/components/ui/chart-frame';
import { colors } from '@/lib/theme';
import { formatNumber } from '@/lib/units';

/** Margins that leave a phone's 390 px mostly to the plot. */
export const chartMargin = { top: 8, right: 8, bottom: 0, left: -8 };

/** Series colours in the order series are added: the accent first, then Okabe–Ito hues. */
export const series = [
  colors.sap,
  colors.moss,
  colors.advice.rest,
  colors.advice.small,
  colors.bark,
  colors.advice.reduced,
];

/** A second cue beside colour: each line of a chart drawn with its own dash. */
export const dashes = ['', '6 3', '2 3', '8 3 2 3', '1 2'];

export const chartFont = 12;

/** Legends list their series in the order they are drawn. */
export const legendProps = { wrapperStyle: { fontSize: chartFont }, itemSorter: null };

/** An axis tick with its unit, never broken across two lines. */
export const unitTick = (unit: string) => (v: number) => `${v}\u00a0${unit}`;

/** The x-axis label of a season (the section's note says which one is planned). */
export const seasonTick = (i: TrendSeason) => String(i.season);

/** Ticks of a chart in per cent of a whole. */
export const percentTicks = [0, 25, 50, 75, 100];

export function ChartBox({ children }: { children: ReactElement }) {
  return (
    <ResponsiveContainer width="100%" height="100%">
      {children}
    </ResponsiveContainer>
  );
}

export interface StackSeries {
  key: string;
  label: string;
  colour: string;
}

/** Bars of 100 % per season, stacked by `series`: the shares a season's trees fall into. */
export function PercentStackChart({
  data,
  series,
  stackId,
}: {
  data: Record<string, number | string>[];
  series: readonly StackSeries[];
  stackId: string;
}) {
  return (
    <ChartBox>
      <BarChart data={data} margin={chartMargin}>
        <XAxis dataKey="x" minTickGap={2} {...axisProps(chartFont)} />
        <YAxis
          width={56}
          tickFormatter={unitTick('%')}
          domain={[0, 100]}
          ticks={percentTicks}
          {...axisProps(chartFont)}
        />
        <Tooltip contentStyle={tooltipStyle} formatter={(v) => `${formatNumber(Number(v), 1)} %`} />
        <Legend {...legendProps} />
        {series.map((s) => (
          <Bar
            key={s.key}
            dataKey={s.key}
            name={s.label}
            stackId={stackId}
            fill={s.colour}
            isAnimationActive={false}
          />
        ))}
      </BarChart>
    </ChartBox>
  );
}
