import { lazy } from 'react';
import { Link, useParams, useRouteError, type LoaderFunctionArgs } from 'react-router';
import { publicGroupsQuery, usePublicGroups } from '../../features/groups/api/get-public-groups';
import { Alert, Card, EmptyState, PageTitle } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import type { Method, PublicImpact } from '../../features/impact/api/types';
import { publicImpactQuery, usePublicImpact } from '../../features/impact/api/get-public-impact';
import { queryClient } from '../../lib/query-client';
import { ApiError } from '../../lib/api';
import { ChartCard, FactorTable, linkButton, useFormats } from '../../features/impact/components/display';
import { trParts, useLanguage, useT } from '../../lib/i18n';
import { intlLocale } from '../../../../shared/format';
import { WhenVisible } from '../../components/ui/when-visible';
import { MethodNotes } from '../../features/impact/components/method-notes';
import { ImpactStory } from '../../features/impact/components/impact-story';

/** The group of the address, when there is one; `valid` is false for an address no group can have. */
const groupOf = (raw: string | undefined) => {
  const groupId = raw === undefined ? undefined : Number(raw);
  return { groupId, valid: groupId === undefined || (Number.isInteger(groupId) && groupId > 0) };
};

// The network page's list of groups is asked for as soon as this module runs, beside the figures (which the page's
// HTML asks for early): the loader, which waits for the language, then finds it on its way.
if (location.pathname === paths.publicImpact()) void queryClient.prefetchQuery(publicGroupsQuery());

/** The page reads what the loader fetched; a failure to fetch it is told by this module's `ErrorBoundary`. */
export const loader = async ({ params }: LoaderFunctionArgs) => {
  const { groupId, valid } = groupOf(params.groupId);
  if (!valid) return null;
  // The network page lists the groups above its story: read beside the figures, so the list is there with the first
  // paint instead of pushing the story down when it comes (a layout shift of 0.13 on a phone). Its failure only
  // leaves the list out.
  const [impact] = await Promise.all([
    queryClient.ensureQueryData(publicImpactQuery(groupId)),
    groupId === undefined ? queryClient.ensureQueryData(publicGroupsQuery()).catch(() => null) : null,
  ]);
  return impact;
};

/** A group that does not exist is a page of its own; anything else failing says so and suggests trying again. */
export function ErrorBoundary() {
  const t = useT();
  const err = useRouteError();
  if (err instanceof ApiError && err.status === 404) return <NotFound />;
  return (
    <Alert tone="error" title={t('figures.public.loadFailed')}>
      {err instanceof Error ? err.message : ''} {t('figures.public.tryAgain')}
    </Alert>
  );
}

/** What a group (or every group) has repaired, for anyone: totals and charts, never a person. */
export function PublicImpactPage() {
  const { groupId, valid } = groupOf(useParams().groupId);
  return valid ? <PublicFigures groupId={groupId} /> : <NotFound />;
}

function PublicFigures({ groupId }: { groupId?: number }) {
  const t = useT();
  const { data: d } = usePublicImpact(groupId);
  const title = d.group ? `${d.group.name}${d.group.town ? `, ${d.group.town}` : ''}` : t('figures.public.allGroups');

  return (
    <div className="space-y-6">
      <title>{t('figures.public.docTitle', { title })}</title>
      {groupId !== undefined && (
        <Link to={paths.publicImpact()} className="text-sm font-bold text-navy underline">
          ← {t('figures.public.allGroups')}
        </Link>
      )}
      <PageTitle title={title} lead={d.group ? t('figures.public.leadGroup') : t('figures.public.leadAll')} />
      {groupId === undefined && <GroupLinks />}

      {d.items === 0 ? (
        <EmptyState title={t('figures.public.emptyTitle')} icon="▤">
          {t('figures.public.empty')}
        </EmptyState>
      ) : (
        <>
          <ImpactStory d={d} />
          <Charts d={d} />
        </>
      )}

      <div className="flex flex-wrap gap-2">
        <Link to={paths.events()} className={`${linkButton} bg-copper text-white hover:bg-copper-dark`}>
          {t('figures.public.findSession')}
        </Link>
      </div>

      <MethodCard method={d.method} />
    </div>
  );
}

function NotFound() {
  const t = useT();
  return (
    <div className="space-y-4">
      <PageTitle title={t('figures.public.notFound')} />
      <Alert tone="info" title={t('figures.public.notFoundTitle')}>
        {trParts('figures.public.notFoundText', {
          link: (
            <Link to={paths.publicImpact()} className="font-bold underline">
              {t('figures.public.notFoundLink')}
            </Link>
          ),
        })}
      </Alert>
    </div>
  );
}

// The drawings (and the chart library) load when they come near the screen and are drawn once on it (drawing both
// charts is about 0.6 s of a slowed phone's main thread); titles, summaries and tables come at once.
const graphics = () => import('../../features/impact/components/public-graphics');
const KgByMonthGraphic = lazy(() => graphics().then((m) => ({ default: m.KgByMonthGraphic })));
const TopCategoriesGraphic = lazy(() => graphics().then((m) => ({ default: m.TopCategoriesGraphic })));

