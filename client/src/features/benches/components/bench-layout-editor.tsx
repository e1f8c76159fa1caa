import { useState } from 'react';
import type { Bench } from '../../../../../shared/api/benches';
import { EQUIPMENT, EQUIPMENT_LABELS } from '../../../../../shared/constants';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import { ApiError } from '../../../lib/api';
import { useSaveEventBenches } from '../api/save-event-benches';
import { useSaveVenueBenches } from '../api/save-venue-benches';

/**
 * Edits one session's benches from the saved ones; `onChanged` runs after a save (benches removed free their
 * fixers and items), and the venue's usual layout can be replaced by these rows.
 */
export function BenchLayoutEditor({
  eventId,
  saved,
  venue,
  onChanged,
}: {
  eventId: number;
  saved: Bench[];
  venue: { id: number; name: string } | undefined;
  onChanged?: () => void;
}) {
  const save = useSaveEventBenches(eventId, onChanged);
  const saveVenue = useSaveVenueBenches(venue?.id);
  const [rows, setRows] = useState<Bench[]>(() => copyOf(saved));
  const [savedBefore, setSavedBefore] = useState(saved);
  // The saved layout changed (a save, or a refetch): the form starts again from it.
  if (saved !== savedBefore) {
    setSavedBefore(saved);
    setRows(copyOf(saved));
  }
  const set = (i: number, patch: Partial<Bench>) => {
    save.reset();
    setRows((r) => r.map((b, k) => (k === i ? { ...b, ...patch } : b)));
  };
  const removed = saved.filter((b) => !rows.some((r) => r.id === b.id));
  const fields = save.error instanceof ApiError ? save.error.fields : undefined;
  return (
    <>
      <div className="space-y-3">
        {rows.map((b, i) => (
          <Card key={b.id ?? `new-${i}`} className="grid gap-3 sm:grid-cols-[14rem_6rem_1fr_auto] sm:items-start">
            <label className="text-sm font-semibold">
              Name
              <input
                value={b.name}
                onChange={(e) => set(i, { name: e.target.value })}
                className="mt-1 block w-full rounded border border-ink/20 px-2 py-1.5"
              />
            </label>
            <label className="text-sm font-semibold">
              Seats
              <input
                type="number"
                min={1}
                value={b.seats}
                onChange={(e) => set(i, { seats: Number(e.target.value) })}
                className="mt-1 block w-full rounded border border-ink/20 px-2 py-1.5"
              />
            </label>
            <fieldset>
              <legend className="text-sm font-semibold">Kit</legend>
              <div className="mt-1 flex flex-wrap gap-x-4 gap-y-1">
                {EQUIPMENT.map((e) => (
                  <label key={e} className="flex items-center gap-1.5 text-sm">
                    <input
                      type="checkbox"
                      className="size-4 accent-copper"
                      checked={b.equipment.includes(e)}
                      onChange={(ev) =>
                        set(i, {
                          equipment: ev.target.checked ? [...b.equipment, e] : b.equipment.filter((x) => x !== e),
                        })
                      }
                    />
                    {EQUIPMENT_LABELS[e]}
                  </label>
                ))}
              </div>
            </fieldset>
            <Button
              variant="quiet"
              onClick={() => {
                save.reset();
                setRows((r) => r.filter((_, k) => k !== i));
              }}
            >
              Remove
            </Button>
          </Card>
        ))}
        {rows.length === 0 && (
          <Alert tone="info">No benches yet. Add the tables you will set out, with the kit on each.</Alert>
        )}
      </div>
      {removed.length > 0 && (
        <div className="mt-3">
          <Alert tone="caution">
            Saving removes {removed.map((b) => b.name).join(', ')}; fixers seated there become free to move, and items
            placed there go back to waiting.
          </Alert>
        </div>
      )}
      <div className="mt-4 flex flex-wrap items-center gap-3">
        <Button
          variant="secondary"
          onClick={() => setRows((r) => [...r, { name: `Bench ${r.length + 1}`, seats: 2, equipment: [] }])}
        >
          + Add a bench
        </Button>
        <Button busy={save.isPending} onClick={() => save.mutate(rows)}>
          Save benches
        </Button>
        <Button variant="secondary" busy={saveVenue.isPending} disabled={!venue} onClick={() => saveVenue.mutate(rows)}>
          Make this the venue’s usual layout
        </Button>
        {save.isSuccess && (
          <span role="status" className="font-bold text-sage">
            Saved.
          </span>
        )}
        {saveVenue.isSuccess && (
          <span role="status" className="font-bold text-sage">
            Later sessions at {venue?.name} start with these benches.
          </span>
        )}
      </div>
      {save.error && (
        <div className="mt-3">
          <Alert tone="error">{fields ? Object.values(fields).join(' ') : save.error.message}</Alert>
        </div>
      )}
      {saveVenue.error && (
        <div className="mt-3">
          <Alert tone="error">{saveVenue.error.message}</Alert>
        </div>
      )}
    </>
  );
}

const copyOf = (benches: Bench[]) => benches.map(({ id, name, seats, equipment }) => ({ id, name, seats, equipment }));
