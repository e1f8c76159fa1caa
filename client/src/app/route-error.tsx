import { Link, isRouteErrorResponse, useRouteError } from 'react-router';
import { paths } from '../config/paths';
import { ApiError } from '../lib/api';
import { tr, useT } from '../lib/i18n';

/** What a person sees when a page's data cannot be loaded: what happened in plain words, and a way on. */
export function RouteError() {
  const t = useT();
  const err = useRouteError();
  const status = isRouteErrorResponse(err) ? err.status : err instanceof ApiError ? err.status : 0;
  const title =
    status === 404
      ? t('errors.route.notFound')
      : status === 403
        ? t('errors.route.forbidden')
        : status === 0 && err instanceof ApiError
          ? t('errors.route.offline')
          : t('errors.route.failed');
  const message =
    status === 404
      ? err instanceof ApiError
        ? tr(err.message)
        : t('errors.route.notFoundBody')
      : status === 403
        ? t('errors.route.forbiddenBody')
        : err instanceof Error
          ? tr(err.message)
          : isRouteErrorResponse(err)
            ? `${err.status} ${err.statusText}`
            : t('errors.route.failedBody');
  return (
    <div className="mx-auto max-w-xl py-10" role="alert">
      <h1 className="text-2xl">{title}</h1>
      <p className="mt-2 text-ink-soft">{message}</p>
      <div className="mt-6 flex flex-wrap gap-4">
        <Link to={paths.events()} className="font-bold text-copper-dark underline">
          {t('errors.route.allSessions')}
        </Link>
        <Link to={paths.home()} className="font-bold text-navy underline">
          {t('common.notFound.back')}
        </Link>
      </div>
    </div>
  );
}
