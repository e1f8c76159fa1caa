import type { ReactNode } from 'react';
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, XAxis, YAxis } from 'recharts';
import type { EventReport } from '../api/types';
import { BARRIER_LABELS, OUTCOME_LABELS } from '../../../../../shared/event-day/constants';
import { formatDay, formatTimeRange } from '../../../../../shared/format';
import { EmptyState } from '../../../components/ui/feedback';
import { CO2E, oneDp, percent, whole } from './display';
import { MethodNotes } from './method-notes';
import { sourceForReaders } from '../../../../../shared/impact/for-readers';

const hoursFormat = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 2 });

/** A4 is 210 mm less two 14 mm margins: about 690 CSS px, so a 640 px chart fits without being scaled. */
const CHART_WIDTH = 640;
const MAX_CHART_ROWS = 12;

export function ReportBody({ r }: { r: EventReport }) {
  const { event, stats, method } = r;
  const tz = event.timeZone;
  const usedCategories = new Set(stats.byCategory.map((c) => c.categoryId));
  const methodCategories = method.categories.filter((c) => usedCategories.has(c.id));

  return (
    <main
      data-testid="report"
      className="mx-auto w-full max-w-[210mm] space-y-6 bg-white p-5 shadow-lg sm:p-[14mm] print:max-w-none print:space-y-5 print:p-0 print:shadow-none"
    >
      <header className="border-b-4 border-copper pb-4">
        <p className="text-sm font-bold uppercase tracking-wide text-copper-dark">
          {event.groupName} · {r.range ? 'report for a period' : 'session report'}
        </p>
        <h1 className="mt-1 text-2xl sm:text-3xl">{event.title}</h1>
        <p className="mt-1 font-semibold text-ink-soft">
          {r.range
            ? `${r.range.from ? formatDay(`${r.range.from}T12:00:00Z`, tz) : formatDay(event.startsAt, tz)} to ${r.range.to ? formatDay(`${r.range.to}T12:00:00Z`, tz) : formatDay(event.endsAt, tz)}`
            : `${formatDay(event.startsAt, tz)} · ${formatTimeRange(event.startsAt, event.endsAt, tz)}`}
        </p>
      </header>

      <section aria-label="Totals" className="break-inside-avoid">
        <ul className="grid grid-cols-2 gap-2 sm:grid-cols-4 print:grid-cols-4">
          <Tile label="Items seen" value={whole.format(stats.items)} />
          <Tile label="Fixed" value={whole.format(stats.fixed)} />
          <Tile label="Need a part" value={whole.format(stats.partsNeeded)} />
          <Tile label="Advice given" value={whole.format(stats.advice)} />
          <Tile label={OUTCOME_LABELS['end-of-life']} value={whole.format(stats.endOfLife)} />
          <Tile label="Fix rate" value={percent(stats.fixRate)} />
          <Tile label="kg diverted from landfill" value={oneDp.format(stats.kgDiverted)} />
          <Tile label={<>kg {CO2E} avoided</>} value={oneDp.format(stats.co2eKg)} />
        </ul>
        {stats.unknown > 0 && (
          <p className="mt-2 text-sm text-ink-soft">
            {stats.unknown} {stats.unknown === 1 ? 'item has' : 'items have'} no outcome recorded and{' '}
            {stats.unknown === 1 ? 'is' : 'are'} left out of the fix rate.
          </p>
        )}
      </section>

      {stats.items === 0 ? (
        <EmptyState title="No items were checked in" icon="▤">
          The figures fill in once items are checked in at the desk and their outcomes recorded.
        </EmptyState>
      ) : (
        <>
          <CategoryChart r={r} />
          <CategoryTable r={r} />
        </>
      )}

      <div className="grid gap-6 sm:grid-cols-2 print:grid-cols-2">
        <Block title="Why items were beyond mending">
          {stats.barriers.length === 0 ? (
            <p className="text-sm text-ink-soft">No item beyond mending had a reason recorded.</p>
          ) : (
            <ul className="space-y-1 text-sm">
              {[...stats.barriers]
                .sort((a, b) => b.count - a.count)
                .map((b) => (
                  <li key={b.barrier} className="flex justify-between gap-3 border-b border-ink/5 py-1">
                    <span>{BARRIER_LABELS[b.barrier]}</span>
                    <span className="font-bold tabular-nums">{b.count}</span>
                  </li>
                ))}
            </ul>
          )}
        </Block>

        <Block title="Volunteers">
          {r.volunteers.length === 0 ? (
            <p className="text-sm text-ink-soft">No volunteer shifts were recorded for this session.</p>
          ) : (
            <table className="w-full text-sm">
              <thead>
                <tr className="border-b border-ink/10 text-left text-ink-soft">
                  <th scope="col" className="py-1 pr-3 font-semibold">
                    Name
                  </th>
                  <th scope="col" className="py-1 text-right font-semibold">
                    Hours
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
                    {r.volunteers.length} {r.volunteers.length === 1 ? 'volunteer' : 'volunteers'}
                  </th>
                  <td className="py-1 text-right tabular-nums" data-testid="report-hours">
                    {hoursFormat.format(r.volunteerHours)} h
                  </td>
                </tr>
              </tfoot>
            </table>
          )}
        </Block>
      </div>

      <Block title="Method and sources" long>
        <div className="space-y-2 text-sm leading-relaxed">
          <MethodNotes method={method} />
          {methodCategories.length > 0 && (
            <table className="mt-2 w-full text-xs">
              <thead>
                <tr className="border-b border-ink/10 text-left text-ink-soft">
                  <th scope="col" className="py-1 pr-2 font-semibold">
                    Category
                  </th>
                  <th scope="col" className="py-1 pr-2 text-right font-semibold">
                    Avg. kg
                  </th>
                  <th scope="col" className="py-1 pr-2 font-semibold">
                    Weight source
                  </th>
                  <th scope="col" className="py-1 pr-2 text-right font-semibold">
                    kg CO2e/kg
                  </th>
                  <th scope="col" className="py-1 font-semibold">
                    Factor source
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
                    <td className="py-1 pr-2">{sourceForReaders(c.weightSource)}</td>
                    <td className="py-1 pr-2 text-right tabular-nums">
                      {c.co2ePerKg === null ? '—' : oneDp.format(c.co2ePerKg)}
                    </td>
                    <td className="py-1">{c.co2eSource ?? 'No sourced factor: counted as 0'}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </div>
      </Block>

      <footer className="break-inside-avoid border-t border-ink/15 pt-3 text-xs text-ink-soft">
        Figures are estimates: masses are weighed at the desk where possible and otherwise the average of the kind of
        item; emissions avoided use published production factors and a displacement factor of {method.displacement}.
        Counted with Mendery on {formatDay(new Date(), tz)}.
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
  const rows = r.stats.byCategory
    .slice(0, MAX_CHART_ROWS)
    .map((c) => ({ name: c.name, fixed: c.fixed, notFixed: c.items - c.fixed }));
  const height = Math.max(120, Math.min(420, 48 + rows.length * 28));
  const best = [...r.stats.byCategory].sort((a, b) => b.fixed - a.fixed)[0];
  return (
    <section className="break-inside-avoid" aria-labelledby="chart-heading">
      <h2 id="chart-heading" className="mb-1 text-lg">
        Outcomes by category
      </h2>
      <p className="mb-2 text-sm text-ink-soft">
        Fixed and not fixed, by kind of item
        {r.stats.byCategory.length > MAX_CHART_ROWS ? ` (the ${MAX_CHART_ROWS} most common)` : ''}.
        {best && best.fixed > 0 ? ` Most fixed: ${best.name.toLowerCase()} (${best.fixed} of ${best.items}).` : ''} The
        table below gives every figure.
      </p>
      {/* A fixed-width box: the chart has the same size on screen and on paper, and scrolls on a phone. */}
      <div
        className="max-w-full overflow-x-auto print:overflow-visible"
        tabIndex={0}
        role="region"
        aria-label="Chart of outcomes by category (scrolls sideways on a narrow screen)"
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
              <Bar dataKey="fixed" name="Fixed" stackId="o" fill="#5d7f6a" isAnimationActive={false} />
              <Bar
                dataKey="notFixed"
                name="Not fixed or not recorded"
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
  const s = r.stats;
  return (
    <section aria-labelledby="categories-heading">
      <h2 id="categories-heading" className="mb-2 text-lg">
        By category
      </h2>
      <div className="overflow-x-auto print:overflow-visible">
        <table className="w-full text-sm">
          <thead>
            <tr className="border-b border-ink/10 text-ink-soft">
              <th scope="col" className="py-1 pr-3 text-left font-semibold">
                Category
              </th>
              <th scope="col" className="py-1 pr-3 text-right font-semibold">
                Items
              </th>
              <th scope="col" className="py-1 pr-3 text-right font-semibold">
                Fixed
              </th>
              <th scope="col" className="py-1 pr-3 text-right font-semibold">
                kg diverted
              </th>
              <th scope="col" className="py-1 text-right font-semibold">
                kg CO2e
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
                Total
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
