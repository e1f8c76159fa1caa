import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Alert } from '../../../components/ui/feedback';
import { useErasePersonalData } from '../api/personal-data';

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
  const [asking, setAsking] = useState(false);
  const erase = useErasePersonalData(onErased);
  return (
    <>
      <Button
        variant="quiet"
        className="text-sm"
        onClick={() => setAsking(true)}
        aria-label={`Erase the details of ${name} (${reference})`}
      >
        Erase details
      </Button>
      {erase.error && <Alert tone="error">{erase.error.message}</Alert>}
      {/* Mounted only while asking: one closed dialog per row would put every visitor's name in the page twice. */}
      {asking && (
        <ConfirmDialog
          open
          title={`Erase the details of ${name}?`}
          message={`Booking ${reference} keeps its place and repair record, but the visitor's name, e-mail address, phone number and photos are erased, names and numbers are taken out of the fault, and mail still waiting for them is not sent. Do this when the visitor asks. It cannot be undone.`}
          confirmLabel="Erase the details"
          busy={erase.isPending}
          onCancel={() => setAsking(false)}
          onConfirm={() => erase.mutate({ reference }, { onSettled: () => setAsking(false) })}
        />
      )}
    </>
  );
}
