import { useId, useMemo, useState, type FormEvent, type ReactNode } from 'react';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router';
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { BARRIER_LABELS, OUTCOME_LABELS, type Outcome } from '../../../../shared/event-day/constants';
import { formatDay } from '../../../../shared/format';
import type { Counts } from '../../../../shared/impact/statistics';
import { GroupTabs } from '../../components/layouts/group-tabs';
import { Button } from '../../components/ui/button';
import { Alert, Card, EmptyState, PageTitle, Spinner } from '../../components/ui/feedback';
import { SelectField, TextField } from '../../components/ui/field';
import { paths } from '../../config/paths';
import { useGroupEvents } from '../../features/events/api/events';
import { useGroupSettings } from '../../features/events/api/organiser';
import {
  exportUrl,
  qs,
  useImpactSettings,
  useMethod,
  useSetImpactSettings,
  useStats,
  type RecordsFilter,
  type Stats,
  type StatsFilter,
} from '../../features/impact/api';
import { ApiError } from '../../lib/api';
import {
  CO2E,
  COLOURS,
  ChartCard,
  FactorTable,
  HorizontalBars,
  isoDate,
  linkButton,
  longMonth,
  monthLabel,
  oneDp,
  percent,
  positiveInt,
  whole,
} from '../../features/impact/display';

const plural = (n: number, one: string, many = `${one}s`) => `${whole.format(n)} ${n === 1 ? one : many}`;

const secondaryLink = `${linkButton} bg-white text-navy ring-1 ring-navy/25 hover:bg-navy/5`;

type SeriesKey = 'fixed' | 'partsNeeded' | 'advice' | 'endOfLife';
const SERIES: { key: SeriesKey; outcome: Outcome; label: string; colour: string }[] = [
  { key: 'fixed', outcome: 'fixed', label: OUTCOME_LABELS.fixed, colour: COLOURS.fixed },
  { key: 'partsNeeded', outcome: 'parts-needed', label: OUTCOME_LABELS['parts-needed'], colour: COLOURS.partsNeeded },
  { key: 'advice', outcome: 'advice', label: OUTCOME_LABELS.advice, colour: COLOURS.advice },
  { key: 'endOfLife', outcome: 'end-of-life', label: OUTCOME_LABELS['end-of-life'], colour: COLOURS.endOfLife },
];

type TileKey = 'items' | SeriesKey | 'fixRate' | 'kgDiverted' | 'co2eKg';
const TILES: { key: TileKey; label: ReactNode; outcome?: Outcome; accent: string; value: (c: Counts) => string }[] = [
  { key: 'items', label: 'Items seen', accent: 'border-navy', value: (c) => whole.format(c.items) },
  {
    key: 'fixed',
    label: OUTCOME_LABELS.fixed,
    outcome: 'fixed',
    accent: 'border-sage',
    value: (c) => whole.format(c.fixed),
  },
  {
    key: 'partsNeeded',
    label: OUTCOME_LABELS['parts-needed'],
    outcome: 'parts-needed',
    accent: 'border-copper',
    value: (c) => whole.format(c.partsNeeded),
  },
  {
    key: 'advice',
    label: OUTCOME_LABELS.advice,
    outcome: 'advice',
    accent: 'border-navy',
    value: (c) => whole.format(c.advice),
  },
  {
    key: 'endOfLife',
    label: OUTCOME_LABELS['end-of-life'],
    outcome: 'end-of-life',
    accent: 'border-ink/30',
    value: (c) => whole.format(c.endOfLife),
  },
  { key: 'fixRate', label: 'Fix rate', outcome: 'fixed', accent: 'border-sage', value: (c) => percent(c.fixRate) },
  {
    key: 'kgDiverted',
    label: 'kg diverted from landfill',
    outcome: 'fixed',
    accent: 'border-sage',
    value: (c) => oneDp.format(c.kgDiverted),
  },
  {
    key: 'co2eKg',
    label: <>kg {CO2E} avoided</>,
    outcome: 'fixed',
    accent: 'border-sage',
    value: (c) => oneDp.format(c.co2eKg),
  },
];

type RecordsExtra = Omit<RecordsFilter, keyof StatsFilter | 'page'>;

