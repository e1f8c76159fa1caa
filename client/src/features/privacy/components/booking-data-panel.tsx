import { useState } from 'react';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Alert, Card } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import { useDownloadBookingData, useErasePersonalData } from '../api/personal-data';

/** On the visitor's booking page: a copy of what is held about them, and erasing it. */
export function BookingDataPanel({ reference, token, groupId }: { reference: string; token: string; groupId: number }) {
  const [asking, setAsking] = useState(false);
  const [erased, setErased] = useState(false);
  const erase = useErasePersonalData(() => setErased(true));
  const download = useDownloadBookingData();
  if (erased)
    return (
      <Alert tone="success" title="Your details are erased">
        Your name, e-mail address, phone number and photos are gone, and mail still waiting to reach you will not be
        sent. This link no longer opens the booking.
      </Alert>
    );
  return (
    <Card className="space-y-3">
      <h2 className="text-lg">Your details</h2>
      <p className="text-sm text-ink-soft">
        Download everything we hold about this booking, or erase your details now instead of waiting for the group to do
        it.{' '}
        <Link to={paths.groupPrivacy(groupId)} className="font-bold text-navy underline">
          How the group looks after your details
        </Link>
      </p>
      {erase.error && <Alert tone="error">{erase.error.message}</Alert>}
      {download.error && <Alert tone="error">{download.error.message}</Alert>}
      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" busy={download.isPending} onClick={() => download.mutate({ reference, token })}>
          Download my details
        </Button>
        <Button variant="danger" onClick={() => setAsking(true)}>
          Erase my details
        </Button>
      </div>
      <ConfirmDialog
        open={asking}
        title="Erase your details?"
        message="Your name, e-mail address, phone number and photos will be erased, and names and numbers taken out of what you wrote. The repair record stays without them. Your place is kept, but this link will stop working and you will get no more mail about this booking. This cannot be undone."
        confirmLabel="Erase my details"
        busy={erase.isPending}
        onCancel={() => setAsking(false)}
        onConfirm={() => erase.mutate({ reference, token }, { onSettled: () => setAsking(false) })}
      />
    </Card>
  );
}
