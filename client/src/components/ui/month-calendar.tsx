import { lazy, Suspense } from 'react';
import { Spinner } from './feedback';
import type { MonthCalendarProps } from './month-calendar-grid';

// FullCalendar outweighs the rest of a page, so it loads when a calendar is drawn, not with the page.
const MonthCalendarGrid = lazy(() => import('./month-calendar-grid'));

/** The month grid (./month-calendar-grid), fetched on first use. */
export function MonthCalendar(props: MonthCalendarProps) {
  return (
    <Suspense fallback={<Spinner label="Loading the calendar…" />}>
      <MonthCalendarGrid {...props} />
    </Suspense>
  );
}
