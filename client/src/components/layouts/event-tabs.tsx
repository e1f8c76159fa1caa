import { NavLink } from 'react-router';
import { paths } from '../../config/paths';

/** The organiser's sections of one session. */
export function EventTabs({ eventId }: { eventId: number }) {
  const tabs = [
    { to: paths.manageEvent(eventId), label: 'Bookings' },
    { to: paths.rota(eventId), label: 'Rota' },
    { to: paths.board(eventId), label: 'Triage board' },
    { to: paths.benches(eventId), label: 'Benches' },
  ];
  return (
    <nav aria-label="Session" className="mb-6 flex gap-1 overflow-x-auto border-b border-ink/10">
      {tabs.map((t) => (
        <NavLink key={t.to} to={t.to} end className={({ isActive }) => `whitespace-nowrap border-b-3 px-4 py-2 font-bold ${isActive ? 'border-copper text-navy' : 'border-transparent text-ink-soft hover:text-navy'}`}>
          {t.label}
        </NavLink>
      ))}
    </nav>
  );
}
