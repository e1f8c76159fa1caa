import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Alert, Card } from '../../../components/ui/feedback';
import { TextField } from '../../../components/ui/field';
import { useCalendarLink } from '../api/get-calendar-link';
import { useMakeCalendarLink } from '../api/make-calendar-link';
import { shiftsCalendarUrl } from '../api/shifts-calendar-url';
import { useStopCalendarLink } from '../api/stop-calendar-link';
import { tr, useT } from '../../../lib/i18n';

const linkButton =
  'inline-flex min-h-11 items-center justify-center gap-2 rounded-lg bg-white px-4 py-2 font-bold text-navy ring-1 ring-navy/25 transition hover:bg-navy/5';

/**
 * The volunteer's shifts in their own calendar app: a file to download once, or a private link the app keeps
 * reading. The link is shown once (only its hash is kept); a new one or "Stop this link" ends the old one.
 */
export function ShiftCalendarLink() {
  const t = useT();
  const status = useCalendarLink();
  const make = useMakeCalendarLink();
  const stop = useStopCalendarLink();
  const [url, setUrl] = useState<string | null>(null);
  const [copied, setCopied] = useState<'yes' | 'no' | null>(null);
  const [asking, setAsking] = useState(false);
  const live = Boolean(url) || (status.data?.live ?? false);

  const makeLink = () =>
    make.mutate(undefined, {
      onSuccess: (r) => {
        setUrl(r.url);
        setCopied(null);
      },
    });
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(url!);
      setCopied('yes');
    } catch {
      setCopied('no');
    }
  };

  return (
    <Card className="space-y-3">
      <h3 className="text-lg">{t('bench.shifts.calendarTitle')}</h3>
      <p className="text-sm">{t('bench.shifts.calendarLead')}</p>
      <a href={shiftsCalendarUrl()} download="mendery-shifts.ics" className={linkButton}>
        {t('bench.shifts.download')}
      </a>
      {make.error && <Alert tone="error">{tr(make.error.message)}</Alert>}
      {stop.error && <Alert tone="error">{tr(stop.error.message)}</Alert>}
      {url && (
        <div className="space-y-3 rounded-lg bg-paper p-3 ring-1 ring-ink/10">
          <TextField
            label={t('bench.shifts.link')}
            readOnly
            value={url}
            onFocus={(e) => e.target.select()}
            hint={t('bench.shifts.linkHint')}
          />
          <div className="flex flex-wrap items-center gap-3">
            <Button onClick={() => void copy()}>{t('bench.shifts.copy')}</Button>
            <p role="status" className="text-sm font-semibold">
              {copied === 'yes' && t('bench.shifts.copied')}
              {copied === 'no' && t('bench.shifts.copyRefused')}
            </p>
          </div>
          <ol className="list-decimal space-y-1 pl-5 text-sm">
            <li>{t('bench.shifts.step1')}</li>
            <li>{t('bench.shifts.step2')}</li>
            <li>{t('bench.shifts.step3')}</li>
          </ol>
        </div>
      )}
      {!url && live && <p className="text-sm">{t('bench.shifts.haveLink')}</p>}
      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" busy={make.isPending} onClick={makeLink}>
          {live ? t('bench.shifts.makeNew') : t('bench.shifts.make')}
        </Button>
        {live && (
          <Button variant="quiet" onClick={() => setAsking(true)}>
            {t('bench.shifts.stop')}
          </Button>
        )}
      </div>
      <ConfirmDialog
        open={asking}
        title={t('bench.shifts.stopQuestion')}
        message={t('bench.shifts.stopMessage')}
        confirmLabel={t('bench.shifts.stopConfirm')}
        cancelLabel={t('bench.shifts.keep')}
        busy={stop.isPending}
        onCancel={() => setAsking(false)}
        onConfirm={() =>
          stop.mutate(undefined, {
            onSuccess: () => setUrl(null),
            onSettled: () => setAsking(false),
          })
        }
      />
    </Card>
  );
}
