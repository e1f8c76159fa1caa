import { Link } from 'react-router';
import { formatDay, formatTimeRange } from '../../../../../shared/format';
import { Card, EmptyState, PageTitle } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import type { DeskEvent } from '../api/types';
import { useLanguage, useT } from '../../../lib/i18n';

/** The sessions reception can open, today's first. */
export function DeskHome({ events: data }: { events: DeskEvent[] }) {
  const t = useT();
  const lang = useLanguage();
  const open = data.filter((e) => e.open);
  const later = data.filter((e) => !e.open);
  return (
    <div className="space-y-6">
      <PageTitle title={t('desk.title')} lead={t('desk.home.lead')} />
      {open.length === 0 && (
        <EmptyState title={t('desk.home.noneOpen')} icon="☑">
          {t('desk.home.opensOnTheDay')}{' '}
          {later[0] &&
            t('desk.home.next', { title: later[0].title, day: formatDay(later[0].startsAt, later[0].timeZone, lang) })}
        </EmptyState>
      )}
      <div className="grid gap-4 md:grid-cols-2">
        {open.map((e) => (
          <Card key={e.id}>
            <p className="text-sm text-ink-soft">{e.groupName}</p>
            <h2 className="text-xl">{e.title}</h2>
            <p className="mb-4">
              {formatDay(e.startsAt, e.timeZone, lang)}, {formatTimeRange(e.startsAt, e.endsAt, e.timeZone, lang)}
            </p>
            <Link
              to={paths.deskEvent(e.id)}
              className="inline-flex min-h-11 items-center rounded-lg bg-copper px-4 font-bold text-white hover:bg-copper-dark"
            >
              {t('desk.home.open')}
            </Link>
          </Card>
        ))}
      </div>
      {later.length > 0 && (
        <section>
          <h2 className="mb-2 text-lg">{t('desk.home.comingUp')}</h2>
          <ul className="divide-y divide-ink/10 rounded-xl bg-white ring-1 ring-ink/5">
            {later.map((e) => (
              <li key={e.id} className="px-4 py-3">
                {e.title} — {formatDay(e.startsAt, e.timeZone, lang)}{' '}
                <span className="text-sm text-ink-soft">{t('desk.home.laterNote', { group: e.groupName })}</span>
              </li>
            ))}
          </ul>
        </section>
      )}
    </div>
  );
}
