import { useEffect, useRef, useState } from 'react';
import type { Board } from '../api/types';
import { BoardColumn } from './board-column';
import { BoardItemCard } from './board-item-card';
import { useT } from '../../../lib/i18n';

/** Whether the element is wider than its box, kept up to date as the window or the board changes size. */
function useOverflows() {
  const ref = useRef<HTMLDivElement>(null);
  const [overflows, setOverflows] = useState(false);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const check = () => setOverflows(el.scrollWidth > el.clientWidth + 1);
    check();
    const seen = new ResizeObserver(check);
    seen.observe(el);
    for (const child of el.children) seen.observe(child);
    return () => seen.disconnect();
  });
  return { ref, overflows };
}

/**
 * The waiting items first, then one column per bench with each fixer's cards. When the columns are wider than the
 * screen the board scrolls inside its own box, says so above it, and takes the focus so arrow keys scroll it.
 */
export function BenchColumns({ board }: { board: Board }) {
  const t = useT();
  const eventId = board.event.id;
  const waiting = board.items.filter((i) => !i.placement);
  const { ref, overflows } = useOverflows();
  const columns = board.benches.length + 1;
  return (
    <>
      {overflows && (
        <p id="board-scroll-hint" className="mb-2 text-sm font-semibold text-navy">
          <span aria-hidden>⇆ </span>
          {t('organise.triage.columns.scrollHint', { columns })}
        </p>
      )}
      <div
        ref={ref}
        role="region"
        aria-label={t('organise.triage.columns.region')}
        aria-describedby={overflows ? 'board-scroll-hint' : undefined}
        tabIndex={overflows ? 0 : undefined}
        className="flex gap-4 overflow-x-auto rounded-xl pb-4"
      >
        <BoardColumn
          title={t('organise.triage.columns.waiting')}
          subtitle={t('organise.triage.columns.items', { n: waiting.length })}
          tone="wait"
        >
          {waiting.length === 0 ? (
            <p className="text-sm text-ink-soft">{t('organise.triage.columns.allPlaced')}</p>
          ) : (
            waiting.map((i) => <BoardItemCard key={i.id} item={i} board={board} eventId={eventId} />)
          )}
        </BoardColumn>
        {board.benches.map((bench) => {
          const here = board.items.filter((i) => i.placement?.benchId === bench.id);
          const kit =
            bench.equipment.map((e) => t(`organise.equipment.${e}`)).join(', ') || t('organise.triage.columns.noKit');
          return (
            <BoardColumn
              key={bench.id}
              title={bench.name}
              subtitle={t('organise.triage.columns.benchSubtitle', { seats: bench.seats, n: here.length, kit })}
            >
              {board.fixers
                .filter((f) => here.some((i) => i.placement!.userId === f.userId))
                .map((f) => (
                  <div key={f.userId} className="space-y-2">
                    <p className="text-sm font-extrabold text-navy">
                      {f.name}
                      {f.benchId === bench.id ? ` · ${t('organise.triage.columns.seatedHere')}` : ''}
                    </p>
                    {here
                      .filter((i) => i.placement!.userId === f.userId)
                      .map((i) => (
                        <BoardItemCard key={i.id} item={i} board={board} eventId={eventId} />
                      ))}
                  </div>
                ))}
              {here.length === 0 && <p className="text-sm text-ink-soft">{t('organise.triage.columns.free')}</p>}
            </BoardColumn>
          );
        })}
      </div>
    </>
  );
}
