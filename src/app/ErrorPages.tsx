import { isRouteErrorResponse, Link, useRouteError } from 'react-router';
import { Button, errorText } from '../components/ui';

function ProblemPage({ title, message }: { title: string; message: string }) {
  return (
    <div className="mx-auto flex max-w-lg flex-col items-start gap-3 py-16">
      <h1 className="text-2xl font-semibold text-sand-900">{title}</h1>
      <p role="alert" className="text-base text-sand-700">
        {message}
      </p>
      <div className="flex gap-2">
        <Link
          to="/"
          className="inline-flex h-10 items-center rounded bg-timber-600 px-4 font-medium text-white hover:bg-timber-700 focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-focus"
        >
          Go to your start page
        </Link>
        <Button variant="secondary" onClick={() => window.location.reload()}>
          Reload
        </Button>
      </div>
    </div>
  );
}

/** 404: the address matches no page. */
export function NotFoundPage() {
  return (
    <ProblemPage
      title="Page not found"
      message="There is no page at this address. It may have moved, or the link may be mistyped."
    />
  );
}

/** Route error boundary: a readable message for thrown responses and errors, never a blank page. */
export function ErrorPage() {
  const error = useRouteError();
  if (isRouteErrorResponse(error)) {
    if (error.status === 404) return <NotFoundPage />;
    if (error.status === 403) {
      return (
        <ProblemPage
          title="Not available for your role"
          message={
            typeof error.data === 'string' ? error.data : 'This section is not part of your role.'
          }
        />
      );
    }
    return (
      <ProblemPage title="Something went wrong" message={`${error.status} ${error.statusText}`} />
    );
  }
  return <ProblemPage title="Something went wrong" message={errorText(error)} />;
}
