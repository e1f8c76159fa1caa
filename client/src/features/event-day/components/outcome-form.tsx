import { useState } from 'react';
import { BARRIER_CHOICES, OUTCOMES, type Outcome } from '../../../../../shared/event-day/constants';
import { outcomeSchema, type OutcomeInput } from '../../../../../shared/schemas/event-day';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { ApiError } from '../../../lib/api';
import { usePendingOutcomes, useRecordOutcome } from '../api/record-outcome';
import type { ItemView, SafetyCheckRecord } from '../api/types';
import { FIXED_REFUSALS, mayRecordFixed } from '../../../../../shared/safety/may-record-fixed';
import { TILE_FOCUS } from './radio-tile';
import { useT } from '../../../lib/i18n';

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
  const t = useT();
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
      <h2 className="mb-2 text-lg">{onCancel ? t('fixer.outcome.correct') : t('bench.outcome.record')}</h2>
      {pending.some((p) => p.paused) && (
        <div className="mb-3" data-testid="pending-outcome">
          <Alert tone="caution" title={t('bench.outcome.pendingTitle')}>
            {t('bench.outcome.pending')}
          </Alert>
        </div>
      )}
      {pending.length > 0 && !pending.some((p) => p.paused) && (
        <p className="mb-2 text-sm text-ink-soft">{t('bench.outcome.sending')}</p>
      )}
      <div role="radiogroup" aria-label={t('bench.outcome.label')} className="grid grid-cols-2 gap-2">
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
            {t(`fixer.outcomeValue.${o}`)}
          </label>
        ))}
      </div>
      {errors.outcome && <p className="mt-1 text-sm font-semibold text-alert">{t(errors.outcome)}</p>}
      {blocked && (
        <div className="mt-3">
          <Alert tone="caution">
            {!fixed.ok &&
              (fixed.code === FIXED_REFUSALS.checkRequired
                ? t('bench.outcome.needsCheck')
                : t('bench.outcome.checkFailed', { reasons: fixed.fieldMessage }))}
          </Alert>
        </div>
      )}
      <div className="mt-3 space-y-3">
        {outcome === 'end-of-life' && (
          <fieldset aria-describedby={errors.barrier ? 'barrier-error' : undefined}>
            <legend className="mb-1 font-semibold">{t('bench.outcome.why')}</legend>
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
                    <span className="block font-semibold">{t(`fixer.barrier.${b}`)}</span>
                    <span className="block text-sm text-ink-soft">{t(`bench.barrierHint.${b}`)}</span>
                  </span>
                </label>
              ))}
            </div>
            {errors.barrier && (
              <p id="barrier-error" className="mt-1 text-sm font-semibold text-alert">
                {t(errors.barrier)}
              </p>
            )}
          </fieldset>
        )}
        {outcome === 'parts-needed' && (
          <>
            <TextField
              label={t('bench.outcome.which')}
              value={part.description}
              onChange={(e) => setPart((p) => ({ ...p, description: e.target.value }))}
              error={errors['part.description'] && t(errors['part.description'])}
              placeholder={t('bench.outcome.whichPlaceholder')}
            />
            <div className="grid gap-3 sm:grid-cols-2">
              <TextField
                label={t('bench.outcome.link')}
                value={part.link}
                onChange={(e) => setPart((p) => ({ ...p, link: e.target.value }))}
                error={errors['part.link'] && t(errors['part.link'])}
              />
              <TextField
                label={t('bench.outcome.cost', { currency: item.event.currency })}
                inputMode="decimal"
                value={part.cost}
                onChange={(e) => setPart((p) => ({ ...p, cost: e.target.value }))}
                error={errors['part.cost'] && t(errors['part.cost'])}
              />
            </div>
            <p className="text-sm text-ink-soft">{t('bench.outcome.partHint')}</p>
          </>
        )}
        <div className="grid gap-3 sm:grid-cols-2">
          <TextField
            label={t('bench.outcome.minutes')}
            inputMode="numeric"
            value={minutes}
            onChange={(e) => setMinutes(e.target.value)}
            error={errors.minutes && t(errors.minutes)}
          />
        </div>
        <TextAreaField
          label={t('bench.outcome.notes')}
          value={notes}
          onChange={(e) => setNotes(e.target.value)}
          hint={t('bench.outcome.notesHint')}
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
        {t('bench.outcome.save')}
      </Button>
      {onCancel && (
        <Button variant="secondary" className="mt-2 w-full" onClick={onCancel}>
          {t('bench.outcome.cancel')}
        </Button>
      )}
    </Card>
  );
}