/** The dashboard's filter lives in the URL, so a view can be bookmarked or sent to a colleague. */
function useUrlFilter(groupId?: number) {
  const [params, setParams] = useSearchParams();
  const eventId = groupId ? positiveInt(params.get('eventId')) : undefined;
  const from = isoDate(params.get('from'));
  const to = isoDate(params.get('to'));
  const filter = useMemo<StatsFilter>(() => ({ groupId, eventId, from, to }), [groupId, eventId, from, to]);
  const set = (key: 'eventId' | 'from' | 'to', value: string) =>
    setParams(
      (prev) => {
        const next = new URLSearchParams(prev);
        if (value) next.set(key, value);
        else next.delete(key);
        return next;
      },
      { replace: true },
    );
  const clear = () => setParams(new URLSearchParams(), { replace: true });
  return { filter, set, clear };
}

/** A group's figures for its organisers. */
export function GroupImpactPage() {
  const groupId = Number(useParams().groupId);
  const group = useGroupSettings(groupId);
  return (
    <div>
      <div className="mb-2">
        <h1 className="text-2xl sm:text-3xl">{group.data?.name ?? 'Impact'}</h1>
        <p className="mt-1 text-ink-soft">
          What the sessions repaired, what it kept out of the bin, and how it was counted.
        </p>
      </div>
      <GroupTabs groupId={groupId} />
      <ImpactBody groupId={groupId} groupName={group.data?.name} />
    </div>
  );
}

/** The whole network's figures for platform admins, and the one setting the estimate depends on. */
export function NetworkImpactPage() {
  return (
    <div>
      <PageTitle
        title="Network impact"
        lead="Every group on Mendery together. Pick dates to narrow it down; every figure opens the records it counts."
      />
      <div className="mb-6">
        <DisplacementCard />
      </div>
      <ImpactBody />
    </div>
  );
}

function ImpactBody({ groupId, groupName }: { groupId?: number; groupName?: string }) {
  const { filter, set, clear } = useUrlFilter(groupId);
  const stats = useStats(filter);
  const rangeError =
    filter.from && filter.to && filter.from > filter.to ? 'The end date is before the start date.' : undefined;
  const filtered = Boolean(filter.eventId || filter.from || filter.to);

  return (
    <div className="space-y-6">
      <section aria-label="Filters" className="rounded-xl bg-white p-4 ring-1 ring-ink/5">
        <div className="grid grid-cols-2 items-end gap-3 sm:grid-cols-4">
          {groupId !== undefined && (
            <EventSelect groupId={groupId} value={filter.eventId} onChange={(v) => set('eventId', v)} />
          )}
          <TextField
            label="From"
            type="date"
            value={filter.from ?? ''}
            max={filter.to}
            onChange={(e) => set('from', e.target.value)}
          />
          <TextField
            label="To"
            type="date"
            value={filter.to ?? ''}
            min={filter.from}
            onChange={(e) => set('to', e.target.value)}
            error={rangeError}
          />
          {filtered && (
            <div className="col-span-2 sm:col-span-1">
              <Button variant="quiet" onClick={clear} className="w-full sm:w-auto">
                Clear filters
              </Button>
            </div>
          )}
        </div>
      </section>

      <Actions filter={filter} groupId={groupId} groupName={groupName} />

      {rangeError ? (
        <Alert tone="error" title="Check the dates">
          {rangeError} Change one of them to see the figures.
        </Alert>
      ) : stats.isPending ? (
        <Spinner label="Counting the repairs…" />
      ) : stats.isError ? (
        <Alert tone="error" title="The figures could not be loaded">
          {stats.error.message}
        </Alert>
      ) : stats.data.items === 0 ? (
        <EmptyState title={filtered ? 'No items in this selection' : 'No items counted yet'} icon="▤">
          {filtered
            ? 'Nothing was checked in for these dates or this session. Widen the dates or clear the filters.'
            : 'Figures appear here once items are checked in at a session and their outcomes recorded.'}
        </EmptyState>
      ) : (
        <Figures stats={stats.data} filter={filter} />
      )}

      <MethodSection />
    </div>
  );
}

function EventSelect({ groupId, value, onChange }: { groupId: number; value?: number; onChange: (v: string) => void }) {
  const events = useGroupEvents(groupId);
  const list = [...(events.data ?? [])].sort((a, b) => b.startsAt.localeCompare(a.startsAt));
  return (
    <div className="col-span-2">
      <SelectField
        label="Session"
        value={value ?? ''}
        onChange={(e) => onChange(e.target.value)}
        disabled={events.isPending}
        hint={events.isError ? 'The sessions could not be loaded; the figures cover all of them.' : undefined}
      >
        <option value="">{events.isPending ? 'Loading sessions…' : 'All sessions'}</option>
        {value !== undefined && !list.some((e) => e.id === value) && <option value={value}>Session {value}</option>}
        {list.map((e) => (
          <option key={e.id} value={e.id}>
            {formatDay(e.startsAt, e.timeZone)} · {e.title}
          </option>
        ))}
      </SelectField>
    </div>
  );
}

