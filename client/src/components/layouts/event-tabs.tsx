import { paths } from '../../config/paths';
import { SectionTabs } from '../ui/section-tabs';

/** The organiser's sections of one session. */
export function EventTabs({ eventId }: { eventId: number }) {
  return (
    <SectionTabs
      label="Session"
      tabs={[
        { to: paths.manageEvent(eventId), label: 'Bookings' },
        { to: paths.rota(eventId), label: 'Rota' },
        { to: paths.board(eventId), label: 'Triage board' },
        { to: paths.benches(eventId), label: 'Benches' },
        { to: paths.live(eventId), label: 'Live' },
        { to: paths.deskEvent(eventId), label: 'Desk' },
        { to: paths.report(eventId), label: 'Report' },
      ]}
    />
  );
}
