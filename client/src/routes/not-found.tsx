import { Link, isRouteErrorResponse, useRouteError } from 'react-router';
import { paths } from '../config/paths';

export function NotFoundPage() {
  return (
    <div className="py-16 text-center">
      <h1 className="text-3xl">Nothing here</h1>
      <p className="mt-2 text-ink-soft">That address does not lead to a page of Mendery.</p>
      <Link to={paths.home()} className="mt-6 inline-block font-bold text-copper-dark underline">
        Back to the start
      </Link>
    </div>
  );
}

export function RouteError() {
  const err = useRouteError();
  const message = isRouteErrorResponse(err)
    ? `${err.status} ${err.statusText}`
    : err instanceof Error
      ? err.message
      : 'Unknown error';
  return (
    <div className="mx-auto max-w-xl p-8">
      <h1 className="text-2xl">This page failed to load</h1>
      <p className="mt-2 text-ink-soft">{message}</p>
      <a href={paths.home()} className="mt-6 inline-block font-bold text-copper-dark underline">
        Back to the start
      </a>
    </div>
  );
}
