import { useState } from 'react';
import { formatDay, formatTimeRange } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';

const bookingsWord = (n: number) => `${n} booking${n === 1 ? '' : 's'}`;

/**
 * Calling a session off, kept apart from the everyday buttons (its own boxed section at the foot of the page) and
 * asked about first: the question names the session and how many bookings will be mailed.
 */
export function CancelSession({
  event,
  toTell,
  busy,
  onConfirm,
}: {
  event: { title: string; startsAt: string; endsAt: string; timeZone: string; venue: { name: string } };
  /** Confirmed bookings with an e-mail address; null while they load or if they could not be read. */
  toTell: number | null;
  busy: boolean;
  onConfirm: (reason: string | undefined, done: () => void) => void;
}) {
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  const when = `${formatDay(event.startsAt, event.timeZone)}, ${formatTimeRange(event.startsAt, event.endsAt, event.timeZone)}`;
  const told =
    toTell === null
      ? 'Everyone booked will be told by e-mail.'
      : toTell === 0
        ? 'Nobody has booked yet, so no one needs telling.'
        : `${bookingsWord(toTell)} will be told by e-mail that it is off.`;
  const close = () => {
    setOpen(false);
    setReason('');
  };
  return (
    <section aria-labelledby="call-off" className="rounded-xl border-2 border-alert/40 bg-alert-light/40 p-5">
      <h2 id="call-off" className="text-lg text-alert">
        Calling the session off
      </h2>
      <p className="mt-1 max-w-prose text-sm text-ink-soft">
        Only if it cannot go ahead. Every booking is cancelled and mailed, the waiting list is cleared, and the session
        counts nothing in the figures. This cannot be undone.
      </p>
      <Button variant="danger" className="mt-3" onClick={() => setOpen(true)}>
        Cancel session
      </Button>
      <ConfirmDialog
        open={open}
        title={`Cancel “${event.title}”?`}
        message={`${when} at ${event.venue.name}. ${told} This cannot be undone.`}
        confirmLabel="Yes, cancel the session"
        cancelLabel="Keep the session"
        busy={busy}
        onCancel={close}
        onConfirm={() => onConfirm(reason.trim() || undefined, close)}
      >
        <label className="block text-sm font-semibold">
          Reason, for the mail (optional)
          <textarea
            rows={2}
            value={reason}
            maxLength={500}
            onChange={(ev) => setReason(ev.target.value)}
            className="mt-1 block w-full rounded-lg border border-ink/20 px-3 py-2 font-normal"
          />
        </label>
      </ConfirmDialog>
    </section>
  );
}
