import { useState } from 'react';
import { Link, useParams } from 'react-router';
import { EQUIPMENT_LABELS, SKILL_LABELS, type Equipment, type Skill } from '../../../../shared/constants';
import { formatDay, formatTime } from '../../../../shared/format';
import { EventTabs } from '../../components/layouts/event-tabs';
import { Button } from '../../components/ui/button';
import { Alert, Spinner } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import type { Board, BoardItem } from '../../../../shared/api/triage';
import { useBoard } from '../../features/triage/api/get-board';
import { useLockItem } from '../../features/triage/api/lock-item';
import { usePlaceItem } from '../../features/triage/api/place-item';
import { useRunTriage } from '../../features/triage/api/run-triage';
import { triageRunUrl } from '../../features/triage/api/triage-run-url';
import { useUnplaceItem } from '../../features/triage/api/unplace-item';

const REASON_LABEL: Record<string, string> = {
  'no-skill': 'No fixer with the skill',
  'no-equipment': 'No bench with the kit',
  'no-pair': 'Skill and kit never meet',
  capacity: 'Waiting for a free place',
};

/** Columns per bench, each with its fixers' item cards; one column of items still waiting, with the reason. */
export function TriageBoardPage() {
  const id = Number(useParams().eventId);
  const board = useBoard(id);
  const runTriage = useRunTriage(id);
  const [slotId, setSlotId] = useState('');
  const [notice, setNotice] = useState<string | null>(null);
  if (board.isPending) return <Spinner label="Loading the board…" />;
  if (board.error) return <Alert tone="error">{board.error.message}</Alert>;
  const b = board.data;
  const tz = b.event.timeZone;
  const waiting = b.items.filter((i) => !i.placement);
  const run = () =>
    runTriage.mutate(slotId ? Number(slotId) : undefined, {
      onSuccess: (r) =>
        setNotice(
          `Placed ${r.assigned} item${r.assigned === 1 ? '' : 's'}; ${r.unassigned} wait${r.unassigned === 1 ? 's' : ''}.`,
        ),
    });

  return (
    <div>
      <Link to={paths.groupEvents(b.event.groupId)} className="text-sm font-bold text-navy underline">
        ← {b.event.groupName}: all sessions
      </Link>
      <h1 className="mt-2 text-2xl sm:text-3xl">{b.event.title}</h1>
      <p className="mb-3 font-bold text-copper-dark">{formatDay(b.event.startsAt, tz)}</p>
      <EventTabs eventId={id} />

      <div className="mb-4 flex flex-wrap items-end gap-3 rounded-xl bg-white p-4 ring-1 ring-ink/5">
        <label className="text-sm font-semibold">
          Round
          <select
            value={slotId}
            onChange={(e) => setSlotId(e.target.value)}
            className="mt-1 block rounded-lg border border-ink/20 px-3 py-2"
          >
            <option value="">The whole session</option>
            {b.slots.map((s) => (
              <option key={s.id} value={s.id}>
                Slot {formatTime(s.startsAt, tz)}
              </option>
            ))}
          </select>
        </label>
        <Button onClick={run} busy={runTriage.isPending}>
          Run triage
        </Button>
        <p className="text-sm text-ink-soft">
          {b.fixers.length} fixers coming · {b.benches.length} benches · {b.items.length} items · locked cards stay
          where they are
        </p>
        {notice && (
          <p role="status" className="w-full text-sm font-bold text-sage">
            {notice}
          </p>
        )}
        {runTriage.error && (
          <div className="w-full">
            <Alert tone="error">{runTriage.error.message}</Alert>
          </div>
        )}
      </div>
      {b.benches.length === 0 && (
        <Alert tone="caution" title="No benches set out">
          Add benches for this session under “Benches” before running triage.
        </Alert>
      )}
      {b.fixers.length === 0 && (
        <Alert tone="caution" title="No fixer has said they are coming">
          Fixers say so on their own page; see the rota.
        </Alert>
      )}

      <div className="flex gap-4 overflow-x-auto pb-4">
        <Column title="Waiting" subtitle={`${waiting.length} item${waiting.length === 1 ? '' : 's'}`} tone="wait">
          {waiting.length === 0 ? (
            <p className="text-sm text-ink-soft">Every item has a place.</p>
          ) : (
            waiting.map((i) => <ItemCard key={i.id} item={i} board={b} eventId={id} />)
          )}
        </Column>
        {b.benches.map((bench) => {
          const here = b.items.filter((i) => i.placement?.benchId === bench.id);
          return (
            <Column
              key={bench.id}
              title={bench.name}
              subtitle={`${bench.seats} seat${bench.seats === 1 ? '' : 's'} · ${here.length} item${here.length === 1 ? '' : 's'} over the day · ${bench.equipment.map((e) => EQUIPMENT_LABELS[e as Equipment]).join(', ') || 'no kit'}`}
            >
              {b.fixers
                .filter((f) => here.some((i) => i.placement!.userId === f.userId))
                .map((f) => (
                  <div key={f.userId} className="space-y-2">
                    <p className="text-sm font-extrabold text-navy">
                      {f.name}
                      {f.benchId === bench.id ? ' · seated here' : ''}
                    </p>
                    {here
                      .filter((i) => i.placement!.userId === f.userId)
                      .map((i) => (
                        <ItemCard key={i.id} item={i} board={b} eventId={id} />
                      ))}
                  </div>
                ))}
              {here.length === 0 && <p className="text-sm text-ink-soft">Free.</p>}
            </Column>
          );
        })}
      </div>

      {b.runs.length > 0 && (
        <details className="mt-4 rounded-xl bg-white p-4 ring-1 ring-ink/5">
          <summary className="cursor-pointer font-bold text-navy">Earlier runs ({b.runs.length})</summary>
          <ul className="mt-2 text-sm">
            {b.runs.map((r) => (
              <li key={r.id}>
                {new Date(r.createdAt).toLocaleString('en-GB', { timeZone: tz })}: {r.assigned} placed, {r.unassigned}{' '}
                waiting, {r.lockedKept} locked kept
                {r.slotId
                  ? ` (slot ${formatTime(b.slots.find((s) => s.id === r.slotId)?.startsAt ?? '', tz)})`
                  : ''} ·{' '}
                <a className="underline" href={triageRunUrl(id, r.id)} target="_blank" rel="noreferrer">
                  inputs and result
                </a>
              </li>
            ))}
          </ul>
        </details>
      )}
    </div>
  );
}

