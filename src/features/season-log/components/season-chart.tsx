import {
  Bar,
  ComposedChart,
  Legend,
  Line,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { RunClass } from '@shared/rules/index';
import { axisProps, tooltipStyle } from '@/components/ui/chart-frame';
import { colors } from '@/lib/theme';
import { usePhone } from '@/lib/use-media-query';
import { formatNumber, roundTo } from '@/lib/units';
import type { SeasonDay } from '../lib/season-days';
import { fromCelsius, fromLitres, type SeasonUnits } from '../lib/season-units';
import { runLabels, tickDayOf } from '../lib/season-words';

interface Point {
  date: string;
  low: number | null;
  high: number | null;
  sap: number | null;
  brix: number | null;
  /** Where a run day's mark sits: a strip along the top of the temperature axis. */
  strong: number | null;
  run: number | null;
}

const FONT = 12;
const HIGH = colors.advice.reduced;
const LOW = colors.advice.rest;

/** A run day's mark: ▲ for a strong run, ● for a run, so shape tells them apart as well as colour. */
function RunMark({
  cx,
  cy,
  payload,
  kind,
}: {
  cx?: number;
  cy?: number;
  payload?: Point;
  kind: Exclude<RunClass, 'none'>;
}) {
  if (cx === undefined || cy === undefined || !payload || payload[kind] === null) return <g />;
  const label = `${tickDayOf(payload.date)}: ${runLabels[kind].toLowerCase()}`;
  return (
    <g data-run-day={payload.date} data-run={kind}>
      <title>{label}</title>
      {kind === 'strong' ? (
        <path
          d={`M${cx},${cy - 6} L${cx + 6},${cy + 5} L${cx - 6},${cy + 5} Z`}
          fill={colors.moss}
          stroke={colors.ink}
          strokeWidth={1}
        />
      ) : (
        <circle cx={cx} cy={cy} r={4.5} fill={colors.moss} stroke={colors.ink} strokeWidth={1} />
      )}
    </g>
  );
}

/**
 * The season on one chart: night lows and day highs with the freezing line, each run day marked
 * along the top, sap collected as bars on the right-hand axis and its sugar as a dashed line.
 */
export function SeasonChart({
  days,
  units,
  summary,
  tableId,
}: {
  days: readonly SeasonDay[];
  units: SeasonUnits;
  summary: string;
  /** The table below that says the same in words. */
  tableId: string;
}) {
  const phone = usePhone();
  const t = units.temperature;
  const freezing = t === 'F' ? 32 : 0;
  const temps = days.flatMap((d) =>
    d.minC === null || d.maxC === null ? [] : [fromCelsius(d.minC, t), fromCelsius(d.maxC, t)],
  );
  const step = t === 'F' ? 10 : 5;
  const bottom = Math.floor(Math.min(freezing, ...temps) / step) * step;
  const top = Math.ceil((Math.max(freezing, ...temps) + step / 2) / step) * step;
  const markAt = top + step / 2;
  // A short season's lines are a few points: show them.
  const lineDot = days.length < 15 ? { r: 3 } : false;
  const data: Point[] = days.map((d) => ({
    date: d.date,
    low: d.minC === null ? null : roundTo(fromCelsius(d.minC, t), 1),
    high: d.maxC === null ? null : roundTo(fromCelsius(d.maxC, t), 1),
    sap: d.sap ? roundTo(fromLitres(d.sap.volumeL, units.volume), 2) : null,
    brix: d.sap ? roundTo(d.sap.meanSugarPct, 2) : null,
    strong: d.run === 'strong' ? markAt : null,
    run: d.run === 'run' ? markAt : null,
  }));
  const unitOf: Record<string, string> = {
    low: `°${t}`,
    high: `°${t}`,
    sap: units.volume,
    brix: '°Brix',
  };
  return (
    <figure>
      <div
        role="img"
        aria-label={summary}
        aria-describedby={tableId}
        data-chart="season"
        className="h-80 w-full md:h-96"
      >
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart
            data={data}
            margin={{ top: 8, right: 4, bottom: 0, left: -8 }}
            accessibilityLayer={false}
          >
            <XAxis dataKey="date" tickFormatter={tickDayOf} minTickGap={16} {...axisProps(FONT)} />
            <YAxis
              yAxisId="t"
              domain={[bottom, markAt + step / 2]}
              ticks={Array.from({ length: (top - bottom) / step + 1 }, (_, i) => bottom + i * step)}
              width={52}
              tickFormatter={(v: number) => `${formatNumber(v)}\u00a0°${t}`}
              {...axisProps(FONT)}
            />
            <YAxis
              yAxisId="sap"
              orientation="right"
              width={56}
              tickFormatter={(v: number) => `${formatNumber(v)}\u00a0${units.volume}`}
              {...axisProps(FONT)}
            />
            {/* On a phone the sugar line keeps its shape without an axis of its own; the table has the figures. */}
            <YAxis
              yAxisId="brix"
              orientation="right"
              hide={phone}
              width={phone ? 0 : 44}
              domain={[0, (max: number) => Math.max(4, Math.ceil(max + 0.5))]}
              tickFormatter={(v: number) => `${formatNumber(v)}\u00a0°Bx`}
              {...axisProps(FONT)}
            />
            <Tooltip
              contentStyle={tooltipStyle}
              labelFormatter={(label) => tickDayOf(String(label))}
              formatter={(value, name, item) => {
                const key = String(item.dataKey);
                if (key === 'strong' || key === 'run') return [runLabels[key], 'Run'];
                return [`${formatNumber(Number(value), 1)} ${unitOf[key]}`, name];
              }}
            />
            <Legend wrapperStyle={{ fontSize: FONT }} itemSorter={null} />
            <Bar
              yAxisId="sap"
              dataKey="sap"
              name={`Sap (${units.volume})`}
              fill={colors.sap}
              fillOpacity={0.55}
              maxBarSize={28}
              isAnimationActive={false}
            />
            <ReferenceLine
              yAxisId="t"
              y={freezing}
              stroke={colors.ink}
              strokeDasharray="4 3"
              label={{
                value: `Freezing, ${freezing} °${t}`,
                position: 'insideBottomLeft',
                fill: colors.ink,
                fontSize: FONT,
              }}
            />
            <Line
              yAxisId="t"
              dataKey="high"
              name="Day high"
              stroke={HIGH}
              strokeWidth={2}
              dot={lineDot && { ...lineDot, fill: HIGH }}
              connectNulls
              isAnimationActive={false}
            />
            <Line
              yAxisId="t"
              dataKey="low"
              name="Night low"
              stroke={LOW}
              strokeWidth={2}
              strokeDasharray="6 3"
              dot={lineDot && { ...lineDot, fill: LOW }}
              connectNulls
              isAnimationActive={false}
            />
            <Line
              yAxisId="brix"
              dataKey="brix"
              name="Sugar (°Brix)"
              stroke={colors.bark}
              strokeWidth={1.5}
              strokeDasharray="2 3"
              dot={{ r: 2 }}
              isAnimationActive={false}
            />
            <Line
              yAxisId="t"
              dataKey="strong"
              name="Strong run"
              legendType="triangle"
              // No line between the marks: the legend takes its colour from the stroke.
              stroke={colors.moss}
              strokeWidth={0}
              dot={(p) => <RunMark key={`s-${p.index}`} {...p} kind="strong" />}
              activeDot={false}
              isAnimationActive={false}
            />
            <Line
              yAxisId="t"
              dataKey="run"
              name="Run"
              legendType="circle"
              stroke={colors.moss}
              strokeWidth={0}
              dot={(p) => <RunMark key={`r-${p.index}`} {...p} kind="run" />}
              activeDot={false}
              isAnimationActive={false}
            />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="mt-1 text-sm text-bark">
        {summary}. Run days are marked along the top (▲ strong, ● run); sugar in °Brix is the dotted
        line; every day is in the table below.
      </figcaption>
    </figure>
  );
}
