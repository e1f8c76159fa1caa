import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Alert, Card } from '../../../components/ui/feedback';
import { TextField } from '../../../components/ui/field';
import { useCalendarLink } from '../api/get-calendar-link';
import { useMakeCalendarLink } from '../api/make-calendar-link';
import { shiftsCalendarUrl } from '../api/shifts-calendar-url';
import { useStopCalendarLink } from '../api/stop-calendar-link';

const linkButton =
  'inline-flex min-h-11 items-center justify-center gap-2 rounded-lg bg-white px-4 py-2 font-bold text-navy ring-1 ring-navy/25 transition hover:bg-navy/5';

/**
 * The volunteer's shifts in their own calendar app: a file to download once, or a private link the app keeps
 * reading. The link is shown once (only its hash is kept); a new one or "Stop this link" ends the old one.
 */
export function ShiftCalendarLink() {
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
      <h3 className="text-lg">Shifts in your calendar app</h3>
      <p className="text-sm">
        Download the shifts you said yes to as a file, or make a private link: your calendar app reads it every few
        hours, so new shifts and changed hours arrive by themselves.
      </p>
      <a href={shiftsCalendarUrl()} download="mendery-shifts.ics" className={linkButton}>
        Download my shifts
      </a>
      {make.error && <Alert tone="error">{make.error.message}</Alert>}
      {stop.error && <Alert tone="error">{stop.error.message}</Alert>}
      {url && (
        <div className="space-y-3 rounded-lg bg-paper p-3 ring-1 ring-ink/10">
          <TextField
            label="Your calendar link"
            readOnly
            value={url}
            onFocus={(e) => e.target.select()}
            hint="We show it only this once and keep just a fingerprint of it. Copy it now."
          />
          <div className="flex flex-wrap items-center gap-3">
            <Button onClick={() => void copy()}>Copy the link</Button>
            <p role="status" className="text-sm font-semibold">
              {copied === 'yes' && 'Copied.'}
              {copied === 'no' && 'Your browser did not allow copying: select the link above and copy it by hand.'}
            </p>
          </div>
          <ol className="list-decimal space-y-1 pl-5 text-sm">
            <li>In your calendar app, find “add a calendar from a web address” (some apps say “subscribe”).</li>
            <li>Paste the link. Your shifts appear, with the hall and the hours you said you come.</li>
            <li>Keep the link to yourself: anyone who has it can see your shifts.</li>
          </ol>
        </div>
      )}
      {!url && live && (
        <p className="text-sm">
          You have a calendar link. It is not shown again; a new one replaces it, and the old one stops working.
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" busy={make.isPending} onClick={makeLink}>
          {live ? 'Make a new calendar link' : 'Make a calendar link'}
        </Button>
        {live && (
          <Button variant="quiet" onClick={() => setAsking(true)}>
            Stop this link
          </Button>
        )}
      </div>
      <ConfirmDialog
        open={asking}
        title="Stop your calendar link?"
        message="Calendar apps that read it will stop getting your shifts, and the link will answer “not found”. You can make a new link at any time."
        confirmLabel="Stop the link"
        cancelLabel="Keep it"
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
