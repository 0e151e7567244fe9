import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  registerConfirmSchema,
  type MeResponse,
  type RegisterConfirmInput,
} from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { adoptSession } from '@/lib/auth';

export { registerConfirmSchema };

/** Finishes a sign-up from the mailed link: the account is made and its owner signed in. */
export const confirmRegistration = (input: RegisterConfirmInput) =>
  api.post<MeResponse>('/auth/register/confirm', input);

export function useConfirmRegistration() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: confirmRegistration,
    onSuccess: (me) => adoptSession(queryClient, me),
  });
}
