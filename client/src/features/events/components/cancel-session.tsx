import { useState } from 'react';
import { formatDay, formatTimeRange } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { useLanguage, useT } from '../../../lib/i18n';

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
  const t = useT();
  const lang = useLanguage();
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  const when = `${formatDay(event.startsAt, event.timeZone, lang)}, ${formatTimeRange(event.startsAt, event.endsAt, event.timeZone, lang)}`;
  const told =
    toTell === null
      ? t('organise.cancel.toldAll')
      : toTell === 0
        ? t('organise.cancel.toldNone')
        : t('organise.cancel.toldSome', { n: toTell });
  const close = () => {
    setOpen(false);
    setReason('');
  };
  return (
    <section aria-labelledby="call-off" className="rounded-xl border-2 border-alert/40 bg-alert-light/40 p-5">
      <h2 id="call-off" className="text-lg text-alert">
        {t('organise.cancel.title')}
      </h2>
      <p className="mt-1 max-w-prose text-sm text-ink-soft">{t('organise.cancel.lead')}</p>
      <Button variant="danger" className="mt-3" onClick={() => setOpen(true)}>
        {t('organise.cancel.button')}
      </Button>
      <ConfirmDialog
        open={open}
        title={t('organise.cancel.question', { title: event.title })}
        message={t('organise.cancel.message', { when, venue: event.venue.name, told })}
        confirmLabel={t('organise.cancel.confirm')}
        cancelLabel={t('organise.cancel.keep')}
        busy={busy}
        onCancel={close}
        onConfirm={() => onConfirm(reason.trim() || undefined, close)}
      >
        <label className="block text-sm font-semibold">
          {t('organise.cancel.reason')}
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
