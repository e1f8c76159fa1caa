import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router';
import type { SessionUser } from '../../../../shared/schemas/auth';
import { paths } from '../../config/paths';
import { useUser } from '../../features/auth/api/get-me';
import { Alert, Spinner } from '../ui/feedback';

/** Hides pages a role cannot use. The server checks every request anyway; this only spares a useless screen. */
export function RequireRole({ allow, children }: { allow: (user: SessionUser) => boolean; children: ReactNode }) {
  const { data: user, isPending, error } = useUser();
  const location = useLocation();
  if (isPending) return <Spinner />;
  if (error)
    return (
      <Alert tone="error" title="Could not check who you are">
        {error.message}
      </Alert>
    );
  if (!user) return <Navigate to={paths.signIn(location.pathname + location.search)} replace />;
  if (!allow(user))
    return (
      <Alert tone="error" title="Not for your role">
        This page is for other roles. Ask an organiser of your group if you need access.
      </Alert>
    );
  return <>{children}</>;
}
