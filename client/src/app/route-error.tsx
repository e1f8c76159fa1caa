import { Link, isRouteErrorResponse, useRouteError } from 'react-router';
import { paths } from '../config/paths';
import { ApiError } from '../lib/api';

/** What a person sees when a page's data cannot be loaded: what happened in plain words, and a way on. */
export function RouteError() {
  const err = useRouteError();
  const status = isRouteErrorResponse(err) ? err.status : err instanceof ApiError ? err.status : 0;
  const title =
    status === 404
      ? 'We could not find that'
      : status === 403
        ? 'Not for your role'
        : status === 0 && err instanceof ApiError
          ? 'No connection'
          : 'This page failed to load';
  const message =
    status === 404
      ? err instanceof ApiError
        ? err.message
        : 'That address does not lead to anything in Mendery. It may have been removed, or the link may be cut short.'
      : status === 403
        ? 'This page is for other roles. Ask an organiser of your group if you need access.'
        : err instanceof Error
          ? err.message
          : isRouteErrorResponse(err)
            ? `${err.status} ${err.statusText}`
            : 'Something went wrong. Try again in a moment.';
  return (
    <div className="mx-auto max-w-xl py-10" role="alert">
      <h1 className="text-2xl">{title}</h1>
      <p className="mt-2 text-ink-soft">{message}</p>
      <div className="mt-6 flex flex-wrap gap-4">
        <Link to={paths.events()} className="font-bold text-copper-dark underline">
          See all sessions
        </Link>
        <Link to={paths.home()} className="font-bold text-navy underline">
          Back to the start
        </Link>
      </div>
    </div>
  );
}
