import { useId } from 'react';
import type { Spot } from '@shared/rules/index';
import type { Taphole } from '@shared/schemas/taphole';
import { compassWord, formatHeight, spotWords } from '@/lib/advice-words';
import { cmToIn, type UnitSystem } from '@/lib/units';

interface Props {
  placements: readonly Spot[];
  /** Earlier holes a new hole can still reach. */
  priorHoles: readonly Pick<Taphole, 'season' | 'azimuthDeg' | 'heightCm'>[];
  /** The taphole record failed to load: say so rather than draw a clean trunk. */
  priorHolesUnknown?: boolean;
  heightBand: { minCm: number; maxCm: number };
  /** Stain runs this far above and below a hole. */
  stainLengthCm: number;
  system: UnitSystem;
}

const W = 400;
const H = 190;
const LEFT = 48;
const RIGHT = 10;
const TOP = 10;
const BOTTOM = 26;
const plotW = W - LEFT - RIGHT;
const plotH = H - TOP - BOTTOM;
const compassTicks = [
  [0, 'N'],
  [90, 'E'],
  [180, 'S'],
  [270, 'W'],
  [360, 'N'],
] as const;

/** Height marks every foot, or every half metre. */
function heightTicks(lo: number, hi: number, system: UnitSystem): number[] {
  const step = system === 'imperial' ? 12 * 2.54 : 50;
  const ticks: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi; v += step) ticks.push(v);
  return ticks;
}

const holeWords = (h: Pick<Taphole, 'season' | 'azimuthDeg' | 'heightCm'>, system: UnitSystem) =>
  `${compassWord(h.azimuthDeg)} at ${formatHeight(h.heightCm, system)} (${h.season})`;

/**
 * The trunk unrolled: bearing round the tree left to right, height up. Grey marks are earlier
 * holes still in reach with their stain column; numbered marks are the holes to drill.
 */
export function TrunkDiagram({
  placements,
  priorHoles,
  priorHolesUnknown = false,
  heightBand,
  stainLengthCm,
  system,
}: Props) {
  const id = useId();
  const heights = [
    heightBand.minCm,
    heightBand.maxCm,
    ...priorHoles.map((h) => h.heightCm),
    ...placements.map((p) => p.heightCm),
  ];
  const lo = Math.max(0, Math.min(...heights) - 20);
  const hi = Math.max(...heights) + 20;
  const x = (deg: number) => LEFT + ((((deg % 360) + 360) % 360) / 360) * plotW;
  const y = (cm: number) => TOP + ((hi - cm) / (hi - lo)) * plotH;
  const stainHalf = ((stainLengthCm / 2) * plotH) / (hi - lo);

  const description = [
    priorHolesUnknown
      ? 'Earlier holes could not be loaded.'
      : priorHoles.length === 0
        ? 'No earlier holes in reach.'
        : `Earlier holes still in reach: ${priorHoles.map((h) => holeWords(h, system)).join('; ')}.`,
    placements.length === 0
      ? 'No new holes advised.'
      : `New holes: ${placements.map((p, i) => `${i + 1}, ${spotWords(p, system)}`).join('; ')}.`,
  ].join(' ');

  return (
    <figure>
      <svg
        viewBox={`0 0 ${W} ${H}`}
        role="img"
        aria-labelledby={`${id}-title ${id}-desc`}
        className="h-auto w-full max-w-xl font-sans"
      >
        <title id={`${id}-title`}>Trunk diagram</title>
        <desc id={`${id}-desc`}>{description}</desc>
        <rect
          x={LEFT}
          y={y(heightBand.maxCm)}
          width={plotW}
          height={y(heightBand.minCm) - y(heightBand.maxCm)}
          className="fill-frost print:fill-none"
        />
        {compassTicks.map(([deg, label]) => (
          <g key={deg}>
            <line
              x1={LEFT + (deg / 360) * plotW}
              x2={LEFT + (deg / 360) * plotW}
              y1={TOP}
              y2={TOP + plotH}
              strokeDasharray="3 3"
              className="stroke-rule"
            />
            <text
              x={LEFT + (deg / 360) * plotW}
              y={H - 8}
              textAnchor="middle"
              className="fill-ink text-[13px] font-bold"
            >
              {label}
            </text>
          </g>
        ))}
        {heightTicks(lo, hi, system).map((cm) => (
          <text
            key={cm}
            x={LEFT - 6}
            y={y(cm) + 4}
            textAnchor="end"
            className="fill-bark text-[12px]"
          >
            {system === 'imperial' ? `${Math.round(cmToIn(cm) / 12)} ft` : formatHeight(cm, system)}
          </text>
        ))}
        <rect
          x={LEFT}
          y={TOP}
          width={plotW}
          height={plotH}
          fill="none"
          className="stroke-bark/60"
        />
        {priorHoles.map((h, i) => (
          <g key={`hole-${i}`}>
            <rect
              x={x(h.azimuthDeg) - 2}
              y={y(h.heightCm) - stainHalf}
              width={4}
              height={stainHalf * 2}
              className="fill-bark/25 print:fill-none print:stroke-bark"
            />
            <circle
              cx={x(h.azimuthDeg)}
              cy={y(h.heightCm)}
              r={4}
              className="fill-bark/70 print:fill-none print:stroke-ink"
            />
          </g>
        ))}
        {placements.map((p, i) => (
          <g key={`new-${i}`}>
            <circle
              cx={x(p.azimuthDeg)}
              cy={y(p.heightCm)}
              r={10}
              className="fill-sap stroke-ink print:fill-paper"
              strokeWidth={1.5}
            />
            <text
              x={x(p.azimuthDeg)}
              y={y(p.heightCm) + 4.5}
              textAnchor="middle"
              className="fill-ink text-[13px] font-bold"
            >
              {i + 1}
            </text>
          </g>
        ))}
      </svg>
      <figcaption className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-sm text-bark">
        {placements.length > 0 && (
          <span className="inline-flex items-center gap-1">
            <span aria-hidden="true" className="inline-block size-3 rounded-full bg-sap" />
            Holes to drill, numbered
          </span>
        )}
        {priorHoles.length > 0 && (
          <span className="inline-flex items-center gap-1">
            <span aria-hidden="true" className="inline-block size-2 rounded-full bg-bark/70" />
            Earlier holes in reach, with their stain
          </span>
        )}
        <span className="inline-flex items-center gap-1">
          <span aria-hidden="true" className="inline-block h-3 w-4 bg-frost ring-1 ring-rule" />
          Height band
        </span>
      </figcaption>
    </figure>
  );
}