function Actions({ filter, groupId, groupName }: { filter: StatsFilter; groupId?: number; groupName?: string }) {
  const [embedOpen, setEmbedOpen] = useState(false);
  const panelId = useId();
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap gap-2">
        {filter.from && filter.to && filter.from > filter.to ? (
          <p className="text-sm text-ink-soft">Correct the dates to download the records.</p>
        ) : (
          <>
            <a href={exportUrl('records', filter)} download className={secondaryLink}>
              Download records (CSV)
            </a>
            <a href={exportUrl('open-repair-data', filter)} download className={secondaryLink}>
              Open Repair Data export (CSV)
            </a>
          </>
        )}
        {groupId !== undefined && (
          <>
            <Link
              to={
                filter.eventId
                  ? paths.report(filter.eventId)
                  : paths.groupReport(groupId, qs({ from: filter.from, to: filter.to }))
              }
              className={secondaryLink}
            >
              Printable report
            </Link>
            <Link to={paths.publicImpact(groupId)} className={secondaryLink}>
              Public page
            </Link>
            <Button
              variant="secondary"
              aria-expanded={embedOpen}
              aria-controls={panelId}
              onClick={() => setEmbedOpen((v) => !v)}
            >
              Embed on your website
            </Button>
          </>
        )}
      </div>
      {groupId !== undefined && embedOpen && <EmbedPanel id={panelId} groupId={groupId} groupName={groupName} />}
    </div>
  );
}

const attr = (s: string) =>
  s.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;').replace(/>/g, '&gt;');

function EmbedPanel({ id, groupId, groupName }: { id: string; groupId: number; groupName?: string }) {
  const [copied, setCopied] = useState<'ok' | 'failed' | null>(null);
  const title = groupName ? `Repairs counted by ${groupName}` : 'Repairs counted with Mendery';
  const snippet = `<iframe src="${window.location.origin}${paths.embed(groupId)}" width="360" height="260" style="border:0" title="${attr(title)}"></iframe>`;
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(snippet);
      setCopied('ok');
    } catch {
      setCopied('failed');
    }
  };
  return (
    <Card className="p-4 sm:p-5">
      <div id={id} className="grid gap-4 lg:grid-cols-[1fr_auto]">
        <div className="min-w-0 space-y-2">
          <h2 className="text-lg">Embed on your website</h2>
          <p className="text-sm text-ink-soft">
            Paste this code where the figures should show. They update by themselves and name nobody.
          </p>
          <label htmlFor={`${id}-code`} className="sr-only">
            Code to paste
          </label>
          <textarea
            id={`${id}-code`}
            readOnly
            rows={4}
            value={snippet}
            onFocus={(e) => e.currentTarget.select()}
            className="block w-full rounded-lg border border-ink/20 bg-paper px-3 py-2 font-mono text-xs text-ink"
          />
          <div className="flex flex-wrap items-center gap-3">
            <Button onClick={copy}>Copy the code</Button>
            <p role="status" className="text-sm font-semibold">
              {copied === 'ok' && <span className="text-sage">Copied.</span>}
              {copied === 'failed' && (
                <span className="text-alert">Copying did not work here: select the code and copy it by hand.</span>
              )}
            </p>
          </div>
        </div>
        <div className="min-w-0">
          <p className="mb-1 text-sm font-semibold text-ink-soft">Preview</p>
          <div className="max-w-full overflow-x-auto">
            <iframe
              src={paths.embed(groupId)}
              width={360}
              height={260}
              style={{ border: 0 }}
              title={`Preview: ${title}`}
              className="rounded-xl bg-white"
            />
          </div>
        </div>
      </div>
    </Card>
  );
}

