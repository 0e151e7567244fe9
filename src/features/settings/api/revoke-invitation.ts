import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { settingsKeys } from './settings-keys';

export const revokeInvitation = (sugarbushId: number, invitationId: number) =>
  api.delete<void>(`/sugarbushes/${sugarbushId}/invitations/${invitationId}`);

export function useRevokeInvitation(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: number) => revokeInvitation(sugarbushId, invitationId),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: settingsKeys.invitations(sugarbushId) }),
  });
}
