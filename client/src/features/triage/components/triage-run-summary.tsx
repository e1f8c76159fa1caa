import type { ReactNode } from 'react';
import { formatTime, formatTimeRange } from '../../../../../shared/format';
import { Card } from '../../../components/ui/feedback';
import type { TriageRunDetail } from '../api/types';

type Summary = NonNullable<TriageRunDetail['summary']>;
const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** A captioned table with a header row; cells are given row by row. */
function Table({ caption, head, rows }: { caption: string; head: string[]; rows: ReactNode[][] }) {
  return (
    <div className="overflow-x-auto rounded-xl bg-white ring-1 ring-ink/5">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-navy/5 text-navy">
          <tr>
            {head.map((h) => (
              <th key={h} scope="col" className="px-3 py-2">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((cells, i) => (
            <tr key={i} className="border-t border-ink/5 align-top">
              {cells.map((c, j) =>
                j === 0 ? (
                  <th key={j} scope="row" className="px-3 py-2 font-semibold">
                    {c}
                  </th>
                ) : (
                  <td key={j} className="px-3 py-2">
                    {c}
                  </td>
                ),
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** What went into a run (items, fixers, benches, the rules it kept) and what came out, in sentences and tables. */
export function TriageRunSummary({ summary: s, timeZone: tz }: { summary: Summary; timeZone: string }) {
  const day = s.scope === 'day';
  return (
    <div className="space-y-6">
      <section aria-labelledby="run-result" className="space-y-3">
        <h2 id="run-result" className="text-xl">
          What came out
        </h2>
        <p>
          {s.placed.length === 0
            ? 'No item was placed.'
            : `${plural(s.placed.length, 'item')} placed with a fixer at a bench.`}{' '}
          {s.waiting.length === 0
            ? 'None was left waiting.'
            : `${plural(s.waiting.length, 'item')} left waiting; the reason is given for each.`}
        </p>
        {s.placed.length > 0 && (
          <Table
            caption="Who takes which item, and where"
            head={['Item', 'Fixer', 'Bench']}
            rows={s.placed.map((p) => [p.item, p.fixer, p.bench])}
          />
        )}
        {s.waiting.length > 0 && (
          <>
            <h3 className="text-base">Left waiting</h3>
            <Table
              caption="Items left waiting, and why"
              head={['Item', 'Why it waits']}
              rows={s.waiting.map((w) => [
                w.item,
                <>
                  <span className="font-bold">{w.reason}.</span> {w.detail}
                </>,
              ])}
            />
          </>
        )}
      </section>

      <section aria-labelledby="run-input" className="space-y-3">
        <h2 id="run-input" className="text-xl">
          What went in
        </h2>
        <p>
          {plural(s.items.length, 'item')}, {plural(s.fixers.length, 'fixer')} and{' '}
          {plural(s.benches.length, 'bench', 'benches')}.
        </p>
        <Card className="p-4">
          <h3 className="text-base">Rules the run kept</h3>
          <ul className="mt-1 list-disc space-y-1 pl-5 text-sm">
            {s.rules.map((r) => (
              <li key={r}>{r}</li>
            ))}
          </ul>
        </Card>
        <h3 className="text-base">Items</h3>
        <Table
          caption="Items the run had to place"
          head={day ? ['Item', 'Booked for', 'Needs', 'Bench kit'] : ['Item', 'Needs', 'Bench kit']}
          rows={s.items.map((i) => [
            i.label,
            ...(day ? [i.slotStartsAt ? formatTime(i.slotStartsAt, tz) : '—'] : []),
            i.needs,
            i.kit || 'none',
          ])}
        />
        <h3 className="text-base">Fixers</h3>
        <Table
          caption="Fixers the run could use"
          head={day ? ['Fixer', 'Skills', 'Hours', 'Seat'] : ['Fixer', 'Skills', 'Seat']}
          rows={s.fixers.map((f) => [
            f.name,
            f.skills,
            ...(day ? [f.from && f.to ? formatTimeRange(f.from, f.to, tz) : '—'] : []),
            f.seat ?? 'any bench',
          ])}
        />
        <h3 className="text-base">Benches</h3>
        <Table
          caption="Benches the run could use"
          head={['Bench', 'Seats', 'Kit']}
          rows={s.benches.map((b) => [b.name, b.seats, b.kit || 'none'])}
        />
      </section>
    </div>
  );
}
