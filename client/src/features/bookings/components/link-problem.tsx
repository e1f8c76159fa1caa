import { Link } from 'react-router';
import { Alert, Card } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import { useT } from '../../../lib/i18n';
import { FreshLinkForm } from './fresh-link-form';

/**
 * What the booking page says when its link cannot open the booking: run out, or not (or no longer) right; either way
 * the visitor can ask for a fresh link by e-mail.
 */
export function LinkProblem({ error }: { error: Error }) {
  const t = useT();
  const expired = (error as { code?: string }).code === 'link-expired';
  return (
    <div className="mx-auto max-w-2xl space-y-5">
      {expired ? (
        <Alert tone="info" title={t('booking.link.expiredTitle')}>
          <p>{error.message}</p>
        </Alert>
      ) : (
        <Alert tone="error" title={t('booking.link.notFoundTitle')}>
          <p>{t('booking.link.notFound')}</p>
        </Alert>
      )}
      <Card>
        <FreshLinkForm />
      </Card>
      <Link to={paths.events()} className="inline-block font-bold text-navy underline">
        {t('events.missing.back')}
      </Link>
    </div>
  );
}
