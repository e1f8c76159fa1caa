import { NavLink, useNavigate } from 'react-router';
import type { SessionUser } from '../../../shared/schemas/auth';
import { paths } from '../config/paths';
import { groupsWithRole } from '../lib/auth';
import { useSignOut } from '../features/auth/api/sign-out';
import { useT } from '../lib/i18n';

/**
 * The menu's entries for a signed-in person (their groups, reception, the bench, the toolkit, their account, the
 * admin's pages) and the sign-out. A module of its own: a visitor's first load never carries it.
 */
export function StaffNav({ user, linkClass }: { user: SessionUser; linkClass: (s: { isActive: boolean }) => string }) {
  const t = useT();
  const signOut = useSignOut();
  const navigate = useNavigate();
  const links: { to: string; label: string; end?: boolean }[] = [];
  for (const g of groupsWithRole(user, 'organiser'))
    links.push({ to: paths.groupEvents(g.groupId), label: g.groupName });
  if (groupsWithRole(user, 'host').length) links.push({ to: paths.desk(), label: t('common.nav.reception') });
  if (groupsWithRole(user, 'fixer').length)
    links.push(
      { to: paths.bench(), label: t('common.nav.bench') },
      { to: paths.mySkills(), label: t('common.nav.skills') },
    );
  if (user.roles.length)
    links.push(
      { to: paths.knowledge(), label: t('common.nav.notes') },
      { to: paths.calculators(), label: t('common.nav.calculators') },
    );
  links.push({ to: paths.myData(), label: t('common.nav.account') });
  if (user.admin)
    links.push(
      { to: paths.admin(), label: t('common.nav.admin'), end: true },
      { to: paths.networkImpact(), label: t('common.nav.impact') },
      { to: paths.adminCategories(), label: t('common.nav.categories') },
      { to: paths.adminMailbox(), label: t('common.nav.mailbox') },
    );
  return (
    <>
      {links.map((l) => (
        <li key={l.to}>
          <NavLink to={l.to} end={l.end} className={linkClass}>
            {l.label}
          </NavLink>
        </li>
      ))}
      <li className="lg:ml-3">
        <button
          className="w-full whitespace-nowrap rounded-lg px-3 py-2 text-left font-semibold text-ink-soft hover:bg-navy/5"
          onClick={() => void signOut().then(() => navigate(paths.home()))}
        >
          {t('common.nav.signOut')} <span className="text-xs font-normal">({user.name})</span>
        </button>
      </li>
    </>
  );
}
