import { useState } from 'react';
import {
  BARRIER_CHOICES,
  BARRIER_HINTS,
  BARRIER_LABELS,
  OUTCOMES,
  OUTCOME_LABELS,
  type Outcome,
} from '../../../../../shared/event-day/constants';
import { outcomeSchema, type OutcomeInput } from '../../../../../shared/schemas/event-day';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { ApiError } from '../../../lib/api';
import { usePendingOutcomes, useRecordOutcome } from '../api/record-outcome';
import type { ItemView, SafetyCheckRecord } from '../api/types';
import { mayRecordFixed } from '../../../../../shared/safety/may-record-fixed';
import { TILE_FOCUS } from './radio-tile';

/**
 * The schema's messages by field path. Its cross-field rules (barrier, part) run only once the fields parse, so
 * the fields that failed are left out and the rest parsed again: every message shows in one round.
 */
function outcomeIssues(body: OutcomeInput): Record<string, string> {
  const first = outcomeSchema.safeParse(body);
  if (first.success) return {};
  const failed = new Set(first.error.issues.map((i) => String(i.path[0])));
  const rest = Object.fromEntries(Object.entries(body).filter(([k]) => !failed.has(k))) as OutcomeInput;
  const issues = [...first.error.issues, ...(outcomeSchema.safeParse(rest).error?.issues ?? [])];
  const byPath: Record<string, string> = {};
  for (const i of issues) byPath[i.path.join('.')] ??= i.message;
  return byPath;
}

