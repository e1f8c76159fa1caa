import type { ReactNode } from 'react';
import { formatTime, formatTimeRange } from '../../../../../shared/format';
import { useLanguage, useT } from '../../../lib/i18n';
import { Card } from '../../../components/ui/feedback';
import type { TriageRunDetail } from '../api/types';
import { kitNames, needText, ruleTexts, skillsText, waitingText } from '../wording';

type Summary = NonNullable<TriageRunDetail['summary']>;

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

const GIVEN = { item: 'items', fixer: 'fixers', bench: 'benches' } as const;

/** What went into a run (items, fixers, benches, the rules it kept) and what came out, in sentences and tables. */
export function TriageRunSummary({ summary: s, timeZone: tz }: { summary: Summary; timeZone: string }) {
  const t = useT();
  const lang = useLanguage();
  const day = s.scope === 'day';
  /** A name as the board gives it, else "Item 12" in the reader's language (a run stored before names were kept). */
  const nameOf = (kind: 'item' | 'fixer' | 'bench', id: string, name: string) =>
    s.given[GIVEN[kind]].includes(id) ? name : t(`organise.triage.summary.${kind}N`, { id });
  const reasonOf = (code: string, english: string) => {
    const key = `organise.triage.reason.${code}`;
    const word = t(key);
    return word === key ? english : word;
  };
  const kit = (equipment: string[]) =>
    equipment.length ? kitNames(t, lang, equipment) : t('organise.triage.summary.none');
  return (
    <div className="space-y-6">
      <section aria-labelledby="run-result" className="space-y-3">
        <h2 id="run-result" className="text-xl">
          {t('organise.triage.summary.out')}
        </h2>
        <p>
          {t('organise.triage.summary.placed', { n: s.placed.length })}{' '}
          {t('organise.triage.summary.waiting', { n: s.waiting.length })}
        </p>
        {s.placed.length > 0 && (
          <Table
            caption={t('organise.triage.summary.placedCaption')}
            head={[
              t('organise.triage.summary.item'),
              t('organise.triage.summary.fixer'),
              t('organise.triage.summary.bench'),
            ]}
            rows={s.placed.map((p) => [
              nameOf('item', p.itemId, p.item),
              nameOf('fixer', p.fixerId, p.fixer),
              nameOf('bench', p.benchId, p.bench),
            ])}
          />
        )}
        {s.waiting.length > 0 && (
          <>
            <h3 className="text-base">{t('organise.triage.summary.leftWaiting')}</h3>
            <Table
              caption={t('organise.triage.summary.waitingCaption')}
              head={[t('organise.triage.summary.item'), t('organise.triage.summary.why')]}
              rows={s.waiting.map((w) => [
                nameOf('item', w.itemId, w.item),
                <>
                  <span className="font-bold">{reasonOf(w.why?.reason ?? w.code, w.reason)}.</span>{' '}
                  {w.why ? waitingText(w.why, t, lang) : w.detail}
                </>,
              ])}
            />
          </>
        )}
      </section>

      <section aria-labelledby="run-input" className="space-y-3">
        <h2 id="run-input" className="text-xl">
          {t('organise.triage.summary.in')}
        </h2>
        <p>
          {t('organise.triage.summary.counts', {
            items: s.items.length,
            fixers: s.fixers.length,
            benches: s.benches.length,
          })}
        </p>
        <Card className="p-4">
          <h3 className="text-base">{t('organise.triage.summary.rules')}</h3>
          <ul className="mt-1 list-disc space-y-1 pl-5 text-sm">
            {ruleTexts(t, s.scope, s.lockedKept).map((r) => (
              <li key={r}>{r}</li>
            ))}
          </ul>
        </Card>
        <h3 className="text-base">{t('organise.triage.summary.items')}</h3>
        <Table
          caption={t('organise.triage.summary.itemsCaption')}
          head={[
            t('organise.triage.summary.item'),
            ...(day ? [t('organise.triage.summary.bookedFor')] : []),
            t('organise.triage.summary.needs'),
            t('organise.triage.summary.benchKit'),
          ]}
          rows={s.items.map((i) => [
            nameOf('item', i.id, i.label),
            ...(day ? [i.slotStartsAt ? formatTime(i.slotStartsAt, tz, lang) : '—'] : []),
            needText(t, i.skill, i.minLevel),
            kit(i.equipment),
          ])}
        />
        <h3 className="text-base">{t('organise.triage.summary.fixers')}</h3>
        <Table
          caption={t('organise.triage.summary.fixersCaption')}
          head={[
            t('organise.triage.summary.fixer'),
            t('organise.triage.summary.skills'),
            ...(day ? [t('organise.triage.summary.hours')] : []),
            t('organise.triage.summary.seat'),
          ]}
          rows={s.fixers.map((f) => [
            nameOf('fixer', f.id, f.name),
            skillsText(t, lang, f.skillLevels),
            ...(day ? [f.from && f.to ? formatTimeRange(f.from, f.to, tz, lang) : '—'] : []),
            f.seat && f.seatId ? nameOf('bench', f.seatId, f.seat) : t('organise.triage.summary.anyBench'),
          ])}
        />
        <h3 className="text-base">{t('organise.triage.summary.benches')}</h3>
        <Table
          caption={t('organise.triage.summary.benchesCaption')}
          head={[
            t('organise.triage.summary.bench'),
            t('organise.triage.summary.seats'),
            t('organise.triage.summary.kit'),
          ]}
          rows={s.benches.map((b) => [nameOf('bench', b.id, b.name), b.seats, kit(b.equipment)])}
        />
      </section>
    </div>
  );
}
