import { Fragment, type ReactNode } from 'react';
import { cn } from './cn';

export type SortDirection = 'asc' | 'desc';

export interface Column<Row> {
  key: string;
  header: ReactNode;
  cell: (row: Row) => ReactNode;
  /** When set, the header becomes a sort button for this field. */
  sortField?: string;
  align?: 'left' | 'right';
  className?: string;
}

export interface TableSort {
  field: string;
  direction: SortDirection;
}

interface DataTableProps<Row> {
  /** The table's accessible name. */
  label: string;
  columns: Column<Row>[];
  rows: Row[];
  rowKey: (row: Row) => string | number;
  sort?: TableSort;
  onSort?: (field: string) => void;
  rowClassName?: (row: Row) => string | undefined;
  /** Dims the rows while a newer page loads. */
  stale?: boolean;
  /** Something to read before a row (a hazard at the tree), as a full-width row above it. */
  rowLead?: (row: Row) => ReactNode;
}

const ariaSort = (column: { sortField?: string }, sort?: TableSort) => {
  if (!column.sortField) return undefined;
  if (sort?.field !== column.sortField) return 'none' as const;
  return sort.direction === 'asc' ? ('ascending' as const) : ('descending' as const);
};

export function DataTable<Row>({
  label,
  columns,
  rows,
  rowKey,
  sort,
  onSort,
  rowClassName,
  stale = false,
  rowLead,
}: DataTableProps<Row>) {
  return (
    <div className="overflow-x-auto">
      <table
        aria-label={label}
        aria-busy={stale || undefined}
        className={cn('w-full border-collapse text-left tabular-nums', stale && 'opacity-60')}
      >
        <thead>
          <tr className="border-b-2 border-ink/70">
            {columns.map((column) => {
              const active = column.sortField !== undefined && sort?.field === column.sortField;
              return (
                <th
                  key={column.key}
                  scope="col"
                  aria-sort={ariaSort(column, sort)}
                  className={cn(
                    'whitespace-nowrap px-3 py-2 text-sm font-bold',
                    column.align === 'right' && 'text-right',
                    column.className,
                  )}
                >
                  {column.sortField && onSort ? (
                    <button
                      type="button"
                      onClick={() => onSort(column.sortField as string)}
                      className={cn(
                        'inline-flex min-h-11 items-center gap-1 rounded hover:underline md:min-h-0',
                        column.align === 'right' && 'flex-row-reverse',
                      )}
                    >
                      {column.header}
                      <span aria-hidden="true" className={cn('text-bark', !active && 'opacity-40')}>
                        {active && sort?.direction === 'desc' ? '▼' : '▲'}
                      </span>
                    </button>
                  ) : (
                    column.header
                  )}
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => {
            const lead = rowLead?.(row);
            return (
              <Fragment key={rowKey(row)}>
                {lead && (
                  <tr className={cn('print:break-inside-avoid', rowClassName?.(row))}>
                    <td colSpan={columns.length} className="px-3 pt-2">
                      {lead}
                    </td>
                  </tr>
                )}
                <tr className={cn('border-b border-rule', rowClassName?.(row))}>
                  {columns.map((column) => (
                    <td
                      key={column.key}
                      className={cn(
                        'px-3 py-2 align-top',
                        column.align === 'right' && 'whitespace-nowrap text-right',
                        column.className,
                      )}
                    >
                      {column.cell(row)}
                    </td>
                  ))}
                </tr>
              </Fragment>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
