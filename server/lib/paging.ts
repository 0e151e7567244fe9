import type { ListQuery, Page } from '../../shared/schemas/list-query';

/** Run a paged fetch for a list query and wrap it as `{ items, total, page, pageSize }`. */
export async function pageOf<T>(
  q: Pick<ListQuery, 'page' | 'pageSize'>,
  fetch: (range: { offset: number; limit: number }) => Promise<{ items: T[]; total: number }>,
): Promise<Page<T>> {
  const { items, total } = await fetch({ offset: (q.page - 1) * q.pageSize, limit: q.pageSize });
  return { items, total, page: q.page, pageSize: q.pageSize };
}

export const insertedId = (row: unknown): number =>
  typeof row === 'object' && row !== null ? (row as { id: number }).id : (row as number);
