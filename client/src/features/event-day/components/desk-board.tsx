import { useMemo, useRef, useState } from 'react';
import { Link, useNavigate } from 'react-router';
import { tallyStatuses } from '../../../../../shared/event-day/tallies';
import { readScan } from '../../../../../shared/event-day/tag-code';
import { formatDay, formatTimeRange } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { Alert, Card, PageTitle } from '../../../components/ui/feedback';
import { TextField } from '../../../components/ui/field';
import { paths } from '../../../config/paths';
import type { DeskBooking, DeskView } from '../api/types';
import { QrScan } from './qr-scan';
import { StatusTallies } from './status-tallies';
import { CheckInPanel } from './check-in-panel';
import type { DeskScreening } from './desk-screening';
import { DeskSlots } from './desk-slots';
import { WalkInForm } from './walk-in-form';
import { useLanguage, useT } from '../../../lib/i18n';

/** Today's bookings by slot, search, scan, check-in item by item, walk-ins. */
/** The desk's links to the tag sheet and the hall display: 44 px targets for a finger on the tablet. */
const deskLink =
  'inline-flex min-h-11 items-center rounded-lg px-3 font-semibold text-navy underline ring-1 ring-navy/20 hover:bg-navy/5';

export function DeskBoard({ desk, screening }: { desk: DeskView; screening: DeskScreening }) {
  const t = useT();
  const lang = useLanguage();
  const eventId = desk.event.id;
  const navigate = useNavigate();
  const [search, setSearch] = useState('');
  const [selected, setSelected] = useState<string | null>(null);
  const [scanning, setScanning] = useState(false);
  const [walkIn, setWalkIn] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const searchRef = useRef<HTMLInputElement>(null);

  const all = useMemo(() => desk.slots.flatMap((s) => s.bookings), [desk]);

  const find = (text: string) => {
    const scan = readScan(text);
    if (scan?.kind === 'tag') {
      const item = all.flatMap((b) => b.items).find((i) => i.tagCode === scan.code);
      if (item) return navigate(paths.item(item.id));
    }
    if (scan?.kind === 'booking') {
      const b = all.find((x) => x.reference === scan.reference);
      if (b) {
        setSelected(b.reference);
        setNotice(null);
        return;
      }
      setNotice(t('desk.board.noSuchBooking', { reference: scan.reference }));
      return;
    }
    const q = text.trim().toLowerCase();
    const named = q ? all.filter((b) => b.visitorName.toLowerCase().includes(q)) : [];
    if (named.length === 1) {
      setSelected(named[0].reference);
      setNotice(null);
      return;
    }
    setNotice(q && named.length === 0 ? t('desk.board.noMatch', { text: text.trim() }) : null);
  };

  const q = search.trim().toLowerCase();
  const matches = (b: DeskBooking) =>
    !q ||
    b.visitorName.toLowerCase().includes(q) ||
    b.reference.toLowerCase().replace('-', '').includes(q.replace('-', ''));
  const counts = tallyStatuses(all.flatMap((b) => b.items.map((i) => i.status)));
  const current = selected ? all.find((b) => b.reference === selected) : undefined;
  const { event } = desk;

  return (
    <div className="space-y-5">
      <PageTitle
        title={t('desk.title')}
        lead={
          <>
            {event.title} · {formatDay(event.startsAt, event.timeZone, lang)},{' '}
            {formatTimeRange(event.startsAt, event.endsAt, event.timeZone, lang)}
          </>
        }
      />
      {!desk.open && (
        <Alert tone="caution" title={t('desk.board.notOpen')}>
          {t('desk.board.notOpenBody')}
        </Alert>
      )}
      <div className="flex flex-wrap items-center gap-x-4 gap-y-2 text-sm">
        <StatusTallies counts={counts} compact />
        <Link className={`ml-auto ${deskLink}`} to={paths.tags(eventId)} target="_blank">
          {t('desk.printAll')}
        </Link>
        <Link className={deskLink} to={paths.hall(eventId)} target="_blank">
          {t('desk.board.hall')}
        </Link>
      </div>

      <Card>
        <form
          className="flex flex-wrap items-end gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            find(search);
          }}
        >
          <div className="w-full min-w-60 flex-1 sm:w-auto">
            <TextField
              ref={searchRef}
              label={t('desk.board.search')}
              value={search}
              onChange={(e) => setSearch(e.target.value)}
              placeholder={t('desk.board.searchPlaceholder')}
              autoComplete="off"
              autoFocus
              hint={t('desk.board.searchHint')}
            />
          </div>
          <div className="flex w-full flex-wrap gap-2 sm:w-auto sm:pb-7">
            <Button type="submit" variant="secondary">
              {t('desk.board.find')}
            </Button>
            <Button type="button" variant="secondary" onClick={() => setScanning((s) => !s)}>
              {scanning ? t('desk.scan.close') : t('desk.board.scan')}
            </Button>
            <Button
              type="button"
              onClick={() => {
                setWalkIn(true);
                setSelected(null);
              }}
            >
              {t('desk.walkIn.title')}
            </Button>
          </div>
        </form>
        {notice && (
          <div className="mt-3">
            <Alert tone="caution">{notice}</Alert>
          </div>
        )}
        {scanning && (
          <div className="mt-3">
            <QrScan
              onClose={() => setScanning(false)}
              onResult={(text) => {
                setScanning(false);
                setSearch('');
                find(text);
              }}
            />
          </div>
        )}
      </Card>

      {walkIn && (
        <WalkInForm
          desk={desk}
          screening={screening}
          onDone={() => {
            setWalkIn(false);
            setSearch('');
            searchRef.current?.focus();
          }}
        />
      )}
      {current && (
        <CheckInPanel
          key={current.reference}
          desk={desk}
          booking={current}
          screening={screening}
          onClose={() => {
            setSelected(null);
            setSearch('');
            searchRef.current?.focus();
          }}
        />
      )}

      <DeskSlots
        desk={desk}
        shown={matches}
        filtered={q !== ''}
        selected={selected}
        onSelect={(reference) => {
          setSelected(reference);
          setWalkIn(false);
        }}
      />
    </div>
  );
}
