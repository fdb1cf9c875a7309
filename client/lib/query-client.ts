import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError, isUnauthenticated } from './api-error';

export type QueryClientDeps = {
  /** Called when any query or mutation learns the session is gone (401), so the app can send the user to sign in. */
  onUnauthenticated: (queryKey: readonly unknown[]) => void;
};

/** Don't retry what a retry can't fix: 4xx answers and answers of the wrong shape. */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && ((error.status >= 400 && error.status < 500) || error.code === 'bad_response')) return false;
  return failureCount < 2;
}

export function createQueryClient({ onUnauthenticated }: QueryClientDeps): QueryClient {
  return new QueryClient({
    queryCache: new QueryCache({
      onError: (error, query) => {
        if (isUnauthenticated(error)) onUnauthenticated(query.queryKey);
      },
    }),
    mutationCache: new MutationCache({
      onError: (error, _variables, _context, mutation) => {
        if (isUnauthenticated(error)) onUnauthenticated(mutation.options.mutationKey ?? []);
      },
    }),
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 30_000, refetchOnWindowFocus: true },
      mutations: { retry: false },
    },
  });
}
