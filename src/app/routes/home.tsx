import type { QueryClient } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs } from 'react-router';
import { EmptyState } from '@/components/ui/empty-state';
import { ActionLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { sugarbushesQueryOptions } from '@/features/sugarbushes/api/get-sugarbushes';
import { requireMe } from '../loaders';
import { rememberedSugarbushId } from '../shell/current-sugarbush';

/** `/` opens the register of the sugarbush last used in this tab, else the first one. */
export const homeLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireMe(queryClient, request);
    const { items } = await queryClient.ensureQueryData(sugarbushesQueryOptions());
    const remembered = items.find((s) => s.id === rememberedSugarbushId());
    const target = remembered ?? items[0];
    if (target) throw redirect(paths.trees.href(target.id));
    return null;
  };

export function HomeRoute() {
  return (
    <>
      <title>Clearwood</title>
      <EmptyState title="You're not part of a sugarbush yet">
        <p>Start the record of your own stand, or join one someone else runs.</p>
        <ActionLink to={paths.newSugarbush.href()} className="mt-4 md:w-auto">
          Start a sugarbush
        </ActionLink>
        <p className="mt-4">
          To join a sugarbush, ask its owner to invite you. The invitation arrives by e-mail; open
          its link to join.
        </p>
      </EmptyState>
    </>
  );
}
