import { useEffect, useRef } from 'react';
import { Link } from 'react-router';
import { isAbsent } from '../../../../../shared/event-day/constants';
import { Button } from '../../../components/ui/button';
import { Alert } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import type { IssuedItem } from '../api/types';
import { trParts, useT } from '../../../lib/i18n';

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
  const t = useT();
  const tagged = issued.filter((i) => i.tagCode && !isAbsent(i.status));
  const away = issued.filter((i) => isAbsent(i.status));
  const title =
    [
      tagged.length ? t('desk.issued.tagged', { n: tagged.length }) : '',
      away.length
        ? away.every((i) => i.status === 'no-show')
          ? t('desk.issued.noShow', { n: away.length })
          : t('desk.issued.away', { n: away.length })
        : '',
    ]
      .filter(Boolean)
      .join(' · ') || t('desk.issued.saved');
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => ref.current?.focus(), []);
  return (
    <div ref={ref} tabIndex={-1} className="outline-none">
      <Alert tone="success" title={title}>
        <ul className="my-2 flex flex-wrap gap-3" aria-label={t('desk.issued.list')}>
          {tagged.map((i) => (
            <li key={i.id} className="rounded-lg bg-white px-3 py-2 ring-1 ring-ink/10">
              <span
                className="block font-mono text-2xl font-extrabold tracking-widest text-navy"
                data-testid="issued-tag"
              >
                {i.tagCode}
              </span>
              <span className="text-sm">
                {trParts('desk.issued.queueNo', { number: <b>{i.queueNumber}</b> })} ·{' '}
                <Link className="underline" to={paths.tags(eventId, { items: [i.id] })} target="_blank">
                  {t('desk.issued.printOne')}
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
              {t('desk.issued.print', { n: tagged.length })}
            </Link>
          )}
          <Button variant="secondary" onClick={onClose}>
            {t('desk.issued.next')}
          </Button>
        </div>
      </Alert>
    </div>
  );
}
