import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeResponse } from '@shared/schemas/auth';
import {
  sugarbushInputSchema,
  type Sugarbush,
  type SugarbushInput,
} from '@shared/schemas/sugarbush';
import { api } from '@/lib/api-client';
import { authKeys } from '@/lib/auth';
import { sugarbushKeys } from './sugarbush-keys';

export { sugarbushInputSchema };

/** Starts a stand; whoever starts it is its owner. */
export const createSugarbush = (input: SugarbushInput) =>
  api.post<Sugarbush>('/sugarbushes', input);

export function useCreateSugarbush() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSugarbush,
    onSuccess: (created) => {
      queryClient.setQueryData(sugarbushKeys.detail(created.id), created);
      // The new membership counts at once (the shell reads it for the role); the server's
      // own answer follows.
      queryClient.setQueryData<MeResponse | null>(authKeys.me(), (me) =>
        me && !me.memberships.some((m) => m.sugarbushId === created.id)
          ? {
              ...me,
              memberships: [...me.memberships, { sugarbushId: created.id, role: created.role }],
            }
          : me,
      );
      void queryClient.invalidateQueries({ queryKey: sugarbushKeys.lists() });
      void queryClient.invalidateQueries({ queryKey: authKeys.me() });
    },
  });
}
