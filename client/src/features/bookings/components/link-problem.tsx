import { Link } from 'react-router';
import { Alert, Card } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import { FreshLinkForm } from './fresh-link-form';

/**
 * What the booking page says when its link cannot open the booking: run out, or not (or no longer) right; either way
 * the visitor can ask for a fresh link by e-mail.
 */
export function LinkProblem({ error }: { error: Error }) {
  const expired = (error as { code?: string }).code === 'link-expired';
  return (
    <div className="mx-auto max-w-2xl space-y-5">
      {expired ? (
        <Alert tone="info" title="This link has run out">
          <p>{error.message}</p>
        </Alert>
      ) : (
        <Alert tone="error" title="Booking not found">
          <p>
            The link may be incomplete, or the booking reference is wrong, or a fresh link has been mailed since. Open
            the link from your latest mail about this booking again.
          </p>
        </Alert>
      )}
      <Card>
        <FreshLinkForm />
      </Card>
      <Link to={paths.events()} className="inline-block font-bold text-navy underline">
        See all sessions
      </Link>
    </div>
  );
}