function Charts({ d }: { d: PublicImpact }) {
  const t = useT();
  const { whole, oneDp, monthLabel, longMonth } = useFormats();
  const list = new Intl.ListFormat(intlLocale(useLanguage()), { type: 'conjunction' });
  const months = d.byMonth.map((m) => ({
    month: m.month,
    label: monthLabel(m.month),
    kg: Math.round(m.kgDiverted * 10) / 10,
  }));
  const heaviest = months.reduce<(typeof months)[number] | null>(
    (best, m) => (!best || m.kg > best.kg ? m : best),
    null,
  );
  const top = d.byCategory.slice(0, 8);

  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <ChartCard
        level="h2"
        title={t('figures.public.kgTitle')}
        summary={
          heaviest
            ? t('figures.public.kgSummary', {
                kg: oneDp.format(d.kgDiverted),
                n: months.length,
                month: longMonth(heaviest.month),
                most: oneDp.format(heaviest.kg),
              })
            : t('figures.public.noMonths')
        }
        table={
          <SimpleTable
            head={[t('figures.col.month'), t('figures.col.kg')]}
            rows={months.map((m) => ({ key: m.month, cells: [longMonth(m.month), oneDp.format(m.kg)] }))}
          />
        }
      >
        <WhenVisible height={260} margin="0px" prefetch={graphics}>
          <KgByMonthGraphic months={months} />
        </WhenVisible>
      </ChartCard>

      <ChartCard
        level="h2"
        title={t('figures.public.topTitle')}
        summary={
          top.length
            ? t('figures.public.topSummary', {
                list: list.format(top.slice(0, 3).map((c) => `${c.name} (${whole.format(c.items)})`)),
              })
            : t('figures.public.noCategories')
        }
        table={
          <SimpleTable
            head={[t('figures.col.category'), t('figures.col.items'), t('figures.col.fixed')]}
            rows={d.byCategory.map((c) => ({
              key: String(c.categoryId),
              cells: [c.name, whole.format(c.items), whole.format(c.fixed)],
            }))}
          />
        }
      >
        <WhenVisible height={260} margin="0px" prefetch={graphics}>
          <TopCategoriesGraphic top={top} />
        </WhenVisible>
      </ChartCard>
    </div>
  );
}

function SimpleTable({ head, rows }: { head: string[]; rows: { key: string; cells: string[] }[] }) {
  return (
    <table className="w-full text-sm">
      <thead>
        <tr className="border-b border-ink/10 text-ink-soft">
          {head.map((h, i) => (
            <th key={h} scope="col" className={`py-1 pr-3 font-semibold ${i === 0 ? 'text-left' : 'text-right'}`}>
              {h}
            </th>
          ))}
        </tr>
      </thead>
      <tbody className="divide-y divide-ink/5">
        {rows.map((r) => (
          <tr key={r.key}>
            {r.cells.map((c, i) =>
              i === 0 ? (
                <th key={i} scope="row" className="py-1 pr-3 text-left font-semibold">
                  {c}
                </th>
              ) : (
                <td key={i} className="py-1 pr-3 text-right tabular-nums">
                  {c}
                </td>
              ),
            )}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function MethodCard({ method }: { method: Method }) {
  const t = useT();
  return (
    <Card className="p-4 sm:p-5">
      <section aria-labelledby="method-heading" className="space-y-3 text-sm leading-relaxed">
        <h2 id="method-heading" className="text-lg">
          {t('figures.public.howWeCount')}
        </h2>
        <MethodNotes method={method} />
        <p className="text-ink-soft">{t('figures.public.estimates')}</p>
        {method.categories.length > 0 && (
          <details>
            <summary className="min-h-11 cursor-pointer py-2 font-bold text-navy">
              {t('figures.public.factors')}
            </summary>
            <div className="overflow-x-auto">
              <FactorTable
                categories={method.categories.map((c) => ({ ...c, weightSource: c.weightSourceForReaders }))}
              />
            </div>
          </details>
        )}
      </section>
    </Card>
  );
}

/** On the network page: each group's own figures, one tap away. */
function GroupLinks() {
  const t = useT();
  const groups = usePublicGroups();
  if (!groups.data?.length) return null;
  return (
    <nav aria-label={t('figures.public.groups')} className="flex flex-wrap gap-2">
      {groups.data.map((g) => (
        <Link
          key={g.id}
          to={paths.publicImpact(g.id)}
          className="rounded-lg bg-white px-3 py-2 text-sm font-semibold text-navy ring-1 ring-navy/20 hover:bg-navy/5"
        >
          {g.name}
          {g.town ? ` · ${g.town}` : ''}
        </Link>
      ))}
    </nav>
  );
}
