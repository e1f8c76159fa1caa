import { useMemo } from 'react';
import { Link, redirect, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { BARRIERS, OUTCOMES, type Barrier, type Outcome } from '../../../../shared/event-day/constants';
import { intlLocale } from '../../../../shared/format';
import { EmptyState, PageTitle } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { categoriesQuery, useCategories } from '../../features/categories/api/get-categories';
import type { RecordsFilter } from '../../../../shared/api/impact';
import type { RecordRow } from '../../features/impact/api/types';
import type { Language } from '../../../../shared/i18n/languages';
import { recordsQuery, useRecords } from '../../features/impact/api/get-records';
import { groupsWithRole, meQuery } from '../../lib/auth';
import { queryClient } from '../../lib/query-client';
import { queryString as qs } from '../../lib/query-string';
import { formatsFor, isoDate, positiveInt } from '../../features/impact/components/display';
import { OUTCOME_KEYS } from '../../features/impact/components/impact-story';
import { useLanguage, useT } from '../../lib/i18n';

const PAGE_SIZE = 50;
const DAY = { day: 'numeric', month: 'short', year: 'numeric' } as const;
const dayFormat = (lang: Language) => new Intl.DateTimeFormat(intlLocale(lang), DAY);
const isoDay = (lang: Language, d: string) =>
  new Intl.DateTimeFormat(intlLocale(lang), { ...DAY, timeZone: 'UTC' }).format(new Date(`${d}T00:00:00Z`));

const isOutcome = (raw: string | null): raw is Outcome | 'none' =>
  raw === 'none' || (OUTCOMES as readonly string[]).includes(raw ?? '');
const isBarrier = (raw: string | null): raw is Barrier => (BARRIERS as readonly string[]).includes(raw ?? '');

/** The filter exactly as the URL gives it; anything malformed is left out rather than sent on. */
function recordsFilterOf(p: URLSearchParams): RecordsFilter {
  {
    const outcome = p.get('outcome');
    const barrier = p.get('barrier');
    const month = p.get('month');
    return {
      groupId: positiveInt(p.get('groupId')),
      eventId: positiveInt(p.get('eventId')),
      from: isoDate(p.get('from')),
      to: isoDate(p.get('to')),
      categoryId: positiveInt(p.get('categoryId')),
      outcome: isOutcome(outcome) ? outcome : undefined,
      barrier: isBarrier(barrier) ? barrier : undefined,
      month: month && /^\d{4}-\d{2}$/.test(month) ? month : undefined,
      page: positiveInt(p.get('page')),
    };
  }
}

function useRecordsFilter(): RecordsFilter {
  const [params] = useSearchParams();
  const key = params.toString();
  return useMemo(() => recordsFilterOf(new URLSearchParams(key)), [key]);
}

/** The page reads what the loader fetched; a failure to fetch it is the route's error, shown in the page frame. */
export const loader = async ({ request }: LoaderFunctionArgs) => {
  const url = new URL(request.url);
  const filter = recordsFilterOf(url.searchParams);
  // Every group's records are the admin's; an organiser without a group in the address gets their own group's.
  if (!filter.groupId && !filter.eventId) {
    const user = await queryClient.ensureQueryData(meQuery);
    const own = user && !user.admin ? groupsWithRole(user, 'organiser')[0] : undefined;
    if (own) return redirect(paths.impactRecords(qs({ ...filter, groupId: own.groupId })));
  }
  return Promise.all([
    queryClient.ensureQueryData(recordsQuery(filter)),
    queryClient.ensureQueryData(categoriesQuery()),
  ]);
};

type T = ReturnType<typeof useT>;
const outcomeText = (t: T, o: Outcome | 'none' | null) =>
  t(o && o !== 'none' ? OUTCOME_KEYS[o] : 'figures.records.none');
const itemLabel = (r: RecordRow) => [r.brand, r.model].filter(Boolean).join(' ');

/** The records behind a figure of the impact dashboard, 50 a page. */
export function ImpactRecordsPage() {
  const t = useT();
  const lang = useLanguage();
  const { whole, longMonth } = formatsFor(lang);
  const filter = useRecordsFilter();
  const { data: records } = useRecords(filter);
  const { data: categories } = useCategories();
  const page = filter.page ?? 1;
  const first = records.records[0];

  const categoryName = filter.categoryId
    ? (categories.find((c) => c.id === filter.categoryId)?.name ??
      (first?.categoryName || t('figures.records.categoryNo', { id: filter.categoryId })))
    : undefined;
  const chips: { key: keyof RecordsFilter; label: string }[] = [];
  const chip = (key: keyof RecordsFilter, value: string) =>
    chips.push({ key, label: t(`figures.records.chip.${key}`, { value }) });
  if (filter.eventId) chip('eventId', first?.eventTitle ?? t('figures.records.sessionNo', { id: filter.eventId }));
  if (filter.outcome) chip('outcome', outcomeText(t, filter.outcome));
  if (filter.categoryId) chip('categoryId', categoryName ?? '');
  if (filter.barrier) chip('barrier', t(`fixer.barrier.${filter.barrier}`));
  if (filter.month) chip('month', longMonth(filter.month));
  if (filter.from) chip('from', isoDay(lang, filter.from));
  if (filter.to) chip('to', isoDay(lang, filter.to));

  const without = (key: keyof RecordsFilter) =>
    paths.impactRecords(qs({ ...filter, [key]: undefined, page: undefined }));
  const atPage = (n: number) => paths.impactRecords(qs({ ...filter, page: n > 1 ? n : undefined }));
  const back = filter.groupId ? paths.impact(filter.groupId) : paths.networkImpact();
  const backQuery = qs({ eventId: filter.groupId ? filter.eventId : undefined, from: filter.from, to: filter.to });
  const scope = filter.groupId ? first?.groupName : undefined;

  return (
    <div>
      <Link to={`${back}${backQuery}`} className="text-sm font-bold text-navy underline">
        ← {t('figures.records.back')}
      </Link>
      <div className="mt-2">
        <PageTitle
          title={t('figures.records.title')}
          lead={t('figures.records.lead', {
            scope: scope ?? '',
            which: filter.groupId ? (scope ? 'named' : 'this') : 'all',
          })}
        />
      </div>

      <section aria-label={t('figures.records.filter')} className="mb-4 rounded-xl bg-white p-4 ring-1 ring-ink/5">
        <p className="text-sm" data-testid="records-filter">
          <span className="font-bold">
            {t('figures.records.count', { n: records.total, count: whole.format(records.total) })}
          </span>
          {chips.length === 0 ? ` — ${t('figures.records.everything')}` : ` ${t('figures.records.matching')}`}
        </p>
        {chips.length > 0 && (
          <ul className="mt-2 flex flex-wrap gap-2">
            {chips.map((c) => (
              <li
                key={c.key}
                className="inline-flex items-center gap-1 rounded-full bg-navy/5 py-1 pl-3 pr-1 text-sm font-semibold text-navy"
              >
                {c.label}
                <Link
                  to={without(c.key)}
                  className="inline-flex size-7 items-center justify-center rounded-full hover:bg-navy/10"
                  aria-label={t('figures.records.remove', { label: c.label })}
                >
                  <span aria-hidden>✕</span>
                </Link>
              </li>
            ))}
          </ul>
        )}
      </section>

      {records.records.length === 0 ? (
        <EmptyState title={page > 1 ? t('figures.records.emptyPage') : t('figures.records.empty')} icon="▤">
          {page > 1 ? (
            <Link to={atPage(1)} className="font-bold text-navy underline">
              {t('figures.records.firstPage')}
            </Link>
          ) : (
            t('figures.records.removeFilter')
          )}
        </EmptyState>
      ) : (
        <>
          <RecordsTable rows={records.records} showGroup={!filter.groupId} />
          <Pagination total={records.total} page={page} atPage={atPage} />
        </>
      )}
    </div>
  );
}

function Kg({ row }: { row: RecordRow }) {
  const t = useT();
  const { oneDp } = formatsFor(useLanguage());
  return (
    <span className="tabular-nums">
      {oneDp.format(row.kg)}
      {row.weighedKg === null && (
        <span className="text-ink-soft" title={t('figures.records.avgTitle')}>
          {' '}
          {t('figures.records.avg')}
        </span>
      )}
    </span>
  );
}

function OutcomeBadge({ row }: { row: RecordRow }) {
  const t = useT();
  const tone =
    row.outcome === 'fixed'
      ? 'bg-sage-light text-sage'
      : row.outcome === 'parts-needed'
        ? 'bg-copper-light text-copper-dark'
        : row.outcome === 'advice'
          ? 'bg-navy/10 text-navy'
          : row.outcome === 'end-of-life'
            ? 'bg-ink/10 text-ink'
            : 'bg-white text-ink-soft ring-1 ring-ink/15';
  return (
    <span className={`inline-block rounded-full px-2 py-0.5 text-xs font-bold ${tone}`}>
      {outcomeText(t, row.outcome)}
    </span>
  );
}

function RecordsTable({ rows, showGroup }: { rows: RecordRow[]; showGroup: boolean }) {
  const t = useT();
  const day = dayFormat(useLanguage());
  const why = (r: RecordRow) => (r.barrier ? t(`fixer.barrier.${r.barrier}`) : null);
  return (
    <>
      <div className="hidden overflow-x-auto rounded-xl bg-white ring-1 ring-ink/5 md:block">
        <table className="w-full text-sm">
          <thead>
            <tr className="border-b border-ink/10 text-left text-ink-soft">
              <th scope="col" className="px-3 py-2 font-semibold">
                {t('figures.records.col.date')}
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                {t('figures.records.col.session')}
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                {t('figures.records.col.item')}
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                {t('figures.records.col.visitor')}
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                {t('figures.records.col.outcome')}
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                {t('figures.records.col.why')}
              </th>
              <th scope="col" className="px-3 py-2 text-right font-semibold">
                {t('figures.col.kg')}
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-ink/5 align-top">
            {rows.map((r) => (
              <tr key={r.itemId} data-testid="record-row">
                <td className="whitespace-nowrap px-3 py-2 tabular-nums">{day.format(new Date(r.eventStartsAt))}</td>
                <td className="px-3 py-2">
                  {r.eventTitle}
                  {showGroup && <span className="block text-xs text-ink-soft">{r.groupName}</span>}
                </td>
                <td className="px-3 py-2">
                  <Link to={paths.item(r.itemId)} className="font-bold text-navy underline">
                    {r.categoryName}
                  </Link>
                  {itemLabel(r) && <span className="block text-xs text-ink-soft">{itemLabel(r)}</span>}
                </td>
                <td className="px-3 py-2">{r.visitor}</td>
                <td className="px-3 py-2">
                  <OutcomeBadge row={r} />
                </td>
                <td className="px-3 py-2">{why(r) ?? <span className="text-ink-soft">—</span>}</td>
                <td className="whitespace-nowrap px-3 py-2 text-right">
                  <Kg row={r} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>

      <ul className="space-y-2 md:hidden">
        {rows.map((r) => (
          <li key={r.itemId} data-testid="record-card" className="rounded-xl bg-white p-3 ring-1 ring-ink/5">
            <div className="flex items-start justify-between gap-3">
              <div className="min-w-0">
                <Link to={paths.item(r.itemId)} className="font-bold text-navy underline">
                  {r.categoryName}
                </Link>
                {itemLabel(r) && <p className="truncate text-sm text-ink-soft">{itemLabel(r)}</p>}
              </div>
              <OutcomeBadge row={r} />
            </div>
            <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
              <dt className="text-ink-soft">{t('figures.records.col.date')}</dt>
              <dd>{day.format(new Date(r.eventStartsAt))}</dd>
              <dt className="text-ink-soft">{t('figures.records.col.session')}</dt>
              <dd className="min-w-0">
                {r.eventTitle}
                {showGroup ? ` · ${r.groupName}` : ''}
              </dd>
              <dt className="text-ink-soft">{t('figures.records.col.visitor')}</dt>
              <dd>{r.visitor}</dd>
              {r.barrier && (
                <>
                  <dt className="text-ink-soft">{t('figures.records.col.why')}</dt>
                  <dd>{why(r)}</dd>
                </>
              )}
              <dt className="text-ink-soft">{t('figures.col.kg')}</dt>
              <dd>
                <Kg row={r} />
              </dd>
            </dl>
          </li>
        ))}
      </ul>
    </>
  );
}

function Pagination({ total, page, atPage }: { total: number; page: number; atPage: (n: number) => string }) {
  const t = useT();
  const { whole } = formatsFor(useLanguage());
  const pages = Math.max(1, Math.ceil(total / PAGE_SIZE));
  const start = (page - 1) * PAGE_SIZE + 1;
  const end = Math.min(total, page * PAGE_SIZE);
  const pill =
    'inline-flex min-h-11 items-center rounded-lg bg-white px-4 font-bold text-navy ring-1 ring-navy/25 hover:bg-navy/5';
  // The end of the list: greyed, but still readable (a faded copy of the link fell below 3:1).
  const endPill =
    'inline-flex min-h-11 items-center rounded-lg bg-white px-4 font-bold text-ink-soft ring-1 ring-ink/15';
  return (
    <nav aria-label={t('figures.records.pages')} className="mt-4 flex flex-wrap items-center justify-between gap-3">
      <p className="text-sm text-ink-soft">
        {t('figures.records.range', {
          start: whole.format(start),
          end: whole.format(end),
          total: whole.format(total),
          page,
          pages,
        })}
      </p>
      {pages > 1 && (
        <div className="flex gap-2">
          {page > 1 ? (
            <Link to={atPage(page - 1)} className={pill} rel="prev">
              ← {t('figures.records.previous')}
            </Link>
          ) : (
            <span className={endPill} aria-hidden>
              ← {t('figures.records.previous')}
            </span>
          )}
          {page < pages ? (
            <Link to={atPage(page + 1)} className={pill} rel="next">
              {t('figures.records.next')} →
            </Link>
          ) : (
            <span className={endPill} aria-hidden>
              {t('figures.records.next')} →
            </span>
          )}
        </div>
      )}
    </nav>
  );
}
