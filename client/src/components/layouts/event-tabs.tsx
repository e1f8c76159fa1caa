import { paths } from '../../config/paths';
import { useT } from '../../lib/i18n';
import { SectionTabs } from '../ui/section-tabs';

/** The organiser's sections of one session. */
export function EventTabs({ eventId }: { eventId: number }) {
  const t = useT();
  return (
    <SectionTabs
      label={t('organise.eventTabs.label')}
      tabs={[
        { to: paths.manageEvent(eventId), label: t('organise.eventTabs.bookings') },
        { to: paths.rota(eventId), label: t('organise.eventTabs.rota') },
        { to: paths.board(eventId), label: t('organise.eventTabs.board') },
        { to: paths.benches(eventId), label: t('organise.eventTabs.benches') },
        { to: paths.live(eventId), label: t('organise.eventTabs.live') },
        { to: paths.deskEvent(eventId), label: t('organise.eventTabs.desk') },
        { to: paths.report(eventId), label: t('organise.eventTabs.report') },
      ]}
    />
  );
}
