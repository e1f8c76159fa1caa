import { paths } from '../../config/paths';
import { SectionTabs } from '../ui/section-tabs';

/** The organiser's sections of one group. */
export function GroupTabs({ groupId }: { groupId: number }) {
  return (
    <SectionTabs
      label="Group"
      tabs={[
        { to: paths.groupEvents(groupId), label: 'Sessions' },
        { to: paths.groupPeople(groupId), label: 'People' },
        { to: paths.skillsMatrix(groupId), label: 'Skills' },
        { to: paths.impact(groupId), label: 'Impact' },
        { to: paths.followUps(groupId), label: 'Parts follow-up' },
        { to: paths.salvage(groupId), label: 'Salvage stock' },
        { to: paths.groupSettings(groupId), label: 'Rules and venues' },
      ]}
    />
  );
}
