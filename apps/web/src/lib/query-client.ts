// Builds the one TanStack Query client. Its caches are where "401 anywhere → sign in again" is
// decided, so no screen has to remember it; the reaction itself (clearing data, navigating) is
// passed in by the app layer, which owns the router.
import { MutationCache, notifyManager, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError, isUnauthenticated } from './api-client';

interface HeatpathMeta extends Record<string, unknown> {
  /** Set on requests where 401 is an ordinary answer (a wrong password), not an expired session. */
  expectsUnauthenticated?: boolean;
}

declare module '@tanstack/react-query' {
  interface Register {
    queryMeta: HeatpathMeta;
    mutationMeta: HeatpathMeta;
  }
}

// Cache changes reach the screens in the same task as the tap that caused them (a microtask,
// still batched), not on a later timer: a controlled choice such as °C/°F shows the new value
// at once instead of flicking back until the timer fires.
notifyManager.setScheduler(queueMicrotask);

export interface QueryClientOptions {
  onUnauthenticated?: () => void;
}

// A 4xx will not change on retry, and a person waiting at the car should see the message at once.
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient(options: QueryClientOptions = {}): QueryClient {
  const handle = (error: unknown, meta: HeatpathMeta | undefined) => {
    if (isUnauthenticated(error) && !meta?.expectsUnauthenticated) options.onUnauthenticated?.();
  };
  return new QueryClient({
    queryCache: new QueryCache({ onError: (error, query) => handle(error, query.meta) }),
    mutationCache: new MutationCache({
      onError: (error, _vars, _ctx, mutation) => handle(error, mutation.meta),
    }),
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 30_000 },
      mutations: { retry: false },
    },
  });
}
