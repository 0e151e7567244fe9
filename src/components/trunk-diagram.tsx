import { markWords, trunkSummary, type TrunkMark } from '@/lib/trunk-holes';
import { cmToIn, formatNumber, type UnitSystem } from '@/lib/units';
import { TrunkLegend } from './trunk-legend';

interface Props {
  marks: readonly TrunkMark[];
  season: number;
  /** The guideline's tapping band, cm above the ground. */
  heightBand: { minCm: number; maxCm: number };
  /** Sets the trunk's width round; without a DBH the diagram is not to scale across. */
  dbhCm: number | null;
  /** Each hole's stain column, as the advisor models it. */
  stainLengthCm: number;
  stainMarginCm: number;
  system: UnitSystem;
  /** Names the tree in the diagram's accessible name. */
  tag?: string;
  /** Show the text list under the drawing open; else it opens on request. */
  listOpen?: boolean;
}

const PLOT_W = 360;
const LEFT = 46;
const RIGHT = 8;
const TOP = 8;
const BOTTOM = 26;
const MIN_PLOT_H = 150;
const MAX_PLOT_H = 420;
const points = ['N', 'NE', 'E', 'SE', 'S', 'SW', 'W', 'NW', 'N'];

/** Height marks every foot, or every 25 cm. */
function heightTicks(lo: number, hi: number, system: UnitSystem): number[] {
  const step = system === 'imperial' ? 12 * 2.54 : 25;
  const ticks: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + 1e-9; v += step) ticks.push(v);
  return ticks;
}

const tickLabel = (cm: number, system: UnitSystem) =>
  system === 'imperial' ? `${Math.round(cmToIn(cm) / 12)} ft` : `${formatNumber(cm / 100, 2)} m`;

/**
 * The trunk's bark unrolled: compass bearing left to right from north round to north, height up
 * through the tapping band, to scale where the DBH is known. Earlier holes carry their stain
 * column, fading as growth covers it, hollow once out of reach; this season's holes are solid
 * green, advised spots open rings in the accent colour, numbered. A text list says the same.
 */
