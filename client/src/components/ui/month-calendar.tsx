import FullCalendar from '@fullcalendar/react';
import dayGridPlugin from '@fullcalendar/daygrid';
import type { ComponentProps } from 'react';

/**
 * A month grid in Mendery's settings: weeks from Monday, 24-hour times, text arrows instead of an icon font,
 * events as coloured blocks with a short line of their own (time, and what `detail` says) that fits a phone.
 */
export function MonthCalendar({
  events,
  detail,
  onOpen,
  today = false,
}: {
  events: ComponentProps<typeof FullCalendar>['events'];
  detail?: (extended: Record<string, unknown>) => string;
  onOpen?: (id: string) => void;
  today?: boolean;
}) {
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
      eventDisplay="block"
      dayMaxEvents={3}
      events={events}
      eventTimeFormat={{ hour: '2-digit', minute: '2-digit', hour12: false }}
      eventContent={(arg) => (
        <div className="overflow-hidden px-0.5 text-xs leading-tight text-white">
          <span className="font-bold">{arg.timeText}</span>
          <span className="hidden sm:inline"> {arg.event.title}</span>
          {detail && <span className="block">{detail(arg.event.extendedProps)}</span>}
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
