import { Line, ReferenceLine, Tooltip, XAxis, YAxis } from 'recharts';
import type { ProjectedSeason } from '@shared/rules/index';
import { LineChartFrame, axisProps, lineProps, tooltipStyle } from '@/components/ui/chart-frame';
import { colors } from '@/lib/theme';
import { formatNumber } from '@/lib/units';

interface Point {
  season: number;
  share: number;
}

/** The clear share of the tapping zone season by season at the advised rate, against the floor. */
export function ShareProjectionChart({
  projection,
  floor,
  tapsPerYear,
}: {
  projection: readonly ProjectedSeason[];
  floor: number;
  tapsPerYear: number;
}) {
  if (projection.length === 0) return null;
  const points: Point[] = projection.map((p) => ({
    season: p.season,
    share: Number((p.shareBefore * 100).toFixed(1)),
  }));
  const floorPct = floor * 100;
  const lowest = Math.min(floorPct, ...points.map((p) => p.share));
  const bottom = Math.max(0, Math.floor((lowest - 5) / 5) * 5);
  const step = 100 - bottom > 30 ? 10 : 5;
  const ticks = Array.from(
    { length: Math.floor((100 - bottom) / step) + 1 },
    (_, i) => bottom + i * step,
  );
  const first = points[0];
  const last = points[points.length - 1];
  const rate =
    tapsPerYear === 0
      ? 'left untapped'
      : `tapped ${['once', 'twice'][tapsPerYear - 1] ?? `${tapsPerYear} times`} a year`;
  const summary = `Clear wood ${rate}: ${formatNumber(first.share)} % in ${first.season}, ${formatNumber(last.share)} % in ${last.season}; floor ${formatNumber(floorPct)} %`;

  return (
    <LineChartFrame summary={summary} data={points} height="h-48">
      <XAxis
        dataKey="season"
        type="number"
        domain={[first.season, last.season]}
        tickCount={5}
        allowDecimals={false}
        {...axisProps(13)}
      />
      <YAxis
        domain={[bottom, 100]}
        ticks={ticks}
        interval={0}
        width={48}
        unit=" %"
        allowDecimals={false}
        {...axisProps(13)}
      />
      <ReferenceLine
        y={floorPct}
        stroke={colors.alert}
        strokeDasharray="5 4"
        label={{
          value: `Floor ${formatNumber(floorPct)} %`,
          position: 'insideBottomRight',
          fill: colors.alert,
          fontSize: 13,
        }}
      />
      <Tooltip
        formatter={(value) => [`${formatNumber(Number(value), 1)} %`, 'Clear wood']}
        labelFormatter={(season) => `Season ${season}`}
        contentStyle={tooltipStyle}
      />
      <Line dataKey="share" stroke={colors.moss} dot={false} {...lineProps} />
    </LineChartFrame>
  );
}
