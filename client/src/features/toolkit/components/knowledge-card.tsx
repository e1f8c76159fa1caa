import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Alert } from '../../../components/ui/feedback';
import { TextAreaField, TextField } from '../../../components/ui/field';
import type { KnowledgeEntry } from '../api/types';
import { useWriteUp } from '../api/write-up';
import { useLanguage, useT } from '../../../lib/i18n';

/**
 * One repair note: the fault and the fixer's notes, and the fix once a fixer has added it (symptom, what was measured,
 * the faulty part, the fix) for the next fixer.
 */
export function KnowledgeCard({
  entry: e,
  when,
  canWrite = true,
}: {
  entry: KnowledgeEntry;
  when: string;
  canWrite?: boolean;
}) {
  const t = useT();
  const lang = useLanguage();
  const [writing, setWriting] = useState(false);
  return (
    <article className="rounded-xl bg-white p-4 shadow-sm ring-1 ring-ink/5" data-testid="knowledge-entry">
      <header className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <h3 className="text-lg">
          {e.categoryName}
          {(e.brand || e.model) && (
            <span className="font-semibold text-ink-soft"> — {[e.brand, e.model].filter(Boolean).join(' ')}</span>
          )}
        </h3>
        <span className="rounded-full bg-navy/10 px-2 py-0.5 text-xs font-bold text-navy">
          {t(`fixer.outcomeValue.${e.outcome}`)}
        </span>
        {e.writtenUp && (
          <span className="rounded-full bg-sage-light px-2 py-0.5 text-xs font-bold">
            {t('bench.tool.note.fixAdded')}
          </span>
        )}
        <span className="ml-auto text-xs text-ink-soft">
          {e.groupName} · {when}
        </span>
      </header>
      <dl className="mt-2 grid gap-1 text-sm sm:grid-cols-[8rem_1fr]">
        <dt className="font-bold text-ink-soft">{t('bench.tool.note.symptom')}</dt>
        <dd>{e.symptom}</dd>
        {e.measured && (
          <>
            <dt className="font-bold text-ink-soft">{t('bench.tool.note.measured')}</dt>
            <dd>{e.measured}</dd>
          </>
        )}
        {e.faultyPart && (
          <>
            <dt className="font-bold text-ink-soft">{t('bench.tool.note.faultyPart')}</dt>
            <dd>{e.faultyPart}</dd>
          </>
        )}
        {e.fix && (
          <>
            <dt className="font-bold text-ink-soft">{t('bench.tool.note.fix')}</dt>
            <dd>{e.fix}</dd>
          </>
        )}
        {e.notes && (
          <>
            <dt className="font-bold text-ink-soft">{t('bench.tool.note.notes')}</dt>
            <dd className="whitespace-pre-line">{e.notes}</dd>
          </>
        )}
      </dl>
      {e.photoIds.length > 0 && (
        <div className="mt-2 flex flex-wrap gap-2">
          {e.photoIds.map((id) => (
            <a key={id} href={`/api/photos/${id}`} target="_blank" rel="noreferrer">
              <img
                src={`/api/photos/${id}`}
                alt={t('bench.tool.note.photo', {
                  kind: lang === 'de' ? e.categoryName : e.categoryName.toLowerCase(),
                })}
                className="size-20 rounded-lg object-cover"
                loading="lazy"
              />
            </a>
          ))}
        </div>
      )}
      {canWrite && !writing && (
        <Button variant="quiet" className="mt-1" onClick={() => setWriting(true)}>
          {t(e.writtenUp ? 'bench.tool.note.edit' : 'bench.tool.note.add')}
        </Button>
      )}
      {writing && <WriteUpForm entry={e} onDone={() => setWriting(false)} />}
    </article>
  );
}

function WriteUpForm({ entry, onDone }: { entry: KnowledgeEntry; onDone: () => void }) {
  const t = useT();
  const save = useWriteUp(entry.itemId);
  const [v, setV] = useState({
    symptom: entry.symptom,
    measured: entry.measured,
    faultyPart: entry.faultyPart,
    fix: entry.fix || entry.notes,
  });
  const fields =
    save.error && 'fields' in save.error ? (save.error as { fields?: Record<string, string> }).fields : undefined;
  return (
    <form
      aria-label={t('bench.tool.note.form')}
      className="mt-3 space-y-3 rounded-lg bg-navy/5 p-3"
      onSubmit={(ev) => {
        ev.preventDefault();
        save.mutate(v, { onSuccess: onDone });
      }}
    >
      <p className="text-sm text-ink-soft">{t('bench.tool.note.lead')}</p>
      <TextAreaField
        label={t('bench.tool.note.symptom')}
        rows={2}
        value={v.symptom}
        onChange={(e) => setV({ ...v, symptom: e.target.value })}
        error={fields?.symptom}
      />
      <TextAreaField
        label={t('bench.tool.note.whatMeasured')}
        rows={2}
        value={v.measured}
        onChange={(e) => setV({ ...v, measured: e.target.value })}
      />
      <TextField
        label={t('bench.tool.note.theFaultyPart')}
        value={v.faultyPart}
        onChange={(e) => setV({ ...v, faultyPart: e.target.value })}
      />
      <TextAreaField
        label={t('bench.tool.note.theFix')}
        rows={2}
        value={v.fix}
        onChange={(e) => setV({ ...v, fix: e.target.value })}
        error={fields?.fix}
      />
      {save.error && !fields && <Alert tone="error">{save.error.message}</Alert>}
      <div className="flex gap-2">
        <Button type="submit" busy={save.isPending}>
          {t('bench.tool.note.save')}
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          {t('bench.outcome.cancel')}
        </Button>
      </div>
    </form>
  );
}
