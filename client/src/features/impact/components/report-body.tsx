import type { ReactNode } from 'react';
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, XAxis, YAxis } from 'recharts';
import type { EventReport } from '../api/types';
import { formatDay, formatTimeRange, intlLocale } from '../../../../../shared/format';
import { EmptyState } from '../../../components/ui/feedback';
import { trParts, useLanguage, useT } from '../../../lib/i18n';
import { CO2E, formatsFor } from './display';
import { MethodNotes } from './method-notes';

/** A4 is 210 mm less two 14 mm margins: about 690 CSS px, so a 640 px chart fits without being scaled. */
const CHART_WIDTH = 640;
const MAX_CHART_ROWS = 12;

export function ReportBody({ r }: { r: EventReport }) {
  const t = useT();
  const lang = useLanguage();
  const { whole, oneDp, percent } = formatsFor(lang);
  const hoursFormat = new Intl.NumberFormat(intlLocale(lang), { maximumFractionDigits: 2 });
  const { event, stats, method } = r;
  const tz = event.timeZone;
  const day = (d: string | Date) => formatDay(d, tz, lang);
  const usedCategories = new Set(stats.byCategory.map((c) => c.categoryId));
  const methodCategories = method.categories.filter((c) => usedCategories.has(c.id));

  return (
    <main
      data-testid="report"
      className="mx-auto w-full max-w-[210mm] space-y-6 bg-white p-5 shadow-lg sm:p-[14mm] print:max-w-none print:space-y-5 print:p-0 print:shadow-none"
    >
      <header className="border-b-4 border-copper pb-4">
        <p className="text-sm font-bold uppercase tracking-wide text-copper-dark">
          {event.groupName} · {r.range ? t('figures.report.kindPeriod') : t('figures.report.kindSession')}
        </p>
        <h1 className="mt-1 text-2xl sm:text-3xl">{event.title}</h1>
        <p className="mt-1 font-semibold text-ink-soft">
          {r.range
            ? t('figures.report.period', {
                from: r.range.from ? day(`${r.range.from}T12:00:00Z`) : day(event.startsAt),
                to: r.range.to ? day(`${r.range.to}T12:00:00Z`) : day(event.endsAt),
              })
            : `${day(event.startsAt)} · ${formatTimeRange(event.startsAt, event.endsAt, tz, lang)}`}
        </p>
      </header>

      <section aria-label={t('figures.totals')} className="break-inside-avoid">
        <ul className="grid grid-cols-2 gap-2 sm:grid-cols-4 print:grid-cols-4">
          <Tile label={t('figures.tile.items')} value={whole.format(stats.items)} />
          <Tile label={t('figures.outcome.fixed')} value={whole.format(stats.fixed)} />
          <Tile label={t('figures.report.needPart')} value={whole.format(stats.partsNeeded)} />
          <Tile label={t('figures.outcome.advice')} value={whole.format(stats.advice)} />
          <Tile label={t('figures.outcome.endOfLife')} value={whole.format(stats.endOfLife)} />
          <Tile label={t('figures.tile.fixRate')} value={percent(stats.fixRate)} />
          <Tile label={t('figures.tile.kgDiverted')} value={oneDp.format(stats.kgDiverted)} />
          <Tile label={trParts('figures.tile.co2e', { co2e: CO2E })} value={oneDp.format(stats.co2eKg)} />
        </ul>
        {stats.unknown > 0 && (
          <p className="mt-2 text-sm text-ink-soft">
            {t('figures.report.unknown', { n: stats.unknown, count: whole.format(stats.unknown) })}
          </p>
        )}
      </section>

      {stats.items === 0 ? (
        <EmptyState title={t('figures.report.emptyTitle')} icon="▤">
          {t('figures.report.empty')}
        </EmptyState>
      ) : (
        <>
          <CategoryChart r={r} />
          <CategoryTable r={r} />
        </>
      )}

      <div className="grid gap-6 sm:grid-cols-2 print:grid-cols-2">
        <Block title={t('figures.barrierTitle')}>
          {stats.barriers.length === 0 ? (
            <p className="text-sm text-ink-soft">{t('figures.report.barrierNone')}</p>
          ) : (
            <ul className="space-y-1 text-sm">
              {[...stats.barriers]
                .sort((a, b) => b.count - a.count)
                .map((b) => (
                  <li key={b.barrier} className="flex justify-between gap-3 border-b border-ink/5 py-1">
                    <span>{t(`fixer.barrier.${b.barrier}`)}</span>
                    <span className="font-bold tabular-nums">{whole.format(b.count)}</span>
                  </li>
                ))}
            </ul>
          )}
        </Block>

        <Block title={t('figures.report.volunteers')}>
          {r.volunteers.length === 0 ? (
            <p className="text-sm text-ink-soft">{t('figures.report.noVolunteers')}</p>
          ) : (
            <table className="w-full text-sm">
              <thead>
                <tr className="border-b border-ink/10 text-left text-ink-soft">
                  <th scope="col" className="py-1 pr-3 font-semibold">
                    {t('figures.report.name')}
                  </th>
                  <th scope="col" className="py-1 text-right font-semibold">
                    {t('figures.report.hours')}
                  </th>
                </tr>
              </thead>
              <tbody className="divide-y divide-ink/5">
                {r.volunteers.map((v, i) => (
                  <tr key={`${v.name}-${i}`} className="break-inside-avoid">
                    <td className="py-1 pr-3">{v.name}</td>
                    <td className="py-1 text-right tabular-nums">{hoursFormat.format(v.hours)}</td>
                  </tr>
                ))}
              </tbody>
              <tfoot>
                <tr className="border-t-2 border-ink/20 font-bold">
                  <th scope="row" className="py-1 pr-3 text-left">
                    {t('figures.report.volunteerCount', { n: r.volunteers.length })}
                  </th>
                  <td className="py-1 text-right tabular-nums" data-testid="report-hours">
                    {t('figures.report.hoursTotal', { hours: hoursFormat.format(r.volunteerHours) })}
                  </td>
                </tr>
              </tfoot>
            </table>
          )}
        </Block>
      </div>

      <Block title={t('figures.method.heading')} long>
        <div className="space-y-2 text-sm leading-relaxed">
          <MethodNotes method={method} />
          {methodCategories.length > 0 && (
            <table className="mt-2 w-full text-xs">
              <thead>
                <tr className="border-b border-ink/10 text-left text-ink-soft">
                  <th scope="col" className="py-1 pr-2 font-semibold">
                    {t('figures.col.category')}
                  </th>
                  <th scope="col" className="py-1 pr-2 text-right font-semibold">
                    {t('figures.report.avgKg')}
                  </th>
                  <th scope="col" className="py-1 pr-2 font-semibold">
                    {t('figures.factors.weightSource')}
                  </th>
                  <th scope="col" className="py-1 pr-2 text-right font-semibold">
                    {t('figures.report.co2ePerKg')}
                  </th>
                  <th scope="col" className="py-1 font-semibold">
                    {t('figures.factors.factorSource')}
                  </th>
                </tr>
              </thead>
              <tbody className="divide-y divide-ink/5 align-top">
                {methodCategories.map((c) => (
                  <tr key={c.id} className="break-inside-avoid">
                    <th scope="row" className="py-1 pr-2 text-left font-semibold">
                      {c.name}
                    </th>
                    <td className="py-1 pr-2 text-right tabular-nums">{oneDp.format(c.avgWeightKg)}</td>
                    <td className="py-1 pr-2">{c.weightSourceForReaders}</td>
                    <td className="py-1 pr-2 text-right tabular-nums">
                      {c.co2ePerKg === null ? '—' : oneDp.format(c.co2ePerKg)}
                    </td>
                    <td className="py-1">{c.co2eSource ?? t('figures.factors.none')}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </div>
      </Block>

      <footer className="break-inside-avoid border-t border-ink/15 pt-3 text-xs text-ink-soft">
        {t('figures.report.footer', { factor: whole.format(method.displacement), date: day(new Date()) })}
      </footer>
    </main>
  );
}

function Tile({ label, value }: { label: ReactNode; value: string }) {
  return (
    <li className="break-inside-avoid rounded-lg border border-ink/10 px-3 py-2">
      <p className="text-2xl font-extrabold text-navy tabular-nums">{value}</p>
      <p className="text-xs font-semibold text-ink-soft">{label}</p>
    </li>
  );
}

/** A titled block kept on one page; a long one (the method) may run on to the next instead of leaving a gap. */
function Block({ title, children, long = false }: { title: string; children: ReactNode; long?: boolean }) {
  return (
    <section className={long ? '' : 'break-inside-avoid'}>
      <h2 className="mb-2 text-lg">{title}</h2>
      {children}
    </section>
  );
}

function CategoryChart({ r }: { r: EventReport }) {
  const t = useT();
  const { whole } = formatsFor(useLanguage());
  const rows = r.stats.byCategory
    .slice(0, MAX_CHART_ROWS)
    .map((c) => ({ name: c.name, fixed: c.fixed, notFixed: c.items - c.fixed }));
  const height = Math.max(120, Math.min(420, 48 + rows.length * 28));
  const best = [...r.stats.byCategory].sort((a, b) => b.fixed - a.fixed)[0];
  return (
    <section className="break-inside-avoid" aria-labelledby="chart-heading">
      <h2 id="chart-heading" className="mb-1 text-lg">
        {t('figures.report.chartTitle')}
      </h2>
      <p className="mb-2 text-sm text-ink-soft">
        {r.stats.byCategory.length > MAX_CHART_ROWS
          ? t('figures.report.chartLeadTop', { n: MAX_CHART_ROWS })
          : t('figures.report.chartLead')}
        {best && best.fixed > 0
          ? ` ${t('figures.report.mostFixed', { name: best.name, fixed: whole.format(best.fixed), items: whole.format(best.items) })}`
          : ''}{' '}
        {t('figures.report.tableBelow')}
      </p>
      {/* A fixed-width box: the chart has the same size on screen and on paper, and scrolls on a phone. */}
      <div
        className="max-w-full overflow-x-auto print:overflow-visible"
        tabIndex={0}
        role="region"
        aria-label={t('figures.report.chartLabel')}
      >
        <div aria-hidden style={{ width: CHART_WIDTH, height }}>
          <ResponsiveContainer width="100%" height="100%">
            <BarChart
              data={rows}
              layout="vertical"
              margin={{ top: 0, right: 16, bottom: 0, left: 0 }}
              accessibilityLayer={false}
            >
              <CartesianGrid horizontal={false} stroke="#e7e2da" />
              <XAxis type="number" allowDecimals={false} tick={{ fontSize: 12 }} />
              <YAxis type="category" dataKey="name" width={150} tick={{ fontSize: 12, maxLines: 2 }} />
              <Legend
                wrapperStyle={{ fontSize: 12 }}
                itemSorter={null}
                formatter={(value) => <span className="text-ink">{value}</span>}
              />
              <Bar
                dataKey="fixed"
                name={t('figures.outcome.fixed')}
                stackId="o"
                fill="#5d7f6a"
                isAnimationActive={false}
              />
              <Bar
                dataKey="notFixed"
                name={t('figures.report.notFixed')}
                stackId="o"
                fill="#b8612f"
                isAnimationActive={false}
              />
            </BarChart>
          </ResponsiveContainer>
        </div>
      </div>
    </section>
  );
}

function CategoryTable({ r }: { r: EventReport }) {
  const t = useT();
  const { whole, oneDp } = formatsFor(useLanguage());
  const s = r.stats;
  return (
    <section aria-labelledby="categories-heading">
      <h2 id="categories-heading" className="mb-2 text-lg">
        {t('figures.report.byCategory')}
      </h2>
      <div className="overflow-x-auto print:overflow-visible">
        <table className="w-full text-sm">
          <thead>
            <tr className="border-b border-ink/10 text-ink-soft">
              <th scope="col" className="py-1 pr-3 text-left font-semibold">
                {t('figures.col.category')}
              </th>
              <th scope="col" className="py-1 pr-3 text-right font-semibold">
                {t('figures.col.items')}
              </th>
              <th scope="col" className="py-1 pr-3 text-right font-semibold">
                {t('figures.col.fixed')}
              </th>
              <th scope="col" className="py-1 pr-3 text-right font-semibold">
                {t('figures.col.kgDiverted')}
              </th>
              <th scope="col" className="py-1 text-right font-semibold">
                {t('figures.report.kgCo2e')}
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-ink/5">
            {s.byCategory.map((c) => (
              <tr key={c.categoryId} className="break-inside-avoid">
                <th scope="row" className="py-1 pr-3 text-left font-semibold">
                  {c.name}
                </th>
                <td className="py-1 pr-3 text-right tabular-nums">{whole.format(c.items)}</td>
                <td className="py-1 pr-3 text-right tabular-nums">{whole.format(c.fixed)}</td>
                <td className="py-1 pr-3 text-right tabular-nums">{oneDp.format(c.kgDiverted)}</td>
                <td className="py-1 text-right tabular-nums">{oneDp.format(c.co2eKg)}</td>
              </tr>
            ))}
          </tbody>
          <tfoot>
            <tr className="border-t-2 border-ink/20 font-bold">
              <th scope="row" className="py-1 pr-3 text-left">
                {t('figures.report.total')}
              </th>
              <td className="py-1 pr-3 text-right tabular-nums">{whole.format(s.items)}</td>
              <td className="py-1 pr-3 text-right tabular-nums">{whole.format(s.fixed)}</td>
              <td className="py-1 pr-3 text-right tabular-nums">{oneDp.format(s.kgDiverted)}</td>
              <td className="py-1 text-right tabular-nums">{oneDp.format(s.co2eKg)}</td>
            </tr>
          </tfoot>
        </table>
      </div>
    </section>
  );
}
