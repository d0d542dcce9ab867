import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';

import { isApiError } from '@/lib/api';
import { refreshSession } from '@/lib/auth-client';

function onAnyError(error: unknown) {
  // A lost session shows up first as a 401 from our API; let the auth guard react to it.
  if (isApiError(error, 401)) refreshSession();
}

/** Client-side failures (4xx) will not change on retry; server and network failures might. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    queryCache: new QueryCache({ onError: onAnyError }),
    mutationCache: new MutationCache({ onError: onAnyError }),
    defaultOptions: {
      queries: { retry: shouldRetry },
      mutations: { retry: false },
    },
  });
}
