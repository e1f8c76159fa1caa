import { useState } from 'react';
import type { Bench } from '../../../../../shared/api/benches';
import { EQUIPMENT } from '../../../../../shared/constants';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import { ApiError } from '../../../lib/api';
import { useSaveEventBenches } from '../api/save-event-benches';
import { useSaveVenueBenches } from '../api/save-venue-benches';
import { tr, useT } from '../../../lib/i18n';

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
  const t = useT();
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
              {t('organise.benches.name')}
              <input
                value={b.name}
                onChange={(e) => set(i, { name: e.target.value })}
                className="mt-1 block w-full rounded border border-ink/20 px-2 py-1.5"
              />
            </label>
            <label className="text-sm font-semibold">
              {t('organise.benches.seats')}
              <input
                type="number"
                min={1}
                value={b.seats}
                onChange={(e) => set(i, { seats: Number(e.target.value) })}
                className="mt-1 block w-full rounded border border-ink/20 px-2 py-1.5"
              />
            </label>
            <fieldset>
              <legend className="text-sm font-semibold">{t('organise.benches.kit')}</legend>
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
                    {t(`organise.equipment.${e}`)}
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
              {t('organise.benches.remove')}
            </Button>
          </Card>
        ))}
        {rows.length === 0 && <Alert tone="info">{t('organise.benches.none')}</Alert>}
      </div>
      {removed.length > 0 && (
        <div className="mt-3">
          <Alert tone="caution">
            {t('organise.benches.removing', { names: removed.map((b) => b.name).join(', ') })}
          </Alert>
        </div>
      )}
      <div className="mt-4 flex flex-wrap items-center gap-3">
        <Button
          variant="secondary"
          onClick={() =>
            setRows((r) => [
              ...r,
              { name: t('organise.benches.newName', { n: r.length + 1 }), seats: 2, equipment: [] },
            ])
          }
        >
          + {t('organise.benches.add')}
        </Button>
        <Button busy={save.isPending} onClick={() => save.mutate(rows)}>
          {t('organise.benches.save')}
        </Button>
        <Button variant="secondary" busy={saveVenue.isPending} disabled={!venue} onClick={() => saveVenue.mutate(rows)}>
          {t('organise.benches.makeUsual')}
        </Button>
        {save.isSuccess && (
          <span role="status" className="font-bold text-sage">
            {t('organise.manage.saved')}
          </span>
        )}
        {saveVenue.isSuccess && (
          <span role="status" className="font-bold text-sage">
            {t('organise.benches.usualSaved', { venue: venue?.name ?? '' })}
          </span>
        )}
      </div>
      {save.error && (
        <div className="mt-3">
          <Alert tone="error">
            {fields
              ? Object.values(fields)
                  .map((m) => tr(m))
                  .join(' ')
              : tr(save.error.message)}
          </Alert>
        </div>
      )}
      {saveVenue.error && (
        <div className="mt-3">
          <Alert tone="error">{tr(saveVenue.error.message)}</Alert>
        </div>
      )}
    </>
  );
}

const copyOf = (benches: Bench[]) => benches.map(({ id, name, seats, equipment }) => ({ id, name, seats, equipment }));
