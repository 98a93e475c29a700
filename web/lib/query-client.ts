import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-error';

/**
 * One QueryClient for the app. `onUnauthenticated` runs when any query learns the session has
 * gone (401), so the shell can send the person to sign in and bring them back afterwards.
 */
export function createQueryClient(onUnauthenticated?: () => void): QueryClient {
  const onError = (err: unknown) => {
    if (isApiError(err) && err.status === 401) onUnauthenticated?.();
  };
  return new QueryClient({
    queryCache: new QueryCache({ onError }),
    mutationCache: new MutationCache({ onError }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        // Retrying a refusal or a missing record only delays the message the person needs.
        retry: (count, err) => (isApiError(err) && err.status >= 400 && err.status < 500 ? false : count < 2),
      },
      mutations: { retry: false },
    },
  });
}
