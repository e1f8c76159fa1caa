import { useEffect, useRef, useState } from 'react';
import { Link, NavLink, Outlet, useNavigate, useNavigation } from 'react-router';
import { paths } from '../config/paths';
import { groupsWithRole, useUser } from '../lib/auth';
import { useSignOut } from '../features/auth/api/sign-out';
import { Logo } from '../components/layouts/logo';

const linkClass = ({ isActive }: { isActive: boolean }) =>
  `block whitespace-nowrap rounded-lg px-3 py-2 font-semibold ${isActive ? 'bg-navy text-white' : 'text-navy hover:bg-navy/5'}`;

export function AppShell() {
  const { data: user } = useUser();
  const signOut = useSignOut();
  const navigate = useNavigate();
  const [open, setOpen] = useState(false);
  const menuButton = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (!open) return;
    const closeOnEscape = (e: KeyboardEvent) => {
      if (e.key !== 'Escape') return;
      setOpen(false);
      menuButton.current?.focus();
    };
    document.addEventListener('keydown', closeOnEscape);
    return () => document.removeEventListener('keydown', closeOnEscape);
  }, [open]);
  const loading = useNavigation().state === 'loading';

  const links: { to: string; label: string; end?: boolean }[] = [{ to: paths.events(), label: 'Sessions', end: true }];
  if (user) {
    for (const g of groupsWithRole(user, 'organiser'))
      links.push({ to: paths.groupEvents(g.groupId), label: `${g.groupName}` });
    if (groupsWithRole(user, 'host').length) links.push({ to: paths.desk(), label: 'Reception desk' });
    if (groupsWithRole(user, 'fixer').length)
      links.push({ to: paths.bench(), label: 'My bench' }, { to: paths.mySkills(), label: 'My skills' });
    if (user.roles.length)
      links.push({ to: paths.knowledge(), label: 'Repair notes' }, { to: paths.calculators(), label: 'Calculators' });
    links.push({ to: paths.myData(), label: 'Account' });
    if (user.admin)
      links.push(
        { to: paths.admin(), label: 'Network admin', end: true },
        { to: paths.networkImpact(), label: 'Network impact' },
        { to: paths.adminCategories(), label: 'Categories' },
        { to: paths.adminMailbox(), label: 'Mailbox' },
      );
  }

  return (
    <div className="flex min-h-dvh flex-col">
      {loading && (
        <div
          role="progressbar"
          aria-label="Loading the page"
          className="fixed inset-x-0 top-0 z-50 h-1 overflow-hidden"
        >
          <div className="h-full w-1/3 animate-[slide_1.2s_ease-in-out_infinite] bg-copper" />
        </div>
      )}
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:rounded focus:bg-white focus:p-2"
      >
        Skip to content
      </a>
      <header className="border-b border-ink/10 bg-white">
        <div className="mx-auto flex max-w-6xl items-center justify-between gap-4 px-4 py-3">
          <Link to={paths.home()} aria-label="Mendery home">
            <Logo />
          </Link>
          <button
            ref={menuButton}
            className="rounded-lg p-2 text-navy ring-1 ring-navy/20 lg:hidden"
            aria-expanded={open}
            aria-controls="main-nav"
            onClick={() => setOpen((v) => !v)}
          >
            <span className="sr-only">Menu</span>
            <svg viewBox="0 0 24 24" className="size-6" aria-hidden>
              <path d="M4 7h16M4 12h16M4 17h16" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
            </svg>
          </button>
          <nav
            id="main-nav"
            aria-label="Main"
            className={`${open ? 'absolute inset-x-0 top-16 z-20 border-b border-ink/10 bg-white p-4 shadow-lg' : 'hidden'} lg:static lg:block lg:border-0 lg:p-0 lg:shadow-none`}
          >
            <ul className="flex flex-col gap-1 lg:flex-row lg:items-center" onClick={() => setOpen(false)}>
              {links.map((l) => (
                <li key={l.to}>
                  <NavLink to={l.to} end={l.end} className={linkClass}>
                    {l.label}
                  </NavLink>
                </li>
              ))}
              {user ? (
                <li className="lg:ml-3">
                  <button
                    className="w-full whitespace-nowrap rounded-lg px-3 py-2 text-left font-semibold text-ink-soft hover:bg-navy/5"
                    onClick={() => void signOut().then(() => navigate(paths.home()))}
                  >
                    Sign out <span className="text-xs font-normal">({user.name})</span>
                  </button>
                </li>
              ) : (
                <>
                  <li>
                    <NavLink to={paths.volunteer()} className={linkClass}>
                      Volunteer
                    </NavLink>
                  </li>
                  <li>
                    <NavLink to={paths.signIn()} className={linkClass}>
                      Sign in
                    </NavLink>
                  </li>
                </>
              )}
            </ul>
          </nav>
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-6 sm:py-10">
        <Outlet />
      </main>
      <footer className="border-t border-ink/10 bg-white">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-3 px-4 py-5 text-sm text-ink-soft">
          <span>Mendery — community repair, booked and counted.</span>
          <Link to={paths.safety()} className="font-semibold text-navy underline">
            Safety at the bench
          </Link>
        </div>
      </footer>
    </div>
  );
}
