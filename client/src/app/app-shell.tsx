import { lazy, Suspense, useEffect, useRef, useState } from 'react';
import { Link, NavLink, Outlet, useNavigation } from 'react-router';
import { paths } from '../config/paths';
import { useUser } from '../lib/auth';
import { Logo } from '../components/layouts/logo';
import { useT } from '../lib/i18n';

// A signed-in person's entries in the menu come in a chunk of their own: a visitor never loads them.
const StaffNav = lazy(() => import('./staff-nav').then((m) => ({ default: m.StaffNav })));

// The picker sits in the footer, below what the visitor came for: it loads after the page.
const LanguagePicker = lazy(() =>
  import('../components/layouts/language-picker').then((m) => ({ default: m.LanguagePicker })),
);

const linkClass = ({ isActive }: { isActive: boolean }) =>
  `block whitespace-nowrap rounded-lg px-3 py-2 font-semibold ${isActive ? 'bg-navy text-white' : 'text-navy hover:bg-navy/5'}`;

export function AppShell() {
  const t = useT();
  const { data: user } = useUser();
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
  // A signed-in person's language follows their account; visitors never load this.
  useEffect(() => {
    if (!user) return;
    let stop: (() => void) | undefined;
    let left = false;
    void import('../lib/account-language').then((m) => {
      if (!left) stop = m.followAccount(user);
    });
    return () => {
      left = true;
      stop?.();
    };
  }, [user]);
  const loading = useNavigation().state === 'loading';

  return (
    <div className="flex min-h-dvh flex-col">
      {loading && (
        <div
          role="progressbar"
          aria-label={t('common.shell.loadingPage')}
          className="fixed inset-x-0 top-0 z-50 h-1 overflow-hidden"
        >
          <div className="h-full w-1/3 animate-[slide_1.2s_ease-in-out_infinite] bg-copper" />
        </div>
      )}
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:rounded focus:bg-white focus:p-2"
      >
        {t('common.shell.skip')}
      </a>
      <header className="border-b border-ink/10 bg-white">
        <div className="mx-auto flex max-w-6xl items-center justify-between gap-4 px-4 py-3">
          <Link to={paths.home()} aria-label={t('common.shell.home')}>
            <Logo />
          </Link>
          <button
            ref={menuButton}
            className="rounded-lg p-2 text-navy ring-1 ring-navy/20 lg:hidden"
            aria-expanded={open}
            aria-controls="main-nav"
            onClick={() => setOpen((v) => !v)}
          >
            <span className="sr-only">{t('common.shell.menu')}</span>
            <svg viewBox="0 0 24 24" className="size-6" aria-hidden>
              <path d="M4 7h16M4 12h16M4 17h16" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
            </svg>
          </button>
          <nav
            id="main-nav"
            aria-label={t('common.shell.mainNav')}
            className={`${open ? 'absolute inset-x-0 top-16 z-20 border-b border-ink/10 bg-white p-4 shadow-lg' : 'hidden'} lg:static lg:block lg:min-w-0 lg:flex-1 lg:border-0 lg:p-0 lg:shadow-none`}
          >
            {/* On a wide screen the entries wrap onto a second line rather than run off it (longer words in German). */}
            <ul
              className="flex flex-col gap-1 lg:flex-row lg:flex-wrap lg:items-center lg:justify-end"
              onClick={() => setOpen(false)}
            >
              <li>
                <NavLink to={paths.events()} end className={linkClass}>
                  {t('common.nav.sessions')}
                </NavLink>
              </li>
              {user ? (
                <Suspense>
                  <StaffNav user={user} linkClass={linkClass} />
                </Suspense>
              ) : (
                <>
                  <li>
                    <NavLink to={paths.volunteer()} className={linkClass}>
                      {t('common.nav.volunteer')}
                    </NavLink>
                  </li>
                  <li>
                    <NavLink to={paths.signIn()} className={linkClass}>
                      {t('common.nav.signIn')}
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
          <span>{t('common.footer.tagline')}</span>
          <Suspense fallback={<div className="min-h-11" />}>
            <LanguagePicker />
          </Suspense>
          <Link to={paths.safety()} className="font-semibold text-navy underline">
            {t('common.footer.safety')}
          </Link>
        </div>
      </footer>
    </div>
  );
}
