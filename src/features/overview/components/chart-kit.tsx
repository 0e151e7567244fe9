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

/** The x-axis label of a season: the planned one marked so. */
export const seasonTick = (i: TrendSeason) => (i.planned ? `${i.season}*` : String(i.season));

export function ChartBox({ children }: { children: ReactElement }) {
  return (
    <ResponsiveContainer width="100%" height="100%">
      {children}
    </ResponsiveContainer>
  );
}
