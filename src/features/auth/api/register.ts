import { useMutation } from '@tanstack/react-query';
import { registerSchema, type MailSentAnswer, type RegisterInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';

export { registerSchema };

/** Asks for a sign-up link. The answer is the same whether or not the address has an account. */
export const register = (input: RegisterInput) => api.post<MailSentAnswer>('/auth/register', input);

export const useRegister = () => useMutation({ mutationFn: register });
