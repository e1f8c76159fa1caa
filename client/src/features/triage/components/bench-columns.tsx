import type { Board } from '../api/types';
import { EQUIPMENT_LABELS, type Equipment } from '../../../../../shared/constants';
import { BoardColumn } from './board-column';
import { BoardItemCard } from './board-item-card';

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** The waiting items first, then one column per bench with each fixer's cards. */
export function BenchColumns({ board }: { board: Board }) {
  const eventId = board.event.id;
  const waiting = board.items.filter((i) => !i.placement);
  return (
    <div className="flex gap-4 overflow-x-auto pb-4">
      <BoardColumn title="Waiting" subtitle={plural(waiting.length, 'item')} tone="wait">
        {waiting.length === 0 ? (
          <p className="text-sm text-ink-soft">Every item has a place.</p>
        ) : (
          waiting.map((i) => <BoardItemCard key={i.id} item={i} board={board} eventId={eventId} />)
        )}
      </BoardColumn>
      {board.benches.map((bench) => {
        const here = board.items.filter((i) => i.placement?.benchId === bench.id);
        const kit = bench.equipment.map((e) => EQUIPMENT_LABELS[e as Equipment]).join(', ') || 'no kit';
        return (
          <BoardColumn
            key={bench.id}
            title={bench.name}
            subtitle={`${plural(bench.seats, 'seat')} · ${plural(here.length, 'item')} over the day · ${kit}`}
          >
            {board.fixers
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
                      <BoardItemCard key={i.id} item={i} board={board} eventId={eventId} />
                    ))}
                </div>
              ))}
            {here.length === 0 && <p className="text-sm text-ink-soft">Free.</p>}
          </BoardColumn>
        );
      })}
    </div>
  );
}
