import { useMutation } from '@tanstack/react-query';
import { resetConfirmSchema, resetFormSchema, type ResetConfirmInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';

export { resetConfirmSchema, resetFormSchema };

/** Sets a new password with the mailed link's token; the person then signs in with it. */
export const confirmPasswordReset = (input: ResetConfirmInput) =>
  api.post<{ ok: true }>('/auth/password-reset/confirm', input);

export const useConfirmPasswordReset = () => useMutation({ mutationFn: confirmPasswordReset });
