import { QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from '../lib/api-client';
import { authKeys } from '../lib/query-keys';

/** Where a session that expired mid-use is sent: the sign-in page, remembering the current path. */
export function signInPathFor(location: { pathname: string; search: string }): string {
  const from = `${location.pathname}${location.search}`;
  return from === '/' || from.startsWith('/sign-in')
    ? '/sign-in'
    : `/sign-in?from=${encodeURIComponent(from)}`;
}

/**
 * The app's query client. A 401 on any data query means the session ended (timeout, signed out
 * in another tab): go to sign-in rather than show an error. The `me` query is excluded because
 * the route guard and the sign-in page handle its 401 themselves.
 */
export function createQueryClient(): QueryClient {
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      onError: (error, query) => {
        if (!isApiError(error) || error.status !== 401) return;
        if (query.queryKey[0] === authKeys.all[0]) return;
        client.clear();
        window.location.assign(signInPathFor(window.location));
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        // Client errors (4xx) will not fix themselves; network and server faults get one retry
        // a second later, so a failure shows as a message quickly rather than a long spinner.
        retry: (count, error) =>
          !(isApiError(error) && error.status >= 400 && error.status < 500) && count < 1,
        retryDelay: 1000,
        refetchOnWindowFocus: false,
      },
    },
  });
  return client;
}

/** The single client of the running app. */
export const queryClient = createQueryClient();
