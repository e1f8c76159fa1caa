import { Link, useNavigate } from 'react-router';
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { paths } from '../../../config/paths';
import type { StatsFilter } from '../../../../../shared/api/impact';
import type { Stats } from '../api/types';
import { queryString as qs } from '../../../lib/query-string';
import { intlLocale } from '../../../../../shared/format';
import { trParts, useLanguage, useT } from '../../../lib/i18n';
import { COLOURS, ChartCard, formatsFor } from './display';
import { HorizontalBars } from './horizontal-bars';
import { FigureTable, NumberCell, SERIES, tiles, type RecordsExtra } from './figure-parts';

export function Figures({ stats, filter }: { stats: Stats; filter: StatsFilter }) {
  const navigate = useNavigate();
  const t = useT();
  const lang = useLanguage();
  const formats = formatsFor(lang);
  const { whole, oneDp, percent, monthLabel, longMonth } = formats;
  const list = (names: string[]) => new Intl.ListFormat(intlLocale(lang), { type: 'conjunction' }).format(names);
  const series = SERIES.map((s) => ({ ...s, label: t(s.labelKey) }));
  const link = (extra: RecordsExtra = {}) => paths.impactRecords(qs({ ...filter, ...extra }));
  const go = (extra: RecordsExtra) => navigate(link(extra));

  const months = stats.byMonth.map((m) => ({
    month: m.month,
    label: monthLabel(m.month),
    items: m.items,
    fixed: m.fixed,
    partsNeeded: m.partsNeeded,
    advice: m.advice,
    endOfLife: m.endOfLife,
    kg: Math.round(m.kgDiverted * 10) / 10,
  }));
  const topCategories = stats.byCategory.slice(0, 8);
  const rated = stats.byCategory
    .filter((c) => c.items >= 3 && c.fixRate !== null)
    .map((c) => ({
      categoryId: c.categoryId,
      name: c.name,
      items: c.items,
      fixed: c.fixed,
      rate: Math.round((c.fixRate ?? 0) * 100),
    }))
    .sort((a, b) => b.rate - a.rate || b.items - a.items);
  const ratedShown = [...rated]
    .sort((a, b) => b.items - a.items)
    .slice(0, 8)
    .sort((a, b) => b.rate - a.rate || b.items - a.items);
  const barriers = [...stats.barriers]
    .sort((a, b) => b.count - a.count)
    .map((b) => ({ ...b, label: t(`fixer.barrier.${b.barrier}`) }));
  const barrierTotal = barriers.reduce((n, b) => n + b.count, 0);

  const busiest = months.reduce<(typeof months)[number] | null>(
    (best, m) => (!best || m.items > best.items ? m : best),
    null,
  );
  const heaviest = months.reduce<(typeof months)[number] | null>(
    (best, m) => (!best || m.kg > best.kg ? m : best),
    null,
  );

  return (
    <div className="space-y-6">
      <section aria-labelledby="totals-heading">
        <h2 id="totals-heading" className="sr-only">
          {t('figures.totals')}
        </h2>
        <ul className="grid grid-cols-2 gap-2 sm:grid-cols-4">
          {tiles(t, formats).map((tile) => (
            <li key={tile.key}>
              <Link
                to={link(tile.outcome ? { outcome: tile.outcome } : {})}
                className={`block h-full rounded-lg border-t-4 bg-white px-3 py-2.5 shadow-sm ring-1 ring-ink/5 transition hover:ring-copper ${tile.accent}`}
              >
                <span className="block text-2xl font-extrabold text-navy tabular-nums" data-testid={`stat-${tile.key}`}>
                  {tile.value(stats)}
                </span>
                <span className="block text-sm font-semibold text-ink-soft">{tile.label}</span>
                <span className="sr-only"> — {t('figures.showRecords')}</span>
              </Link>
            </li>
          ))}
        </ul>
        <p className="mt-2 text-sm text-ink-soft">
          {stats.unknown > 0 && (
            <>
              {trParts(
                'figures.unknown',
                {
                  link: (
                    <Link to={link({ outcome: 'none' })} className="font-bold text-navy underline">
                      {t('figures.unknownLink', { n: stats.unknown, count: whole.format(stats.unknown) })}
                    </Link>
                  ),
                },
                { n: stats.unknown },
              )}{' '}
            </>
          )}
          {t('figures.displacement', { factor: whole.format(stats.displacement) })}
        </p>
      </section>

      <div className="grid gap-4 lg:grid-cols-2">
        <ChartCard
          title={t('figures.outcomesTitle')}
          summary={
            busiest
              ? t('figures.outcomesSummary', {
                  n: stats.items,
                  items: whole.format(stats.items),
                  months: months.length,
                  month: longMonth(busiest.month),
                  busiest: whole.format(busiest.items),
                })
              : t('figures.noMonths')
          }
          table={
            <FigureTable head={[t('figures.col.month'), t('figures.col.items'), ...series.map((s) => s.label)]}>
              {months.map((m) => (
                <tr key={m.month}>
                  <th scope="row" className="py-1 pr-3 text-left font-semibold">
                    <Link to={link({ month: m.month })} className="text-navy underline">
                      {longMonth(m.month)}
                    </Link>
                  </th>
                  <NumberCell value={m.items} to={link({ month: m.month })} />
                  {SERIES.map((s) => (
                    <NumberCell key={s.key} value={m[s.key]} to={link({ month: m.month, outcome: s.outcome })} />
                  ))}
                </tr>
              ))}
            </FigureTable>
          }
        >
          <ResponsiveContainer width="100%" height={260}>
            <BarChart data={months} margin={{ top: 8, right: 8, bottom: 0, left: -12 }} accessibilityLayer={false}>
              <CartesianGrid vertical={false} stroke={COLOURS.grid} />
              <XAxis dataKey="label" tick={{ fontSize: 12 }} interval="preserveStartEnd" />
              <YAxis allowDecimals={false} tick={{ fontSize: 12 }} width={40} />
              <Tooltip cursor={{ fill: 'rgba(35,57,93,0.06)' }} />
              <Legend
                wrapperStyle={{ fontSize: 12 }}
                itemSorter={null}
                formatter={(value) => <span className="text-ink">{value}</span>}
              />
              {series.map((s) => (
                <Bar
                  isAnimationActive={false}
                  key={s.key}
                  dataKey={s.key}
                  name={s.label}
                  stackId="outcomes"
                  fill={s.colour}
                  cursor="pointer"
                  onClick={(_, i) => go({ month: months[i].month, outcome: s.outcome })}
                />
              ))}
            </BarChart>
          </ResponsiveContainer>
        </ChartCard>

        <ChartCard
          title={t('figures.massTitle')}
          summary={
            heaviest
              ? t('figures.massSummary', {
                  kg: oneDp.format(stats.kgDiverted),
                  month: longMonth(heaviest.month),
                  most: oneDp.format(heaviest.kg),
                })
              : t('figures.noMonths')
          }
          table={
            <FigureTable head={[t('figures.col.month'), t('figures.col.kgDiverted'), t('figures.col.itemsFixed')]}>
              {months.map((m) => (
                <tr key={m.month}>
                  <th scope="row" className="py-1 pr-3 text-left font-semibold">
                    <Link to={link({ month: m.month, outcome: 'fixed' })} className="text-navy underline">
                      {longMonth(m.month)}
                    </Link>
                  </th>
                  <td className="py-1 pr-3 text-right tabular-nums">{oneDp.format(m.kg)}</td>
                  <NumberCell value={m.fixed} to={link({ month: m.month, outcome: 'fixed' })} />
                </tr>
              ))}
            </FigureTable>
          }
        >
          <ResponsiveContainer width="100%" height={260}>
            <BarChart data={months} margin={{ top: 8, right: 8, bottom: 0, left: -12 }} accessibilityLayer={false}>
              <CartesianGrid vertical={false} stroke={COLOURS.grid} />
              <XAxis dataKey="label" tick={{ fontSize: 12 }} interval="preserveStartEnd" />
              <YAxis tick={{ fontSize: 12 }} width={44} />
              <Tooltip
                cursor={{ fill: 'rgba(35,57,93,0.06)' }}
                formatter={(v) => [`${oneDp.format(Number(v))} kg`, t('figures.diverted')]}
              />
              <Bar
                isAnimationActive={false}
                dataKey="kg"
                name={t('figures.col.kgDiverted')}
                fill={COLOURS.partsNeeded}
                radius={[3, 3, 0, 0]}
                cursor="pointer"
                onClick={(_, i) => go({ month: months[i].month, outcome: 'fixed' })}
              />
            </BarChart>
          </ResponsiveContainer>
        </ChartCard>

        <ChartCard
          title={t('figures.topTitle')}
          summary={t('figures.topSummary', {
            list: list(topCategories.slice(0, 3).map((c) => `${c.name} (${whole.format(c.items)})`)),
          })}
          table={
            <FigureTable
              head={[
                t('figures.col.category'),
                t('figures.col.items'),
                t('figures.col.fixed'),
                t('figures.col.fixRate'),
                t('figures.col.kgDiverted'),
              ]}
            >
              {stats.byCategory.map((c) => (
                <tr key={c.categoryId}>
                  <th scope="row" className="py-1 pr-3 text-left font-semibold">
                    <Link to={link({ categoryId: c.categoryId })} className="text-navy underline">
                      {c.name}
                    </Link>
                  </th>
                  <NumberCell value={c.items} to={link({ categoryId: c.categoryId })} />
                  <NumberCell value={c.fixed} to={link({ categoryId: c.categoryId, outcome: 'fixed' })} />
                  <td className="py-1 pr-3 text-right tabular-nums">{percent(c.fixRate)}</td>
                  <td className="py-1 pr-3 text-right tabular-nums">{oneDp.format(c.kgDiverted)}</td>
                </tr>
              ))}
            </FigureTable>
          }
        >
          <HorizontalBars
            data={topCategories}
            labelKey="name"
            bars={[{ dataKey: 'items', name: t('figures.col.items'), fill: COLOURS.advice }]}
            onPick={(c) => go({ categoryId: c.categoryId })}
          />
        </ChartCard>

        <ChartCard
          title={t('figures.rateTitle')}
          summary={
            ratedShown.length === 0
              ? t('figures.rateNone')
              : t(rated.length > ratedShown.length ? 'figures.rateSummaryTop' : 'figures.rateSummary', {
                  highest: ratedShown[0].name,
                  highRate: percent(ratedShown[0].rate / 100),
                  lowest: ratedShown[ratedShown.length - 1].name,
                  lowRate: percent(ratedShown[ratedShown.length - 1].rate / 100),
                })
          }
          table={
            rated.length > 0 && (
              <FigureTable
                head={[
                  t('figures.col.category'),
                  t('figures.col.fixRate'),
                  t('figures.col.fixed'),
                  t('figures.col.items'),
                ]}
              >
                {rated.map((c) => (
                  <tr key={c.categoryId}>
                    <th scope="row" className="py-1 pr-3 text-left font-semibold">
                      <Link to={link({ categoryId: c.categoryId })} className="text-navy underline">
                        {c.name}
                      </Link>
                    </th>
                    <td className="py-1 pr-3 text-right tabular-nums">{percent(c.rate / 100)}</td>
                    <NumberCell value={c.fixed} to={link({ categoryId: c.categoryId, outcome: 'fixed' })} />
                    <NumberCell value={c.items} to={link({ categoryId: c.categoryId })} />
                  </tr>
                ))}
              </FigureTable>
            )
          }
        >
          {ratedShown.length > 0 && (
            <HorizontalBars
              data={ratedShown}
              labelKey="name"
              percentAxis
              bars={[{ dataKey: 'rate', name: t('figures.col.fixRate'), fill: COLOURS.fixed }]}
              onPick={(c) => go({ categoryId: c.categoryId })}
            />
          )}
        </ChartCard>

        <ChartCard
          title={t('figures.barrierTitle')}
          summary={
            barriers.length === 0
              ? t('figures.barrierNone')
              : t('figures.barrierSummary', {
                  n: barrierTotal,
                  count: whole.format(barrierTotal),
                  reason: barriers[0].label,
                  times: whole.format(barriers[0].count),
                })
          }
          table={
            barriers.length > 0 && (
              <FigureTable head={[t('figures.col.reason'), t('figures.col.items')]}>
                {barriers.map((b) => (
                  <tr key={b.barrier}>
                    <th scope="row" className="py-1 pr-3 text-left font-semibold">
                      <Link to={link({ barrier: b.barrier })} className="text-navy underline">
                        {b.label}
                      </Link>
                    </th>
                    <NumberCell value={b.count} to={link({ barrier: b.barrier })} />
                  </tr>
                ))}
              </FigureTable>
            )
          }
        >
          {barriers.length > 0 && (
            <HorizontalBars
              data={barriers}
              labelKey="label"
              labelWidth={140}
              bars={[{ dataKey: 'count', name: t('figures.col.items'), fill: COLOURS.endOfLife }]}
              onPick={(b) => go({ barrier: b.barrier })}
            />
          )}
        </ChartCard>
      </div>
    </div>
  );
}