function Figures({ stats, filter }: { stats: Stats; filter: StatsFilter }) {
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
          title="Barriers to repair"
          summary={
            barriers.length === 0
              ? 'No end-of-life item has a barrier recorded.'
              : `${plural(barrierTotal, 'end-of-life item')} with a barrier recorded; most often: ${barriers[0].label.toLowerCase()} (${barriers[0].count}).`
          }
          table={
            barriers.length > 0 && (
              <FigureTable head={['Barrier', 'Items']}>
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

function FigureTable({ head, children }: { head: string[]; children: ReactNode }) {
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
      <tbody className="divide-y divide-ink/5">{children}</tbody>
    </table>
  );
}

function NumberCell({ value, to }: { value: number; to: string }) {
  return (
    <td className="py-1 pr-3 text-right tabular-nums">
      {value > 0 ? (
        <Link to={to} className="text-navy underline">
          {whole.format(value)}
        </Link>
      ) : (
        whole.format(value)
      )}
    </td>
  );
}

function MethodSection() {
  const method = useMethod();
  return (
    <Card className="p-4 sm:p-5">
      <section aria-labelledby="method-heading">
        <h2 id="method-heading" className="text-lg">
          Method and sources
        </h2>
        {method.isPending ? (
          <Spinner label="Loading the method…" />
        ) : method.isError ? (
          <Alert tone="error" title="The method could not be loaded">
            {method.error.message}
          </Alert>
        ) : (
          <div className="mt-2 space-y-3 text-sm leading-relaxed">
            <ul className="list-disc space-y-1 pl-5">
              {method.data.text.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
            <p>
              <span className="font-bold">Displacement factor {method.data.displacement}.</span>{' '}
              {method.data.displacementNote}
            </p>
            <p>
              <span className="font-bold">Emission factors:</span> {method.data.factorSource}
            </p>
            {method.data.categories.length > 0 && (
              <details>
                <summary className="min-h-11 cursor-pointer py-2 font-bold text-navy">
                  Weights and factors of the {method.data.categories.length} categories
                </summary>
                <div className="overflow-x-auto">
                  <FactorTable categories={method.data.categories} />
                </div>
              </details>
            )}
          </div>
        )}
      </section>
    </Card>
  );
}

function DisplacementCard() {
  const settings = useImpactSettings();
  return (
    <Card className="p-4 sm:p-5">
      <section aria-labelledby="displacement-heading">
        <h2 id="displacement-heading" className="text-lg">
          Displacement factor
        </h2>
        <p className="mb-3 text-sm text-ink-soft">
          The share of repairs that really spare a purchase, between 0 and 1. It scales every emissions figure on
          Mendery, for every group.
        </p>
        {settings.isPending ? (
          <Spinner label="Loading the setting…" />
        ) : settings.isError ? (
          <Alert tone="error" title="The setting could not be loaded">
            {settings.error.message}
          </Alert>
        ) : (
          <DisplacementForm current={settings.data.displacement} />
        )}
      </section>
    </Card>
  );
}

const DISPLACEMENT_MESSAGE = 'Enter a number between 0 and 1, for example 0.5.';

function DisplacementForm({ current }: { current: number }) {
  const save = useSetImpactSettings();
  const [value, setValue] = useState(() => String(current));
  const [error, setError] = useState<string | undefined>();
  const [saved, setSaved] = useState<number | null>(null);
  const serverField = save.error instanceof ApiError ? save.error.fields?.displacement : undefined;

  const submit = (e: FormEvent) => {
    e.preventDefault();
    setSaved(null);
    const text = value.trim().replace(',', '.');
    const n = Number(text);
    if (text === '' || !Number.isFinite(n) || n < 0 || n > 1) {
      setError(DISPLACEMENT_MESSAGE);
      return;
    }
    setError(undefined);
    save.mutate(n, { onSuccess: (r) => setSaved(r.displacement) });
  };

  return (
    <form onSubmit={submit} noValidate className="flex flex-wrap items-start gap-3">
      <div className="w-full sm:w-48">
        <TextField
          label="Factor (0–1)"
          inputMode="decimal"
          autoComplete="off"
          value={value}
          onChange={(e) => {
            setValue(e.target.value);
            setError(undefined);
            setSaved(null);
          }}
          error={error ?? serverField}
          hint={`Now ${current}.`}
        />
      </div>
      <div className="sm:pt-8">
        <Button type="submit" busy={save.isPending}>
          Save
        </Button>
      </div>
      <div className="w-full" aria-live="polite">
        {saved !== null && <Alert tone="success">Saved. Emissions are now counted with a factor of {saved}.</Alert>}
        {save.isError && !serverField && (
          <Alert tone="error" title="Not saved">
            {save.error.message}
          </Alert>
        )}
      </div>
    </form>
  );
}
