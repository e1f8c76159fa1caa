import { paths } from '../../config/paths';
import { useT } from '../../lib/i18n';
import { SectionTabs } from '../ui/section-tabs';

/** The organiser's sections of one group. */
export function GroupTabs({ groupId }: { groupId: number }) {
  const t = useT();
  return (
    <SectionTabs
      label={t('organise.groupTabs.label')}
      tabs={[
        { to: paths.groupEvents(groupId), label: t('organise.groupTabs.sessions') },
        { to: paths.groupPeople(groupId), label: t('organise.groupTabs.people') },
        { to: paths.skillsMatrix(groupId), label: t('organise.groupTabs.skills') },
        { to: paths.impact(groupId), label: t('organise.groupTabs.impact') },
        { to: paths.followUps(groupId), label: t('organise.groupTabs.followUps') },
        { to: paths.salvage(groupId), label: t('organise.groupTabs.salvage') },
        { to: paths.groupSettings(groupId), label: t('organise.groupTabs.settings') },
      ]}
    />
  );
}
