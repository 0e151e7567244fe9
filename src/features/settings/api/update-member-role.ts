import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Member, MemberPatch } from '@shared/schemas/members';
import { api } from '@/lib/api-client';
import { authKeys } from '@/lib/auth';
import { queryRoots } from '@/lib/query-roots';
import { settingsKeys } from './settings-keys';

export { memberPatchSchema } from '@shared/schemas/members';

export const updateMemberRole = (sugarbushId: number, userId: number, patch: MemberPatch) =>
  api.patch<Member>(`/sugarbushes/${sugarbushId}/members/${userId}`, patch);

export function useUpdateMemberRole(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: number } & MemberPatch) =>
      updateMemberRole(sugarbushId, userId, { role }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: settingsKeys.members(sugarbushId) }),
        // The change may be the user's own role: what they may do here, and the rail, follow it.
        queryClient.invalidateQueries({ queryKey: authKeys.all }),
        queryClient.invalidateQueries({ queryKey: queryRoots.sugarbushes }),
      ]),
  });
}
