import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { authKeys } from '@/lib/auth';
import { queryRoots } from '@/lib/query-roots';
import { settingsKeys } from './settings-keys';

export const removeMember = (sugarbushId: number, userId: number) =>
  api.delete<void>(`/sugarbushes/${sugarbushId}/members/${userId}`);

export function useRemoveMember(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: number) => removeMember(sugarbushId, userId),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: settingsKeys.members(sugarbushId) }),
        queryClient.invalidateQueries({ queryKey: authKeys.all }),
        queryClient.invalidateQueries({ queryKey: queryRoots.sugarbushes }),
      ]),
  });
}
