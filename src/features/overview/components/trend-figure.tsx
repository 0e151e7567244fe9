import { useId, type ReactNode } from 'react';
import { Link } from 'react-router';
import type { TrendSeason } from '@shared/schemas/trends';
import { seasonLabel } from '../lib/trend-words';

/**
 * One trend: its title, the chart named by the one sentence that reads it (also its caption),
 * and the same figures as a table, each linking to the trees behind it.
 */
export function TrendFigure({
  title,
  sentence,
  chart,
  table,
}: {
  title: string;
  sentence: string;
  chart: ReactNode;
  table: ReactNode;
}) {
  const id = useId();
  return (
    <section
      aria-labelledby={id}
      className="min-w-0 rounded border border-rule px-3 py-3 print:break-inside-avoid"
    >
      <h3 id={id} className="font-bold">
        {title}
      </h3>
      <figure className="mt-2">
        <div role="img" aria-label={sentence} className="h-56 w-full">
          {chart}
        </div>
        <figcaption className="mt-2 text-sm">{sentence}.</figcaption>
      </figure>
      <details className="mt-2 text-sm">
        <summary className="inline-flex min-h-11 cursor-pointer items-center underline underline-offset-4 md:min-h-0 print:hidden">
          The figures as a table
        </summary>
        {table}
      </details>
    </section>
  );
}

export interface TrendColumn {
  key: string;
  header: string;
  cell: (item: TrendSeason) => ReactNode;
}

/** The trend's figures, a season a row; the chart's text alternative. */
export function TrendTable({
  label,
  items,
  columns,
}: {
  label: string;
  items: readonly TrendSeason[];
  columns: readonly TrendColumn[];
}) {
  return (
    <div className="mt-2 overflow-x-auto">
      <table aria-label={label} className="w-full border-collapse text-left tabular-nums">
        <thead>
          <tr className="border-b-2 border-ink/70">
            <th scope="col" className="whitespace-nowrap px-2 py-1">
              Season
            </th>
            {columns.map((c) => (
              <th key={c.key} scope="col" className="px-2 py-1 text-right">
                {c.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {items.map((item) => (
            <tr key={item.season} className="border-b border-rule">
              <th scope="row" className="whitespace-nowrap px-2 py-1 font-normal">
                {seasonLabel(item)}
              </th>
              {columns.map((c) => (
                <td key={c.key} className="whitespace-nowrap px-2 py-1 text-right">
                  {c.cell(item)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** A figure in a trend table, leading to the plan or tree list it counts. */
export function FigureLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <Link to={to} className="underline decoration-rule underline-offset-4 hover:decoration-ink">
      {children}
    </Link>
  );
}
