import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Invitation } from '@shared/schemas/invitation';
import { api } from '@/lib/api-client';
import { settingsKeys } from './settings-keys';

/** Mails a fresh link and a fresh expiry; the old link stops working. */
export const resendInvitation = (sugarbushId: number, invitationId: number) =>
  api.post<Invitation>(`/sugarbushes/${sugarbushId}/invitations/${invitationId}/resend`);

export function useResendInvitation(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: number) => resendInvitation(sugarbushId, invitationId),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: settingsKeys.invitations(sugarbushId) }),
  });
}
