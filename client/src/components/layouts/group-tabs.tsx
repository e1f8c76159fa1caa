import { NavLink } from 'react-router';
import { paths } from '../../config/paths';

/** The organiser's sections of one group. */
export function GroupTabs({ groupId }: { groupId: number }) {
  const tabs = [
    { to: paths.groupEvents(groupId), label: 'Sessions' },
    { to: paths.groupPeople(groupId), label: 'People' },
    { to: paths.skillsMatrix(groupId), label: 'Skills' },
    { to: paths.groupSettings(groupId), label: 'Rules and venues' },
  ];
  return (
    <nav aria-label="Group" className="mb-6 flex gap-1 overflow-x-auto border-b border-ink/10">
      {tabs.map((t) => (
        <NavLink key={t.to} to={t.to} end className={({ isActive }) => `whitespace-nowrap border-b-3 px-4 py-2 font-bold ${isActive ? 'border-copper text-navy' : 'border-transparent text-ink-soft hover:text-navy'}`}>
          {t.label}
        </NavLink>
      ))}
    </nav>
  );
}
