import { useMutation } from '@tanstack/react-query';
import { api, resetCsrfToken } from '@/lib/api-client';
import { authKeys } from '@/lib/auth';

export const logout = () => api.post<void>('/auth/logout');

/**
 * Ends the session. The caller then loads the sign-in page afresh, so nothing cached for
 * this user stays in memory.
 */
export const useLogout = () =>
  useMutation({
    mutationKey: [...authKeys.all, 'logout'],
    mutationFn: logout,
    onSettled: () => resetCsrfToken(),
  });