function Column({
  title,
  subtitle,
  tone,
  children,
}: {
  title: string;
  subtitle: string;
  tone?: 'wait';
  children: React.ReactNode;
}) {
  return (
    <section
      aria-label={title}
      className={`w-72 shrink-0 space-y-3 rounded-xl p-3 ${tone === 'wait' ? 'bg-copper-light/50' : 'bg-navy/5'}`}
    >
      <header>
        <h2 className="text-base">{title}</h2>
        <p className="text-xs text-ink-soft">{subtitle}</p>
      </header>
      {children}
    </section>
  );
}

function ItemCard({ item, board, eventId }: { item: BoardItem; board: Board; eventId: number }) {
  const place = usePlaceItem(eventId, item.id);
  const lock = useLockItem(eventId, item.id);
  const unplace = useUnplaceItem(eventId, item.id);
  const error = place.error ?? lock.error ?? unplace.error;
  const [moving, setMoving] = useState(false);
  const [to, setTo] = useState({
    userId: item.placement?.userId ?? board.fixers[0]?.userId ?? 0,
    benchId: item.placement?.benchId ?? board.benches[0]?.id ?? 0,
  });
  const tz = board.event.timeZone;
  const slot = board.slots.find((s) => s.id === item.slotId);
  return (
    <article
      className={`rounded-lg bg-white p-3 text-sm shadow-sm ring-1 ${item.warnings.length ? 'ring-alert' : item.placement?.locked ? 'ring-navy' : 'ring-ink/10'}`}
    >
      <div className="flex items-start justify-between gap-2">
        <p className="font-bold">
          {item.categoryName}
          {item.brand || item.model ? ` — ${[item.brand, item.model].filter(Boolean).join(' ')}` : ''}
        </p>
        {item.placement?.locked && (
          <span className="rounded bg-navy px-1.5 text-xs font-bold text-white" title="Locked: a re-run keeps it here">
            locked
          </span>
        )}
      </div>
      <p className="text-ink-soft">{item.fault}</p>
      <p className="mt-1 text-xs">
        {item.reference} · booked for {slot ? formatTime(slot.startsAt, tz) : '—'} · about {item.minutes} min
        {item.placement && item.estimatedStart && <> · starts ≈ {formatTime(item.estimatedStart, tz)}</>}
      </p>
      <p className="text-xs text-ink-soft">
        Needs {SKILL_LABELS[item.needs.skill as Skill] ?? item.needs.skill} level {item.needs.minLevel}
        {item.needs.equipment.length
          ? `, ${item.needs.equipment.map((e) => EQUIPMENT_LABELS[e as Equipment]).join(', ')}`
          : ''}
        {item.mains ? ' · mains' : ''}
      </p>
      {item.reason && (
        <p className="mt-1 rounded bg-copper-light px-2 py-1 text-xs">
          <span className="font-bold">{REASON_LABEL[item.reason.reason]}:</span> {item.reason.detail}
        </p>
      )}
      {item.warnings.map((w) => (
        <p key={w.code} className="mt-1 text-xs font-semibold text-alert">
          ⚠ {w.message}
        </p>
      ))}
      {moving ? (
        <div className="mt-2 space-y-2" onKeyDown={(e) => e.key === 'Escape' && setMoving(false)}>
          <select
            autoFocus
            aria-label="Fixer"
            value={to.userId}
            onChange={(e) => setTo({ ...to, userId: Number(e.target.value) })}
            className="block w-full rounded border border-ink/20 px-2 py-1"
          >
            {board.fixers.map((f) => (
              <option key={f.userId} value={f.userId}>
                {f.name} ({SKILL_LABELS[item.needs.skill as Skill] ?? item.needs.skill}{' '}
                {f.skills[item.needs.skill] ?? 0})
              </option>
            ))}
          </select>
          <select
            aria-label="Bench"
            value={to.benchId}
            onChange={(e) => setTo({ ...to, benchId: Number(e.target.value) })}
            className="block w-full rounded border border-ink/20 px-2 py-1"
          >
            {board.benches.map((b) => (
              <option key={b.id} value={b.id}>
                {b.name}
              </option>
            ))}
          </select>
          <div className="flex gap-2">
            <Button
              className="min-h-9 px-3 py-1"
              busy={place.isPending}
              onClick={() => place.mutate({ ...to, locked: true }, { onSuccess: () => setMoving(false) })}
            >
              Place and lock
            </Button>
            <Button variant="quiet" className="min-h-9 px-3 py-1" onClick={() => setMoving(false)}>
              Cancel
            </Button>
          </div>
        </div>
      ) : (
        <div className="mt-2 flex flex-wrap gap-1">
          <Button
            variant="secondary"
            className="min-h-9 px-3 py-1 text-sm"
            disabled={!board.fixers.length || !board.benches.length}
            onClick={() => setMoving(true)}
          >
            Move…
          </Button>
          {item.placement && (
            <Button
              variant="quiet"
              className="min-h-9 px-3 py-1 text-sm"
              busy={lock.isPending}
              onClick={() => lock.mutate(!item.placement!.locked)}
            >
              {item.placement.locked ? 'Unlock' : 'Lock'}
            </Button>
          )}
          {item.placement && (
            <Button variant="quiet" className="min-h-9 px-3 py-1 text-sm" onClick={() => unplace.mutate()}>
              Take off
            </Button>
          )}
        </div>
      )}
      {error && <p className="mt-1 text-xs font-semibold text-alert">{error.message}</p>}
    </article>
  );
}
