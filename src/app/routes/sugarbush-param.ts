import { useSugarbush } from '@/lib/get-sugarbush';
import { useIdParam } from '@/lib/id-param';

/** The sugarbush a page is about, from its `:id`; `sugarbushId` is undefined when that is not an id. */
export function useSugarbushIdParam() {
  const sugarbushId = useIdParam('id');
  const sugarbush = useSugarbush(sugarbushId);
  return { sugarbushId, sugarbush, name: sugarbush.data?.name };
}

/** The browser tab's title for one of a sugarbush's pages: "Map · North slope · Clearwood". */
export const sugarbushTitle = (page: string, name: string | undefined) =>
  name ? `${page} · ${name} · Clearwood` : `${page} · Clearwood`;
