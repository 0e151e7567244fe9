import { useMutation, useQueryClient } from '@tanstack/react-query';
import { loginSchema, type LoginInput, type MeResponse } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { adoptSession } from '@/lib/auth';

export { loginSchema };

export const login = (input: LoginInput) => api.post<MeResponse>('/auth/login', input);

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (me) => adoptSession(queryClient, me),
  });
}