export function TrunkDiagram({
  marks,
  season,
  heightBand,
  dbhCm,
  stainLengthCm,
  stainMarginCm,
  system,
  tag,
  listOpen = true,
}: Props) {
  const has = (kind: TrunkMark['kind']) => marks.some((m) => m.kind === kind);
  const heights = [heightBand.minCm, heightBand.maxCm, ...marks.map((m) => m.heightCm)];
  const lo = Math.max(0, Math.min(...heights) - 15);
  const hi = Math.max(...heights) + 15;
  const circumference = dbhCm && dbhCm > 0 ? Math.PI * dbhCm : null;
  // One scale both ways where the trunk's size is known, so spacing reads true.
  const xPerCm = circumference ? PLOT_W / circumference : null;
  const plotH = Math.min(
    MAX_PLOT_H,
    Math.max(MIN_PLOT_H, xPerCm ? (hi - lo) * xPerCm : MIN_PLOT_H + 40),
  );
  const yPerCm = plotH / (hi - lo);
  const W = LEFT + PLOT_W + RIGHT;
  const H = TOP + plotH + BOTTOM;
  const x = (deg: number) => LEFT + ((((deg % 360) + 360) % 360) / 360) * PLOT_W;
  const y = (cm: number) => TOP + (hi - cm) * yPerCm;
  const columnW = (bitCm: number) =>
    Math.max(3, xPerCm ? (bitCm + stainMarginCm) * xPerCm : (4 / 360) * PLOT_W);
  const columnH = stainLengthCm * yPerCm;
  const holeR = (bitCm: number) => Math.max(3, xPerCm ? (bitCm / 2) * xPerCm : 3);

  const summary = trunkSummary(marks, season);
  const label = `Trunk${tag ? ` of tree ${tag}` : ''}, unrolled from north round to north: ${summary}`;
  let advisedNo = 0;

  return (
    <figure className="flex flex-col gap-3">
      <div className="min-w-0">
        <svg
          viewBox={`0 0 ${W} ${H}`}
          role="img"
          aria-label={label}
          className="h-auto w-full max-w-xl font-sans"
        >
          <rect
            x={LEFT}
            y={y(heightBand.maxCm)}
            width={PLOT_W}
            height={(heightBand.maxCm - heightBand.minCm) * yPerCm}
            className="fill-frost print:fill-none"
          />
          {points.map((p, i) => (
            <g key={i} aria-hidden="true">
              <line
                x1={LEFT + i * (PLOT_W / 8)}
                x2={LEFT + i * (PLOT_W / 8)}
                y1={TOP}
                y2={TOP + plotH}
                strokeDasharray={i % 2 === 0 ? undefined : '2 4'}
                className="stroke-rule"
              />
              <text
                x={LEFT + i * (PLOT_W / 8)}
                y={H - 8}
                textAnchor="middle"
                className={i % 2 === 0 ? 'fill-ink text-[13px] font-bold' : 'fill-bark text-[11px]'}
              >
                {p}
              </text>
            </g>
          ))}
          {heightTicks(lo, hi, system).map((cm) => (
            <text
              key={cm}
              aria-hidden="true"
              x={LEFT - 6}
              y={y(cm) + 4}
              textAnchor="end"
              className="fill-bark text-[12px]"
            >
              {tickLabel(cm, system)}
            </text>
          ))}
          <rect
            x={LEFT}
            y={TOP}
            width={PLOT_W}
            height={plotH}
            fill="none"
            className="stroke-bark/60"
          />
          {marks.map((m) => {
            const cx = x(m.azimuthDeg);
            const cy = y(m.heightCm);
            if (m.kind === 'advised') {
              advisedNo += 1;
              return (
                <g key={m.key} data-mark="advised">
                  <circle
                    cx={cx}
                    cy={cy}
                    r={9}
                    strokeWidth={3}
                    className="fill-paper stroke-sap print:stroke-ink"
                  />
                  <text
                    x={cx}
                    y={cy + 4.5}
                    textAnchor="middle"
                    aria-hidden="true"
                    className="fill-ink text-[12px] font-bold"
                  >
                    {advisedNo}
                  </text>
                </g>
              );
            }
            const w = columnW(m.bitCm);
            if (m.kind === 'this-season')
              return (
                <g key={m.key} data-mark="this-season">
                  <rect
                    x={cx - w / 2}
                    y={cy - columnH / 2}
                    width={w}
                    height={columnH}
                    className="fill-moss/30"
                  />
                  <circle
                    cx={cx}
                    cy={cy}
                    r={holeR(m.bitCm) + 2}
                    strokeWidth={1.5}
                    className="fill-moss stroke-ink"
                  />
                </g>
              );
            return (
              <g
                key={m.key}
                data-mark="earlier"
                data-season={m.season}
                data-stain-left={m.stainLeft.toFixed(2)}
              >
                {m.inReach && (
                  <rect
                    x={cx - w / 2}
                    y={cy - columnH / 2}
                    width={w}
                    height={columnH}
                    className="fill-bark print:fill-none print:stroke-bark"
                    fillOpacity={0.1 + 0.45 * m.stainLeft}
                  />
                )}
                <circle
                  cx={cx}
                  cy={cy}
                  r={holeR(m.bitCm)}
                  strokeWidth={1}
                  strokeDasharray={m.inReach ? undefined : '2 2'}
                  className={m.inReach ? 'fill-bark stroke-bark' : 'fill-none stroke-bark'}
                  fillOpacity={m.inReach ? 0.35 + 0.65 * m.stainLeft : undefined}
                />
              </g>
            );
          })}
        </svg>
        <TrunkLegend has={has} season={season} />
      </div>
      <details open={listOpen}>
        <summary className="flex min-h-11 cursor-pointer items-center text-sm font-bold md:min-h-8">
          Holes on this trunk, as a list ({marks.length})
        </summary>
        {marks.length === 0 ? (
          <p className="text-sm">No holes on record and none advised.</p>
        ) : (
          <ul aria-label="Holes on this trunk" className="mt-1 space-y-1 text-sm">
            {[...marks].reverse().map((m) => (
              <li key={m.key}>{markWords(m, system)}</li>
            ))}
          </ul>
        )}
      </details>
    </figure>
  );
}
