import { useMutation, useQueryClient } from '@tanstack/react-query';
import { loginSchema, type LoginInput, type MeResponse } from '@shared/schemas/auth';
import { api, resetCsrfToken } from '@/lib/api-client';
import { authKeys } from '@/lib/auth';

export { loginSchema };

export const login = (input: LoginInput) => api.post<MeResponse>('/auth/login', input);

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (me) => {
      // Signing in starts a new session: its CSRF token and everything cached belong to the old one.
      resetCsrfToken();
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
