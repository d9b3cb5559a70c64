import type { ReactNode } from 'react';
import { ErrorMessage } from './Alert';
import { Spinner } from './Spinner';

/** Props of {@link QueryState}: the few fields of a TanStack Query result it needs. */
export interface QueryStateProps<T> {
  query: { data: T | undefined; error: unknown; isPending: boolean; refetch: () => unknown };
  /** What failed, for the error title ("Could not load jobs"). */
  what: string;
  children: (data: T) => ReactNode;
}

/** Renders a spinner while loading, a readable error with retry on failure, else the data. */
export function QueryState<T>({ query, what, children }: QueryStateProps<T>) {
  if (query.isPending) return <Spinner className="p-4" label={`Loading ${what}…`} />;
  if (query.error || query.data === undefined) {
    return (
      <ErrorMessage
        className="m-4"
        title={`Could not load ${what}`}
        error={query.error}
        onRetry={() => void query.refetch()}
      />
    );
  }
  return <>{children(query.data)}</>;
}
