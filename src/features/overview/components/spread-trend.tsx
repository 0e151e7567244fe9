import { Area, ComposedChart, Line, Tooltip, XAxis, YAxis } from 'recharts';
import type { Spread, TrendSeason, TrendsResponse } from '@shared/schemas/trends';
import { axisProps, lineProps, tooltipStyle } from '@/components/ui/chart-frame';
import { colors } from '@/lib/theme';
import { formatNumber } from '@/lib/units';
import { ChartBox, chartFont, chartMargin, seasonTick, unitTick } from './chart-kit';
import { FigureLink, TrendFigure, TrendTable } from './trend-figure';

/**
 * A figure that spreads over the trees, season by season: the median as a line and the middle
 * half of the trees (first to third quartile) as a band.
 */
export function SpreadTrend({
  trends,
  title,
  sentence,
  spreadOf,
  convert,
  unit,
  digits,
  linkFor,
}: {
  trends: TrendsResponse;
  title: string;
  sentence: string;
  spreadOf: (i: TrendSeason) => Spread | null;
  /** From the stored unit to the one shown. */
  convert: (v: number) => number;
  unit: string;
  digits: number;
  /** The plan or list behind a season's figures. */
  linkFor: (i: TrendSeason) => string;
}) {
  const data = trends.items.map((i) => {
    const s = spreadOf(i);
    return {
      x: seasonTick(i),
      median: s ? convert(s.median) : null,
      band: s ? [convert(s.q1), convert(s.q3)] : null,
    };
  });
  const show = (v: number | undefined) =>
    v === undefined ? '—' : formatNumber(convert(v), digits);
  const cell = (pick: (s: Spread) => number) => (i: TrendSeason) => {
    const s = spreadOf(i);
    return s ? <FigureLink to={linkFor(i)}>{show(pick(s))}</FigureLink> : '—';
  };
  return (
    <TrendFigure
      title={title}
      sentence={sentence}
      chart={
        <ChartBox>
          <ComposedChart data={data} margin={chartMargin}>
            <XAxis dataKey="x" minTickGap={2} {...axisProps(chartFont)} />
            <YAxis width={52} tickFormatter={unitTick(unit)} {...axisProps(chartFont)} />
            <Tooltip
              contentStyle={tooltipStyle}
              formatter={(v, name) => [
                Array.isArray(v)
                  ? `${formatNumber(Number(v[0]), digits)}–${formatNumber(Number(v[1]), digits)} ${unit}`
                  : `${formatNumber(Number(v), digits)} ${unit}`,
                name === 'band' ? 'Middle half' : 'Median',
              ]}
            />
            <Area
              dataKey="band"
              stroke="none"
              fill={colors.frost}
              fillOpacity={1}
              isAnimationActive={false}
            />
            <Line dataKey="median" stroke={colors.sap} dot={{ r: 3 }} {...lineProps} />
          </ComposedChart>
        </ChartBox>
      }
      table={
        <TrendTable
          label={`${title} by season`}
          items={trends.items}
          columns={[
            { key: 'q1', header: `First quartile (${unit})`, cell: cell((s) => s.q1) },
            { key: 'median', header: `Median (${unit})`, cell: cell((s) => s.median) },
            { key: 'q3', header: `Third quartile (${unit})`, cell: cell((s) => s.q3) },
            {
              key: 'trees',
              header: 'Trees',
              cell: (i) => formatNumber(spreadOf(i)?.trees ?? 0),
            },
          ]}
        />
      }
    />
  );
}
