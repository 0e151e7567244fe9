import { QueryCache, QueryClient, MutationCache } from '@tanstack/react-query';
import { isApiError } from './api-client';
import { authKeys } from './auth';
import { registerFieldEntryDefaults } from './field-entries';

const MAX_RETRIES = 2;

/** Retry only what might succeed next time: network failures and server errors. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < MAX_RETRIES;
}

export function createQueryClient(): QueryClient {
  // When any request says the session is gone, re-ask who is signed in; the app layout
  // then sends the user to sign-in, with the page to come back to.
  const onError = (error: unknown, key?: readonly unknown[]) => {
    if (!isApiError(error) || error.status !== 401 || error.code === 'invalid-credentials') return;
    if (key && key[0] === authKeys.all[0]) return;
    void queryClient.invalidateQueries({ queryKey: authKeys.me() });
  };
  const queryClient: QueryClient = new QueryClient({
    queryCache: new QueryCache({ onError: (error, query) => onError(error, query.queryKey) }),
    mutationCache: new MutationCache({ onError: (error) => onError(error) }),
    defaultOptions: {
      queries: { staleTime: 30_000, retry: shouldRetry, refetchOnWindowFocus: false },
      mutations: { retry: false },
    },
  });
  registerFieldEntryDefaults(queryClient);
  return queryClient;
}