/** The outcome, sent through the persisted mutation so it survives a dropped connection. */
export function OutcomeForm({
  item,
  latestCheck,
  onCancel,
}: {
  item: ItemView;
  latestCheck: SafetyCheckRecord | undefined;
  onCancel?: () => void;
}) {
  const [outcome, setOutcome] = useState<Outcome | null>(item.outcome?.outcome ?? null);
  const [barrier, setBarrier] = useState(item.outcome?.barrier ?? '');
  const [part, setPart] = useState({
    description: item.outcome?.partDescription ?? '',
    link: item.outcome?.partLink ?? '',
    cost: item.outcome?.partCost?.toString() ?? '',
  });
  const [minutes, setMinutes] = useState(item.outcome?.minutes?.toString() ?? '');
  const [notes, setNotes] = useState(item.outcome?.notes ?? '');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const save = useRecordOutcome();
  const pending = usePendingOutcomes(item.id);
  // The server's own rule (shared/safety): a mains item goes home as fixed only after a passing check.
  const fixed = mayRecordFixed(item, latestCheck);
  const blocked = outcome === 'fixed' && !fixed.ok;
  const serverError = save.error instanceof ApiError ? save.error : null;

  const submit = () => {
    const body: OutcomeInput = {
      outcome: outcome ?? (undefined as never),
      barrier: outcome === 'end-of-life' ? ((barrier || undefined) as OutcomeInput['barrier']) : undefined,
      part:
        outcome === 'parts-needed'
          ? {
              description: part.description,
              link: part.link || undefined,
              cost: part.cost.replace(',', '.') || undefined,
            }
          : undefined,
      minutes: minutes || undefined,
      notes: notes || undefined,
    };
    const issues = outcomeIssues(body);
    if (Object.keys(issues).length) {
      setErrors(issues);
      return;
    }
    setErrors({});
    save.mutate({ itemId: item.id, body });
  };

  return (
    <Card>
      <h2 className="mb-2 text-lg">{onCancel ? 'Correct the outcome' : 'Record the outcome'}</h2>
      {pending.some((p) => p.paused) && (
        <div className="mb-3" data-testid="pending-outcome">
          <Alert tone="caution" title="Saved on this phone — not sent yet">
            No connection. The outcome will be sent by itself when the network is back; keep this page or come back to
            it later.
          </Alert>
        </div>
      )}
      {pending.length > 0 && !pending.some((p) => p.paused) && <p className="mb-2 text-sm text-ink-soft">Sending…</p>}
      <div role="radiogroup" aria-label="Outcome" className="grid grid-cols-2 gap-2">
        {OUTCOMES.map((o) => (
          <label
            key={o}
            className={`flex min-h-14 cursor-pointer items-center justify-center rounded-lg px-2 text-center font-bold ring-1 ${TILE_FOCUS} ${outcome === o ? 'bg-navy text-white ring-navy' : 'bg-white ring-ink/20'}`}
          >
            <input
              type="radio"
              name="outcome"
              className="sr-only"
              checked={outcome === o}
              onChange={() => setOutcome(o)}
            />
            {OUTCOME_LABELS[o]}
          </label>
        ))}
      </div>
      {errors.outcome && <p className="mt-1 text-sm font-semibold text-alert">{errors.outcome}</p>}
      {blocked && (
        <div className="mt-3">
          <Alert tone="caution">{!fixed.ok && fixed.message}</Alert>
        </div>
      )}
      <div className="mt-3 space-y-3">
        {outcome === 'end-of-life' && (
          <fieldset aria-describedby={errors.barrier ? 'barrier-error' : undefined}>
            <legend className="mb-1 font-semibold">Why can’t it be mended?</legend>
            <div className="space-y-1.5">
              {BARRIER_CHOICES.map((b) => (
                <label
                  key={b}
                  className={`flex min-h-11 cursor-pointer items-start gap-2 rounded-lg px-3 py-2 ring-1 ${TILE_FOCUS} ${barrier === b ? 'bg-navy/10 ring-navy' : 'bg-white ring-ink/20'}`}
                >
                  <input
                    type="radio"
                    name="barrier"
                    className="mt-1 size-4 shrink-0 accent-navy"
                    checked={barrier === b}
                    onChange={() => {
                      setBarrier(b);
                      setErrors(({ barrier: _, ...rest }) => rest);
                    }}
                  />
                  <span>
                    <span className="block font-semibold">{BARRIER_LABELS[b]}</span>
                    <span className="block text-sm text-ink-soft">{BARRIER_HINTS[b]}</span>
                  </span>
                </label>
              ))}
            </div>
            {errors.barrier && (
              <p id="barrier-error" className="mt-1 text-sm font-semibold text-alert">
                {errors.barrier}
              </p>
            )}
          </fieldset>
        )}
        {outcome === 'parts-needed' && (
          <>
            <TextField
              label="Which part"
              value={part.description}
              onChange={(e) => setPart((p) => ({ ...p, description: e.target.value }))}
              error={errors['part.description']}
              placeholder="e.g. thermostat 13 A, part no. on the old one"
            />
            <div className="grid gap-3 sm:grid-cols-2">
              <TextField
                label="Supplier link or part number (optional)"
                value={part.link}
                onChange={(e) => setPart((p) => ({ ...p, link: e.target.value }))}
              />
              <TextField
                label={`Estimated cost in ${item.event.currency} (optional)`}
                inputMode="decimal"
                value={part.cost}
                onChange={(e) => setPart((p) => ({ ...p, cost: e.target.value }))}
                error={errors['part.cost']}
              />
            </div>
            <p className="text-sm text-ink-soft">
              The visitor orders the part and comes back to a later session. Look in the salvage stock below first: a
              saved part may do.
            </p>
          </>
        )}
        <div className="grid gap-3 sm:grid-cols-2">
          <TextField
            label="Time spent (minutes)"
            inputMode="numeric"
            value={minutes}
            onChange={(e) => setMinutes(e.target.value)}
            error={errors.minutes}
          />
        </div>
        <TextAreaField
          label="Notes for the next fixer (optional)"
          value={notes}
          onChange={(e) => setNotes(e.target.value)}
          hint="What you measured, the faulty part, the fix."
        />
      </div>
      {serverError && (
        <div className="mt-3">
          <Alert tone="error">{serverError.message}</Alert>
        </div>
      )}
      <Button
        className="mt-3 w-full text-lg"
        onClick={submit}
        busy={save.isPending && !save.isPaused}
        disabled={blocked}
      >
        Save outcome
      </Button>
      {onCancel && (
        <Button variant="secondary" className="mt-2 w-full" onClick={onCancel}>
          Cancel
        </Button>
      )}
    </Card>
  );
}
