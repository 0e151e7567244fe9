import { useMutation, useQueryClient } from '@tanstack/react-query';
import { type Invitation, type InvitationInput } from '@shared/schemas/invitation';
import { api } from '@/lib/api-client';
import { settingsKeys } from './settings-keys';

export { invitationInputSchema } from '@shared/schemas/invitation';

/** A pending invitation for the same address is replaced by this one. */
export const createInvitation = (sugarbushId: number, input: InvitationInput) =>
  api.post<Invitation>(`/sugarbushes/${sugarbushId}/invitations`, input);

export function useCreateInvitation(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InvitationInput) => createInvitation(sugarbushId, input),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: settingsKeys.invitations(sugarbushId) }),
  });
}
