import { useState } from 'react';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Alert, Card } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import { useDownloadBookingData, useErasePersonalData } from '../api/personal-data';
import { useT } from '../../../lib/i18n';

/** On the visitor's booking page: a copy of what is held about them, and erasing it. */
export function BookingDataPanel({ reference, token, groupId }: { reference: string; token: string; groupId: number }) {
  const t = useT();
  const [asking, setAsking] = useState(false);
  const [erased, setErased] = useState(false);
  const erase = useErasePersonalData(() => setErased(true));
  const download = useDownloadBookingData();
  if (erased)
    return (
      <Alert tone="success" title={t('booking.data.erasedTitle')}>
        {t('booking.data.erased')}
      </Alert>
    );
  return (
    <Card className="space-y-3">
      <h2 className="text-lg">{t('booking.data.title')}</h2>
      <p className="text-sm text-ink-soft">
        {t('booking.data.lead')}{' '}
        <Link to={paths.groupPrivacy(groupId)} className="font-bold text-navy underline">
          {t('booking.data.howKept')}
        </Link>
      </p>
      {erase.error && <Alert tone="error">{erase.error.message}</Alert>}
      {download.error && <Alert tone="error">{download.error.message}</Alert>}
      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" busy={download.isPending} onClick={() => download.mutate({ reference, token })}>
          {t('booking.data.download')}
        </Button>
        <Button variant="danger" onClick={() => setAsking(true)}>
          {t('booking.data.erase')}
        </Button>
      </div>
      <ConfirmDialog
        open={asking}
        title={t('booking.data.confirmTitle')}
        message={t('booking.data.confirm')}
        confirmLabel={t('booking.data.erase')}
        busy={erase.isPending}
        onCancel={() => setAsking(false)}
        onConfirm={() => erase.mutate({ reference, token }, { onSettled: () => setAsking(false) })}
      />
    </Card>
  );
}
