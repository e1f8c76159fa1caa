import { Link } from 'react-router';
import { Alert } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import { useT } from '../../../lib/i18n';

/** What a session's page says when the session cannot be shown, with the way back to the list. */
export function SessionMissing({ error }: { error: Error & { status?: number } }) {
  const t = useT();
  return (
    <Alert
      tone="error"
      title={error.status === 404 ? t('events.missing.notFoundTitle') : t('events.missing.errorTitle')}
    >
      <p>{error.status === 404 ? t('events.missing.notFound') : error.message}</p>
      <p className="mt-2">
        <Link to={paths.events()} className="font-bold underline">
          {t('events.missing.back')}
        </Link>
      </p>
    </Alert>
  );
}
