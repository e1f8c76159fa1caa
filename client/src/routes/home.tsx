import { Link } from 'react-router';
import { paths } from '../config/paths';
import { usePublicGroups, publicGroupsQuery } from '../features/groups/api/get-public-groups';
import { Alert, Spinner } from '../components/ui/feedback';
import { useT } from '../lib/i18n';
import { queryClient } from '../lib/query-client';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = () => queryClient.ensureQueryData(publicGroupsQuery()).catch(() => null);

export function HomePage() {
  const t = useT();
  const groups = usePublicGroups();
  return (
    <div className="space-y-12">
      <section className="grid items-center gap-8 md:grid-cols-[1.2fr_1fr]">
        <div className="space-y-5">
          <p className="inline-block rounded-full bg-copper-light px-3 py-1 text-sm font-bold text-copper-dark">
            {t('common.home.badge')}
          </p>
          <h1 className="text-4xl leading-tight sm:text-5xl">{t('common.home.title')}</h1>
          <p className="max-w-xl text-lg text-ink-soft">{t('common.home.lead')}</p>
          <div className="flex flex-wrap gap-3">
            <Link
              to={paths.events()}
              className="inline-flex min-h-11 items-center rounded-lg bg-copper px-5 font-bold text-white hover:bg-copper-dark"
            >
              {t('common.home.find')}
            </Link>
            <Link
              to={paths.volunteer()}
              className="inline-flex min-h-11 items-center rounded-lg bg-white px-5 font-bold text-navy ring-1 ring-navy/25 hover:bg-navy/5"
            >
              {t('common.home.volunteer')}
            </Link>
          </div>
        </div>
        <HeroPicture />
      </section>

      <section aria-labelledby="how">
        <h2 id="how" className="mb-4 text-2xl">
          {t('common.home.howTitle')}
        </h2>
        <ol className="grid gap-4 sm:grid-cols-3">
          {[1, 2, 3].map((n) => (
            <li key={n} className="rounded-xl bg-white p-5 shadow-sm ring-1 ring-ink/5">
              <span className="flex size-9 items-center justify-center rounded-full bg-navy font-extrabold text-white">
                {n}
              </span>
              <h3 className="mt-3 text-lg">{t(`common.home.step${n}Title`)}</h3>
              <p className="mt-1 text-ink-soft">{t(`common.home.step${n}`)}</p>
            </li>
          ))}
        </ol>
      </section>

      <section aria-labelledby="groups">
        <h2 id="groups" className="mb-4 text-2xl">
          {t('common.home.groupsTitle')}
        </h2>
        {groups.isPending && <Spinner label={t('common.home.groupsLoading')} />}
        {groups.error && <Alert tone="error">{t('common.home.groupsError', { message: groups.error.message })}</Alert>}
        {groups.data?.length === 0 && <Alert>{t('common.home.groupsNone')}</Alert>}
        <div className="grid gap-4 sm:grid-cols-2">
          {groups.data?.map((g) => (
            <Link
              key={g.id}
              to={`${paths.events()}?group=${g.id}`}
              className="block rounded-xl bg-white p-5 shadow-sm ring-1 ring-ink/5 hover:ring-copper"
            >
              <h3 className="text-lg">{g.name}</h3>
              <p className="text-sm font-semibold text-copper-dark">{g.town}</p>
              <p className="mt-2 text-ink-soft">{g.description}</p>
              <p className="mt-3 text-sm font-bold text-navy underline">{t('common.home.groupSessions')}</p>
            </Link>
          ))}
        </div>
      </section>

      <section className="rounded-xl bg-navy p-6 text-white sm:p-8">
        <h2 className="text-2xl text-white">{t('common.home.safetyTitle')}</h2>
        <p className="mt-2 max-w-3xl text-white/85">{t('common.home.safety')}</p>
        <Link to={paths.safety()} className="mt-4 inline-block font-bold text-copper-light underline">
          {t('common.home.safetyLink')}
        </Link>
      </section>
    </div>
  );
}

/** A drawing of a workbench: a lamp, a kettle and a spool of thread. */
function HeroPicture() {
  const t = useT();
  return (
    <svg
      viewBox="0 0 320 220"
      role="img"
      aria-label={t('common.home.picture')}
      className="w-full max-w-md justify-self-center"
    >
      <rect x="10" y="160" width="300" height="14" rx="4" fill="#23395d" />
      <rect x="30" y="174" width="12" height="40" fill="#182a46" />
      <rect x="278" y="174" width="12" height="40" fill="#182a46" />
      <path d="M60 160 L70 90 L110 60" stroke="#56606d" strokeWidth="6" fill="none" strokeLinecap="round" />
      <path d="M100 48 l40 14 -14 26 -40 -14z" fill="#b8612f" />
      <circle cx="118" cy="92" r="8" fill="#f3dcc8" />
      <rect x="150" y="110" width="60" height="50" rx="10" fill="#5d7f6a" />
      <path d="M210 122 q22 4 10 28" stroke="#5d7f6a" strokeWidth="7" fill="none" />
      <rect x="168" y="100" width="24" height="12" rx="4" fill="#dfeadf" />
      <rect x="236" y="126" width="42" height="34" rx="4" fill="#f3dcc8" />
      <rect x="232" y="122" width="50" height="8" rx="3" fill="#954c22" />
      <rect x="232" y="156" width="50" height="6" rx="3" fill="#954c22" />
      <path d="M257 126 q30 -40 50 -20" stroke="#b8612f" strokeWidth="2" fill="none" strokeDasharray="4 3" />
    </svg>
  );
}
