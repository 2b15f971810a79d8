import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { paths } from '@/config/paths';

export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'Unknown error';
  return (
    <div role="alert" className="mx-auto max-w-xl py-16 text-center">
      <h1 className="font-serif text-3xl">Something went wrong on this page</h1>
      <p className="mt-2 text-muted">Your work saved before this is safe. Reload the page, or go back to Today.</p>
      <p className="num mt-4 text-sm text-error">{message}</p>
      <Link to={paths.home} className="mt-6 inline-block">
        Back to Today
      </Link>
    </div>
  );
}
