import type { ReactNode } from 'react';
import { Link, useNavigate } from 'react-router';
import { isApiError } from '../../lib/api-client';
import { Alert, ErrorMessage, errorText } from './Alert';
import { Spinner } from './Spinner';

/** Props of {@link QueryState}: the few fields of a TanStack Query result it needs. */
export interface QueryStateProps<T> {
  query: { data: T | undefined; error: unknown; isPending: boolean; refetch: () => unknown };
  /** What failed, for the error title ("Could not load jobs"). */
  what: string;
  children: (data: T) => ReactNode;
}

/** A record that is not there (or not yours): trying again will not help; offer a way back. */
function GoneMessage({ what, error }: { what: string; error: unknown }) {
  const navigate = useNavigate();
  return (
    <Alert tone="warning" title={`Could not open ${what}`} className="m-4">
      <p>{errorText(error)} It may have been deleted, or the link may be wrong.</p>
      <p className="mt-2 flex flex-wrap gap-4">
        <button
          type="button"
          onClick={() => void navigate(-1)}
          className="font-medium underline underline-offset-2 focus-visible:outline-2 focus-visible:outline-focus"
        >
          Go back
        </button>
        <Link
          to="/"
          className="font-medium underline underline-offset-2 focus-visible:outline-2 focus-visible:outline-focus"
        >
          Go to your start page
        </Link>
      </p>
    </Alert>
  );
}

/**
 * Renders a spinner while loading, the data when it arrives, a way back when the record is not
 * there (404) or not for this role (403), and a readable error with retry for anything else.
 */
export function QueryState<T>({ query, what, children }: QueryStateProps<T>) {
  if (query.isPending) return <Spinner className="p-4" label={`Loading ${what}…`} />;
  if (isApiError(query.error) && (query.error.status === 404 || query.error.status === 403))
    return <GoneMessage what={what} error={query.error} />;
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
