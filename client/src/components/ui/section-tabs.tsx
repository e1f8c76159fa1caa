import { NavLink } from 'react-router';

/**
 * The links to the sections of one thing (a group, a session); the current one is underlined. On a phone they wrap
 * onto a second row rather than scroll sideways, so no section hides off the edge.
 */
export function SectionTabs({ label, tabs }: { label: string; tabs: { to: string; label: string }[] }) {
  return (
    <nav aria-label={label} className="mb-6 flex flex-wrap gap-x-1 border-b border-ink/10">
      {tabs.map((t) => (
        <NavLink
          key={t.to}
          to={t.to}
          end
          className={({ isActive }) =>
            `inline-flex min-h-11 items-center whitespace-nowrap border-b-3 px-3 font-bold sm:px-4 ${isActive ? 'border-copper text-navy' : 'border-transparent text-ink-soft hover:text-navy'}`
          }
        >
          {t.label}
        </NavLink>
      ))}
    </nav>
  );
}
