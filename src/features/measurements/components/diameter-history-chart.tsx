import {
  CartesianGrid,
  Line,
  LineChart,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { Measurement } from '@shared/schemas/measurement';
import { colors } from '@/lib/theme';
import { formatDate, formatDbh, formatNumber, fromCm, type LengthUnit } from '@/lib/units';

const DAY_MS = 86_400_000;

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
  const ticks = Array.from({ length: lastYear - firstYear + 1 }, (_, i) => firstYear + i);
  const first = rows[0];
  const last = rows[rows.length - 1];
  const summary =
    rows.length === 1
      ? `DBH ${formatDbh(first.dbhCm, unit)} on ${formatDate(first.measuredOn)}`
      : `DBH from ${formatDbh(first.dbhCm, unit)} in ${first.season} to ${formatDbh(last.dbhCm, unit)} in ${last.season}`;

  return (
    <figure className="mt-4">
      <div role="img" aria-label={summary} className="h-64 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={points} margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
            <CartesianGrid stroke={colors.rule} vertical={false} />
            <XAxis
              dataKey="x"
              type="number"
              domain={[firstYear, lastYear]}
              ticks={ticks}
              tickFormatter={(year: number) => String(year)}
              stroke={colors.bark}
              tick={{ fill: colors.ink, fontSize: 14 }}
            />
            <YAxis
              dataKey="dbh"
              domain={['auto', 'auto']}
              width={56}
              tickFormatter={(v: number) => formatNumber(v, 1)}
              stroke={colors.bark}
              tick={{ fill: colors.ink, fontSize: 14 }}
              unit={` ${unit}`}
            />
            <Tooltip
              formatter={(value) => [`${formatNumber(Number(value), 1)} ${unit}`, 'DBH']}
              labelFormatter={(_, payload) =>
                formatDate((payload?.[0]?.payload as Point | undefined)?.measuredOn)
              }
              contentStyle={{
                background: colors.paper,
                borderColor: colors.rule,
                color: colors.ink,
              }}
            />
            <Line
              type="monotone"
              dataKey="dbh"
              stroke={colors.sap}
              strokeWidth={2}
              dot={{ r: 3, fill: colors.sap }}
              isAnimationActive={false}
            />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="mt-1 text-sm text-bark">{summary}.</figcaption>
    </figure>
  );
}
