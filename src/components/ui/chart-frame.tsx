import type { ReactNode } from 'react';
import { CartesianGrid, LineChart, ResponsiveContainer } from 'recharts';
import { colors } from '@/lib/theme';
import { cn } from './cn';

interface Margin {
  top: number;
  right: number;
  bottom: number;
  left: number;
}

const DEFAULT_MARGIN: Margin = { top: 8, right: 12, bottom: 0, left: 0 };

/**
 * A line chart with horizontal grid lines, named for screen readers by its one-sentence
 * `summary`, which also stands as the caption. `children` are the axes, tooltip and lines.
 */
export function LineChartFrame<Point>({
  summary,
  data,
  margin = DEFAULT_MARGIN,
  height,
  className,
  children,
}: {
  summary: string;
  data: Point[];
  margin?: Margin;
  /** A Tailwind height class for the plot, e.g. `h-48`. */
  height: string;
  className?: string;
  children: ReactNode;
}) {
  return (
    <figure className={className}>
      <div role="img" aria-label={summary} className={cn(height, 'w-full')}>
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={margin}>
            <CartesianGrid stroke={colors.rule} vertical={false} />
            {children}
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="mt-1 text-sm text-bark">{summary}.</figcaption>
    </figure>
  );
}

/** The look of every chart axis: a bark line with ink labels. */
export const axisProps = (fontSize: number) => ({
  stroke: colors.bark,
  tick: { fill: colors.ink, fontSize },
});

/** The tooltip box in the page's own paper and rule colours. */
export const tooltipStyle = {
  background: colors.paper,
  borderColor: colors.rule,
  color: colors.ink,
};

/** A smooth line drawn at once: the charts are read, not watched. */
export const lineProps = { type: 'monotone', strokeWidth: 2, isAnimationActive: false } as const;
