import { lazy, Suspense } from 'react';
import { useT } from '../../lib/i18n';
import { Spinner } from './feedback';
import type { MonthCalendarProps } from './month-calendar-grid';

// FullCalendar outweighs the rest of a page, so it loads when a calendar is drawn, not with the page.
const MonthCalendarGrid = lazy(() => import('./month-calendar-grid'));

/** The month grid (./month-calendar-grid), fetched on first use. */
export function MonthCalendar(props: MonthCalendarProps) {
  const t = useT();
  return (
    <Suspense fallback={<Spinner label={t('common.calendar.loading')} />}>
      <MonthCalendarGrid {...props} />
    </Suspense>
  );
}
