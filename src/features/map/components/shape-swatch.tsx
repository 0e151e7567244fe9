import { colors } from '@/lib/theme';
import { shapePath } from '../lib/shape-path';
import type { VerdictStyle } from '../lib/verdict-style';

/** The map marker of a verdict, drawn the same way as on the canvas, for the legend. */
export function ShapeSwatch({ style }: { style: VerdictStyle }) {
  return (
    <svg
      viewBox="0 0 20 20"
      className="size-5 shrink-0"
      aria-hidden="true"
      data-shape={style.shape}
    >
      <path
        d={shapePath(style.shape, 10, 10, 6)}
        fill={style.solid ? style.color : colors.paper}
        stroke={style.solid ? colors.ink : style.color}
        strokeWidth={style.solid ? 1 : 2.5}
      />
    </svg>
  );
}
