import FullCalendar from '@fullcalendar/react';
import dayGridPlugin from '@fullcalendar/daygrid';
import { useRef, useState, type ComponentProps, type ReactNode } from 'react';
import { useLanguage, useT } from '../../lib/i18n';

const addMonths = (d: Date, n: number) => new Date(d.getFullYear(), d.getMonth() + n, 1);
const sameMonth = (a: Date, b: Date) => a.getFullYear() === b.getFullYear() && a.getMonth() === b.getMonth();

/**
 * A month grid in Mendery's settings, in the reader's language: weeks from Monday (as CLDR has it for en-GB, nl, de
 * and fr), 24-hour times, our own header (the month in words, the
 * months either side named on the buttons), soft day cells with a ringed date for today, and events as chips with a
 * coloured edge. On a phone a day is about 45 px wide, so a chip shows its time alone and the rest is read out.
 */
export interface MonthCalendarProps {
  events: ComponentProps<typeof FullCalendar>['events'];
  detail?: (extended: Record<string, unknown>) => string;
  onOpen?: (id: string) => void;
  today?: boolean;
}

export default function MonthCalendarGrid({ events, detail, onOpen, today = false }: MonthCalendarProps) {
  const t = useT();
  const lang = useLanguage();
  const locale = lang === 'en' ? 'en-GB' : lang;
  const monthName = new Intl.DateTimeFormat(locale, { month: 'long', year: 'numeric' });
  const shortMonth = new Intl.DateTimeFormat(locale, { month: 'long' });
  const calendar = useRef<FullCalendar>(null);
  const [month, setMonth] = useState(() => addMonths(new Date(), 0));
  const api = () => calendar.current?.getApi();
  const now = new Date();

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
        <p className="min-w-0 flex-1 basis-full text-xl font-extrabold text-navy sm:basis-auto" aria-live="polite">
          {monthName.format(month)}
        </p>
        <div className="flex w-full gap-2 sm:w-auto">
          <MonthButton
            label={t('common.calendar.previous', { month: monthName.format(addMonths(month, -1)) })}
            onClick={() => api()?.prev()}
          >
            <span aria-hidden="true">←</span> {shortMonth.format(addMonths(month, -1))}
          </MonthButton>
          <MonthButton
            label={t('common.calendar.next', { month: monthName.format(addMonths(month, 1)) })}
            onClick={() => api()?.next()}
          >
            {shortMonth.format(addMonths(month, 1))} <span aria-hidden="true">→</span>
          </MonthButton>
        </div>
        {today && !sameMonth(month, now) && (
          <button
            type="button"
            onClick={() => api()?.today()}
            className="min-h-11 px-1 text-sm font-bold text-navy underline decoration-navy/40 underline-offset-4 hover:decoration-navy"
          >
            {t('common.calendar.backTo', { month: shortMonth.format(now) })}
          </button>
        )}
      </div>
      <FullCalendar
        ref={calendar}
        plugins={[dayGridPlugin]}
        initialView="dayGridMonth"
        locale={locale}
        height="auto"
        firstDay={1}
        headerToolbar={false}
        datesSet={({ view }) => setMonth(view.currentStart)}
        dayHeaderFormat={{ weekday: 'short' }}
        dayCellDidMount={({ el }) => {
          // A day's name would be its number alone, while the cell also shows its events: let the content name it.
          el.removeAttribute('aria-labelledby');
        }}
        dayCellContent={(arg) =>
          arg.isToday ? (
            <>
              <span className="mendery-today-mark">{arg.dayNumberText}</span>
              <span className="sr-only">{t('common.calendar.today')}</span>
            </>
          ) : (
            arg.dayNumberText
          )
        }
        eventDisplay="block"
        dayMaxEvents={3}
        moreLinkText={(n) => `+${n}`}
        moreLinkHint={(n) => t('common.calendar.more', { count: n })}
        events={events}
        eventTimeFormat={{ hour: '2-digit', minute: '2-digit', hour12: false }}
        eventContent={(arg) => (
          <div
            className="overflow-hidden border-l-4 py-0.5 pl-1 text-xs leading-tight text-ink sm:pl-1.5"
            style={{ borderLeftColor: arg.event.backgroundColor }}
          >
            <span className="font-bold">{arg.timeText}</span>{' '}
            <span className="sr-only sm:not-sr-only">{arg.event.title}</span>
            {detail && <span className="sr-only sm:not-sr-only sm:block">{detail(arg.event.extendedProps)}</span>}
          </div>
        )}
        eventClick={(info) => {
          if (!onOpen) return;
          info.jsEvent.preventDefault();
          onOpen(info.event.id);
        }}
      />
    </div>
  );
}

function MonthButton({ label, onClick, children }: { label: string; onClick: () => void; children: ReactNode }) {
  return (
    <button
      type="button"
      aria-label={label}
      title={label}
      onClick={onClick}
      className="inline-flex min-h-11 min-w-11 flex-1 items-center justify-center gap-1.5 rounded-full bg-white px-4 text-sm font-bold text-navy ring-1 ring-navy/25 hover:bg-navy/5 sm:flex-none"
    >
      {children}
    </button>
  );
}
