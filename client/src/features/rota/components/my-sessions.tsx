import { Link } from 'react-router';
import type { MyEvent } from '../api/types';
import { formatDay, formatTimeRange } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { Alert, Card, EmptyState } from '../../../components/ui/feedback';
import { MonthCalendar } from '../../../components/ui/month-calendar';
import { paths } from '../../../config/paths';
import { useMyEvents } from '../api/get-my-events';
import { useSetShift } from '../api/set-shift';
import { ShiftCalendarLink } from './shift-calendar-link';
import { tr, useLanguage, useT } from '../../../lib/i18n';

/** The sessions a volunteer can help at, each with their answer, and a calendar of the shifts they said yes to. */
export function MySessions() {
  const t = useT();
  const { data: events } = useMyEvents();
  const coming = events.filter((e) => e.shift?.coming);
  return (
    <section aria-labelledby="sessions" className="space-y-3">
      <div className="flex items-center justify-between">
        <h2 id="sessions" className="text-xl">
          {t('bench.shifts.title')}
        </h2>
        <Link to={paths.mySkills()} className="text-sm font-bold text-navy underline">
          {t('common.nav.skills')}
        </Link>
      </div>
      {events.length === 0 && (
        <EmptyState title={t('bench.shifts.none')} icon="▦">
          {t('bench.shifts.noneBody')}
        </EmptyState>
      )}
      <ShiftAnswers events={events} />
      {coming.length > 0 && (
        <Card flush className="mendery-calendar p-3 sm:p-5">
          <h3 className="mb-2 text-lg">{t('bench.shifts.mine')}</h3>
          <MonthCalendar
            events={coming.map((e) => ({
              id: String(e.id),
              title: e.title,
              start: e.shift!.startsAt,
              end: e.shift!.endsAt,
              backgroundColor: '#23395d',
              borderColor: 'transparent',
            }))}
          />
        </Card>
      )}
      <ShiftCalendarLink />
    </section>
  );
}

const midpoint = (e: MyEvent) =>
  new Date((new Date(e.startsAt).getTime() + new Date(e.endsAt).getTime()) / 2).toISOString();

function ShiftAnswers({ events }: { events: MyEvent[] }) {
  const t = useT();
  const lang = useLanguage();
  const setShift = useSetShift();
  return (
    <>
      {setShift.error && <Alert tone="error">{tr(setShift.error.message)}</Alert>}
      {events.map((e) => {
        const allDay = Boolean(e.shift?.coming && e.shift.startsAt === e.startsAt && e.shift.endsAt === e.endsAt);
        return (
          <Card key={e.id}>
            <p className="text-sm font-bold text-copper-dark">
              {formatDay(e.startsAt, e.timeZone, lang)} · {formatTimeRange(e.startsAt, e.endsAt, e.timeZone, lang)}
            </p>
            <p className="font-extrabold text-navy">{e.title}</p>
            <p className="text-sm text-ink-soft">
              {e.groupName} ·{' '}
              {e.shift
                ? e.shift.coming
                  ? t('bench.shifts.youCome', {
                      time: formatTimeRange(e.shift.startsAt, e.shift.endsAt, e.timeZone, lang),
                    })
                  : t('bench.shifts.cannotCome')
                : t('bench.shifts.notAnswered')}
            </p>
            <div className="mt-2 flex flex-wrap gap-2">
              <Button
                className="min-h-10"
                variant={allDay ? 'primary' : 'secondary'}
                aria-pressed={allDay}
                onClick={() => setShift.mutate({ eventId: e.id, coming: true })}
              >
                {t('bench.shifts.allDay')}
              </Button>
              <Button
                variant="secondary"
                className="min-h-10"
                onClick={() =>
                  setShift.mutate({ eventId: e.id, coming: true, startsAt: e.startsAt, endsAt: midpoint(e) })
                }
              >
                {t('bench.shifts.firstHalf')}
              </Button>
              <Button
                variant="secondary"
                className="min-h-10"
                onClick={() =>
                  setShift.mutate({ eventId: e.id, coming: true, startsAt: midpoint(e), endsAt: e.endsAt })
                }
              >
                {t('bench.shifts.secondHalf')}
              </Button>
              <Button
                variant={e.shift && !e.shift.coming ? 'primary' : 'quiet'}
                aria-pressed={Boolean(e.shift && !e.shift.coming)}
                className="min-h-10"
                onClick={() => setShift.mutate({ eventId: e.id, coming: false })}
              >
                {t('bench.shifts.cantCome')}
              </Button>
            </div>
          </Card>
        );
      })}
    </>
  );
}
