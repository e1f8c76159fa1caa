import { Link, useNavigate } from 'react-router';
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { BARRIER_LABELS } from '../../../../../shared/event-day/constants';
import { paths } from '../../../config/paths';
import type { StatsFilter } from '../../../../../shared/api/impact';
import type { Stats } from '../api/types';
import { queryString as qs } from '../../../lib/query-string';
import { COLOURS, ChartCard, longMonth, monthLabel, oneDp, percent } from './display';
import { HorizontalBars } from './horizontal-bars';
import { FigureTable, NumberCell, plural, SERIES, TILES, type RecordsExtra } from './figure-parts';

export function Figures({ stats, filter }: { stats: Stats; filter: StatsFilter }) {
  const navigate = useNavigate();
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
    .map((b) => ({ ...b, label: BARRIER_LABELS[b.barrier] }));
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
          Totals
        </h2>
        <ul className="grid grid-cols-2 gap-2 sm:grid-cols-4">
          {TILES.map((t) => (
            <li key={t.key}>
              <Link
                to={link(t.outcome ? { outcome: t.outcome } : {})}
                className={`block h-full rounded-lg border-t-4 bg-white px-3 py-2.5 shadow-sm ring-1 ring-ink/5 transition hover:ring-copper ${t.accent}`}
              >
                <span className="block text-2xl font-extrabold text-navy tabular-nums" data-testid={`stat-${t.key}`}>
                  {t.value(stats)}
                </span>
                <span className="block text-sm font-semibold text-ink-soft">{t.label}</span>
                <span className="sr-only"> — show the records</span>
              </Link>
            </li>
          ))}
        </ul>
        <p className="mt-2 text-sm text-ink-soft">
          {stats.unknown > 0 && (
            <>
              <Link to={link({ outcome: 'none' })} className="font-bold text-navy underline">
                {plural(stats.unknown, 'item has', 'items have')} no outcome recorded
              </Link>{' '}
              yet and {stats.unknown === 1 ? 'is' : 'are'} left out of the fix rate.{' '}
            </>
          )}
          Emissions use a displacement factor of {stats.displacement}; see the method below.
        </p>
      </section>

      <div className="grid gap-4 lg:grid-cols-2">
        <ChartCard
          title="Outcomes over time"
          summary={
            busiest
              ? `${plural(stats.items, 'item')} over ${plural(months.length, 'month')}; the busiest was ${longMonth(busiest.month)} with ${busiest.items}.`
              : 'No months to show.'
          }
          table={
            <FigureTable head={['Month', 'Items', ...SERIES.map((s) => s.label)]}>
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
              {SERIES.map((s) => (
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
          title="Mass diverted by month"
          summary={
            heaviest
              ? `${oneDp.format(stats.kgDiverted)} kg of fixed items kept out of the bin; most in ${longMonth(heaviest.month)} (${oneDp.format(heaviest.kg)} kg).`
              : 'No months to show.'
          }
          table={
            <FigureTable head={['Month', 'kg diverted', 'Items fixed']}>
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
                formatter={(v) => [`${oneDp.format(Number(v))} kg`, 'Diverted']}
              />
              <Bar
                isAnimationActive={false}
                dataKey="kg"
                name="kg diverted"
                fill={COLOURS.partsNeeded}
                radius={[3, 3, 0, 0]}
                cursor="pointer"
                onClick={(_, i) => go({ month: months[i].month, outcome: 'fixed' })}
              />
            </BarChart>
          </ResponsiveContainer>
        </ChartCard>

        <ChartCard
          title="Top categories"
          summary={`Most items seen: ${topCategories
            .slice(0, 3)
            .map((c) => `${c.name} (${c.items})`)
            .join(', ')}.`}
          table={
            <FigureTable head={['Category', 'Items', 'Fixed', 'Fix rate', 'kg diverted']}>
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
            bars={[{ dataKey: 'items', name: 'Items', fill: COLOURS.advice }]}
            onPick={(c) => go({ categoryId: c.categoryId })}
          />
        </ChartCard>

        <ChartCard
          title="Fix rate by category"
          summary={
            ratedShown.length === 0
              ? 'No category has three or more items with an outcome yet.'
              : `Categories with at least 3 items${rated.length > ratedShown.length ? ' (the 8 most common)' : ''}. Highest: ${ratedShown[0].name} (${ratedShown[0].rate}%); lowest: ${ratedShown[ratedShown.length - 1].name} (${ratedShown[ratedShown.length - 1].rate}%).`
          }
          table={
            rated.length > 0 && (
              <FigureTable head={['Category', 'Fix rate', 'Fixed', 'Items']}>
                {rated.map((c) => (
                  <tr key={c.categoryId}>
                    <th scope="row" className="py-1 pr-3 text-left font-semibold">
                      <Link to={link({ categoryId: c.categoryId })} className="text-navy underline">
                        {c.name}
                      </Link>
                    </th>
                    <td className="py-1 pr-3 text-right tabular-nums">{c.rate}%</td>
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
              bars={[{ dataKey: 'rate', name: 'Fix rate', fill: COLOURS.fixed }]}
              onPick={(c) => go({ categoryId: c.categoryId })}
            />
          )}
        </ChartCard>

        <ChartCard
          title="Why items were beyond mending"
          summary={
            barriers.length === 0
              ? 'No item beyond mending has a reason recorded.'
              : `${plural(barrierTotal, 'item')} beyond mending with a reason recorded; most often: ${barriers[0].label.toLowerCase()} (${barriers[0].count}).`
          }
          table={
            barriers.length > 0 && (
              <FigureTable head={['Reason', 'Items']}>
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
              bars={[{ dataKey: 'count', name: 'Items', fill: COLOURS.endOfLife }]}
              onPick={(b) => go({ barrier: b.barrier })}
            />
          )}
        </ChartCard>
      </div>
    </div>
  );
}
