import { useMutation } from '@tanstack/react-query';
import {
  resetRequestSchema,
  type MailSentAnswer,
  type ResetRequestInput,
} from '@shared/schemas/auth';
import { api } from '@/lib/api-client';

export { resetRequestSchema };

/** Asks for a reset link. The answer is the same whether or not the address has an account. */
export const requestPasswordReset = (input: ResetRequestInput) =>
  api.post<MailSentAnswer>('/auth/password-reset', input);

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
