import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  acceptInvitationSchema,
  type AcceptInvitationAnswer,
  type AcceptInvitationInput,
} from '@shared/schemas/invitation';
import { api, isApiError } from '@/lib/api-client';
import { adoptSession } from '@/lib/auth';
import { invitationKeys } from './invitation-keys';

export { acceptInvitationSchema };

/**
 * Joins the invitation's stand: signed in as the invited address with an empty body, or with
 * `{ name, password }` to make that account first (which signs its owner in).
 */
export const acceptInvitation = (token: string, input: AcceptInvitationInput) =>
  api.post<AcceptInvitationAnswer>(`/invitations/${encodeURIComponent(token)}/accept`, input);

/** Answers that mean the link itself has changed (used, withdrawn, for another account). */
const linkChanged = new Set([403, 404, 409, 410]);

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: AcceptInvitationInput) => acceptInvitation(token, input),
    // The membership is new and the session may be: nothing cached before holds. The preview
    // stays while the page moves on to the stand.
    onSuccess: (answer) => adoptSession(queryClient, answer.me, [invitationKeys.all[0]]),
    onError: (error) => {
      if (isApiError(error) && linkChanged.has(error.status))
        void queryClient.invalidateQueries({ queryKey: invitationKeys.all });
    },
  });
}
