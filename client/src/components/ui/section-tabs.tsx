import { NavLink } from 'react-router';

/** A row of links to the sections of one thing (a group, a session); the current one is underlined. */
export function SectionTabs({ label, tabs }: { label: string; tabs: { to: string; label: string }[] }) {
  return (
    <nav aria-label={label} className="mb-6 flex gap-1 overflow-x-auto border-b border-ink/10">
      {tabs.map((t) => (
        <NavLink
          key={t.to}
          to={t.to}
          end
          className={({ isActive }) =>
            `whitespace-nowrap border-b-3 px-4 py-2 font-bold ${isActive ? 'border-copper text-navy' : 'border-transparent text-ink-soft hover:text-navy'}`
          }
        >
          {t.label}
        </NavLink>
      ))}
    </nav>
  );
}
