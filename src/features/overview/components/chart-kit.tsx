import type { ReactElement } from 'react';
import { ResponsiveContainer } from 'recharts';
import type { TrendSeason } from '@shared/schemas/trends';
import { colors } from '@/lib/theme';

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
