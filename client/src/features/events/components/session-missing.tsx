import { Link } from 'react-router';
import { Alert } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';

/** What a session's page says when the session cannot be shown, with the way back to the list. */
export function SessionMissing({ error }: { error: Error & { status?: number } }) {
  return (
    <Alert tone="error" title={error.status === 404 ? 'Session not found' : 'The session could not be loaded'}>
      <p>
        {error.status === 404
          ? 'There is no session at this address. It may have been removed, or the link may be incomplete.'
          : error.message}
      </p>
      <p className="mt-2">
        <Link to={paths.events()} className="font-bold underline">
          See all sessions
        </Link>
      </p>
    </Alert>
  );
}
