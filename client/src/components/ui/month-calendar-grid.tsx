import FullCalendar from '@fullcalendar/react';
import dayGridPlugin from '@fullcalendar/daygrid';
import type { ComponentProps } from 'react';

/**
 * A month grid in Mendery's settings: weeks from Monday, 24-hour times, text arrows instead of an icon font,
 * events as coloured blocks with a short line of their own (time, and what `detail` says). On a phone a day is
 * about 45 px wide, so an event shows its time alone and the rest is read out, not cut off.
 */
export interface MonthCalendarProps {
  events: ComponentProps<typeof FullCalendar>['events'];
  detail?: (extended: Record<string, unknown>) => string;
  onOpen?: (id: string) => void;
  today?: boolean;
}

export default function MonthCalendarGrid({ events, detail, onOpen, today = false }: MonthCalendarProps) {
  return (
    <FullCalendar
      plugins={[dayGridPlugin]}
      initialView="dayGridMonth"
      height="auto"
      firstDay={1}
      headerToolbar={{ left: today ? 'prev,next today' : 'prev,next', center: 'title', right: '' }}
      buttonIcons={false}
      buttonText={{ prev: '‹', next: '›', today: 'Today' }}
      buttonHints={{ prev: 'Previous month', next: 'Next month', today: 'This month' }}
      viewDidMount={({ el }) => {
        // The arrows are text, so their hint would only be a tooltip: give it to screen readers as the name too.
        el.closest('.fc')
          ?.querySelectorAll('.fc-prev-button, .fc-next-button')
          .forEach((b) => b.setAttribute('aria-label', b.getAttribute('title') ?? ''));
      }}
      dayCellDidMount={({ el }) => {
        // A day's name would be its number alone, while the cell also shows its events: let the content name it.
        el.removeAttribute('aria-labelledby');
      }}
      eventDisplay="block"
      dayMaxEvents={3}
      moreLinkText={(n) => `+${n}`}
      moreLinkHint={(n) => `${n} more on this day`}
      events={events}
      eventTimeFormat={{ hour: '2-digit', minute: '2-digit', hour12: false }}
      eventContent={(arg) => (
        <div className="overflow-hidden text-center text-xs leading-tight text-white sm:px-0.5 sm:text-left">
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
  );
}
