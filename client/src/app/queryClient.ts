import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { authKeys } from '../features/auth/api';
import { ApiRequestError } from '../shared/lib/apiFetch';

/*
 * A 401 from any request other than the session check means the session ended (expired,
 * or signed out in another tab). Re-checking the session lets the guard send the person
 * to sign in, and bring them back to the page they were on.
 */
function onUnauthenticated(error: unknown, queryKey?: readonly unknown[]) {
  if (!(error instanceof ApiRequestError) || error.status !== 401) return;
  if (queryKey && queryKey.join('/') === authKeys.me().join('/')) return;
  void queryClient.invalidateQueries({ queryKey: authKeys.me() });
}

export const queryClient = new QueryClient({
  queryCache: new QueryCache({ onError: (error, query) => onUnauthenticated(error, query.queryKey) }),
  mutationCache: new MutationCache({ onError: (error) => onUnauthenticated(error) }),
  defaultOptions: {
    queries: {
      // A 4xx answer will not change on retry; network failures and 5xx get two more tries.
      retry: (failureCount, error) => {
        if (error instanceof ApiRequestError && error.status >= 400 && error.status < 500) return false;
        return failureCount < 2;
      },
    },
    mutations: { retry: false },
  },
});
