import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Alert } from '../../../components/ui/feedback';
import { useErasePersonalData } from '../api/personal-data';
import { tr, useT } from '../../../lib/i18n';

/** For an organiser, on a visitor's request: erase the details of one booking of the group. */
export function EraseBookingButton({
  reference,
  name,
  onErased,
}: {
  reference: string;
  name: string;
  onErased?: () => void;
}) {
  const t = useT();
  const [asking, setAsking] = useState(false);
  const erase = useErasePersonalData(onErased);
  return (
    <>
      <Button
        variant="quiet"
        className="text-sm"
        onClick={() => setAsking(true)}
        aria-label={t('organise.erase.label', { name, reference })}
      >
        {t('organise.erase.button')}
      </Button>
      {erase.error && <Alert tone="error">{tr(erase.error.message)}</Alert>}
      {/* Mounted only while asking: one closed dialog per row would put every visitor's name in the page twice. */}
      {asking && (
        <ConfirmDialog
          open
          title={t('organise.erase.question', { name })}
          message={t('organise.erase.message', { reference })}
          confirmLabel={t('organise.erase.confirm')}
          busy={erase.isPending}
          onCancel={() => setAsking(false)}
          onConfirm={() => erase.mutate({ reference }, { onSettled: () => setAsking(false) })}
        />
      )}
    </>
  );
}
