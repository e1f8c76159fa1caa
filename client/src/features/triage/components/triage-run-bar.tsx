import { useState } from 'react';
import type { Board } from '../api/types';
import { formatTime } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { Alert } from '../../../components/ui/feedback';
import { useRunTriage } from '../api/run-triage';
import { useLanguage, useT } from '../../../lib/i18n';

/** Runs the engine on the whole session or one slot's round, and says how many items it placed. */
export function TriageRunBar({ board }: { board: Board }) {
  const t = useT();
  const lang = useLanguage();
  const runTriage = useRunTriage(board.event.id);
  const [slotId, setSlotId] = useState('');
  const [notice, setNotice] = useState<string | null>(null);
  const tz = board.event.timeZone;
  const run = () =>
    runTriage.mutate(slotId ? Number(slotId) : undefined, {
      onSuccess: (r) => setNotice(t('organise.triage.bar.placed', { assigned: r.assigned, unassigned: r.unassigned })),
    });
  return (
    <div className="mb-4 flex flex-wrap items-end gap-3 rounded-xl bg-white p-4 ring-1 ring-ink/5">
      <label className="text-sm font-semibold">
        {t('organise.triage.bar.round')}
        <select
          value={slotId}
          onChange={(e) => setSlotId(e.target.value)}
          className="mt-1 block rounded-lg border border-ink/20 px-3 py-2"
        >
          <option value="">{t('organise.triage.bar.wholeSession')}</option>
          {board.slots.map((s) => (
            <option key={s.id} value={s.id}>
              {t('organise.triage.bar.slot', { time: formatTime(s.startsAt, tz, lang) })}
            </option>
          ))}
        </select>
      </label>
      <Button onClick={run} busy={runTriage.isPending}>
        {t('organise.triage.bar.run')}
      </Button>
      <p className="text-sm text-ink-soft">
        {t('organise.triage.bar.counts', {
          fixers: board.fixers.length,
          benches: board.benches.length,
          items: board.items.length,
        })}
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
  );
}
