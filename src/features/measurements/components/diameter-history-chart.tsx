import { Line, Tooltip, XAxis, YAxis } from 'recharts';
import type { Measurement } from '@shared/schemas/measurement';
import { LineChartFrame, axisProps, lineProps, tooltipStyle } from '@/components/ui/chart-frame';
import { niceTicks } from '@/lib/nice-ticks';
import { colors } from '@/lib/theme';
import { formatDate, formatDbh, formatNumber, fromCm, type LengthUnit } from '@/lib/units';

const DAY_MS = 86_400_000;

/** The narrowest DBH axis, in the unit shown: a tree grows slowly, so a flat history stays flat. */
const MIN_DBH_SPAN = 1;

/** A date as a fractional year, so seasons sit at even spacing on the axis. */
function yearOf(iso: string): number {
  const date = new Date(`${iso}T00:00:00Z`);
  const year = date.getUTCFullYear();
  const start = Date.UTC(year, 0, 1);
  const days = (Date.UTC(year + 1, 0, 1) - start) / DAY_MS;
  return year + (date.getTime() - start) / DAY_MS / days;
}

interface Point {
  x: number;
  dbh: number;
  measuredOn: string;
}

/** DBH over time from the rows that stand (corrections replace what they correct). */
export function DiameterHistoryChart({ rows, unit }: { rows: Measurement[]; unit: LengthUnit }) {
  const points: Point[] = rows.map((m) => ({
    x: yearOf(m.measuredOn),
    dbh: Number(fromCm(m.dbhCm, unit).toFixed(2)),
    measuredOn: m.measuredOn,
  }));
  if (points.length === 0) return null;
  const firstYear = Math.floor(points[0].x);
  const lastYear = Math.max(Math.ceil(points[points.length - 1].x), firstYear + 1);
  const years = Array.from({ length: lastYear - firstYear + 1 }, (_, i) => firstYear + i);
  const dbhs = points.map((p) => p.dbh);
  const dbhAxis = niceTicks(Math.min(...dbhs), Math.max(...dbhs), { minSpan: MIN_DBH_SPAN });
  const first = rows[0];
  const last = rows[rows.length - 1];
  const summary =
    rows.length === 1
      ? `DBH ${formatDbh(first.dbhCm, unit)} on ${formatDate(first.measuredOn)}`
      : `DBH from ${formatDbh(first.dbhCm, unit)} in ${first.season} to ${formatDbh(last.dbhCm, unit)} in ${last.season}`;

  return (
    <LineChartFrame
      summary={summary}
      data={points}
      margin={{ top: 8, right: 16, bottom: 8, left: 0 }}
      height="h-64"
      className="mt-4"
    >
      <XAxis
        dataKey="x"
        type="number"
        domain={[firstYear, lastYear]}
        ticks={years}
        tickFormatter={(year: number) => String(year)}
        {...axisProps(14)}
      />
      <YAxis
        dataKey="dbh"
        type="number"
        domain={[dbhAxis.ticks[0], dbhAxis.ticks[dbhAxis.ticks.length - 1]]}
        ticks={dbhAxis.ticks}
        interval={0}
        width={56}
        tickFormatter={(v: number) => formatNumber(v, dbhAxis.decimals)}
        {...axisProps(14)}
        unit={` ${unit}`}
      />
      <Tooltip
        formatter={(value) => [`${formatNumber(Number(value), 1)} ${unit}`, 'DBH']}
        labelFormatter={(_, payload) =>
          formatDate((payload?.[0]?.payload as Point | undefined)?.measuredOn)
        }
        contentStyle={tooltipStyle}
      />
      <Line dataKey="dbh" stroke={colors.sap} dot={{ r: 3, fill: colors.sap }} {...lineProps} />
    </LineChartFrame>
  );
}
