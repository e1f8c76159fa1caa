import { useEffect, useRef } from 'react';
import { Link } from 'react-router';
import { isAbsent } from '../../../../../shared/event-day/constants';
import { Button } from '../../../components/ui/button';
import { Alert } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import type { IssuedItem } from '../api/types';

/** What the desk just issued: the tags to write on the items and print, then on to the next visitor. */
export function IssuedTags({
  eventId,
  issued,
  onClose,
}: {
  eventId: number;
  issued: IssuedItem[];
  onClose: () => void;
}) {
  const tagged = issued.filter((i) => i.tagCode && !isAbsent(i.status));
  const away = issued.filter((i) => isAbsent(i.status));
  const title =
    [
      tagged.length ? `Checked in: ${tagged.length} tag${tagged.length === 1 ? '' : 's'}` : '',
      away.length
        ? `${away.length} item${away.length === 1 ? '' : 's'} marked ${away.every((i) => i.status === 'no-show') ? 'did not come' : 'did not come or withdrawn'}`
        : '',
    ]
      .filter(Boolean)
      .join(' · ') || 'Saved';
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => ref.current?.focus(), []);
  return (
    <div ref={ref} tabIndex={-1} className="outline-none">
      <Alert tone="success" title={title}>
        <ul className="my-2 flex flex-wrap gap-3" aria-label="Tags issued">
          {tagged.map((i) => (
            <li key={i.id} className="rounded-lg bg-white px-3 py-2 ring-1 ring-ink/10">
              <span
                className="block font-mono text-2xl font-extrabold tracking-widest text-navy"
                data-testid="issued-tag"
              >
                {i.tagCode}
              </span>
              <span className="text-sm">
                Queue no. <b>{i.queueNumber}</b> ·{' '}
                <Link className="underline" to={paths.tags(eventId, { items: [i.id] })} target="_blank">
                  print this tag
                </Link>
              </span>
            </li>
          ))}
        </ul>
        <div className="flex flex-wrap gap-2">
          {tagged.length > 0 && (
            <Link
              to={paths.tags(eventId, { items: tagged.map((i) => i.id) })}
              target="_blank"
              className="inline-flex min-h-11 items-center rounded-lg bg-copper px-4 font-bold text-white hover:bg-copper-dark"
            >
              Print {tagged.length === 1 ? 'the tag' : 'these tags'}
            </Link>
          )}
          <Button variant="secondary" onClick={onClose}>
            Next visitor
          </Button>
        </div>
      </Alert>
    </div>
  );
}
