import { useState, type ReactNode } from 'react';
import { Link } from 'react-router';
import { hasArrived, isQueued } from '../../../../../shared/event-day/constants';
import { formatMoney, formatTime } from '../../../../../shared/format';
import { isWebLink } from '../../../../../shared/files/web-links';
import { mayInGroup } from '../../../../../shared/permissions';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Alert, Card } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import { useUser } from '../../../lib/auth';
import { useLanguage, useT } from '../../../lib/i18n';
import { photoUrl } from '../api/photo-url';
import { useStartRepair } from '../api/start-repair';
import type { ItemView } from '../api/types';
import { StatusChip } from './status-chip';
import { OutcomeForm } from './outcome-form';
import { RepairPhotos } from './repair-photos';
import { SafetySection } from './safety-section';

/** What other features show on the item page, composed by the route: similar repairs, salvage stock, calculators. */
export interface ItemToolkit {
  similarRepairs: ReactNode;
  salvage: ReactNode;
  calculators: ReactNode;
}

/**
 * The fixer's page for one item, phone first: "Start repair" and the cautions on the first screen, then what is
 * wrong, the safety check and the outcome. `whatNext` (composed by the route) shows once an outcome is in.
 */
export function ItemBody({ item, toolkit, whatNext }: { item: ItemView; toolkit: ItemToolkit; whatNext?: ReactNode }) {
  const start = useStartRepair(item.id);
  const t = useT();
  const lang = useLanguage();
  /** A caution's words in the reader's language, by its id; the server's English if the catalogs lack it. */
  const caution = (id: string, part: 'title' | 'text', english: string) => {
    const key = `fixer.caution.${id}.${part}`;
    const text = t(key);
    return text === key ? english : text;
  };
  const fixerName = item.placement?.fixerName ?? t('fixer.anotherFixer');
  const { data: me } = useUser();
  const [confirmTake, setConfirmTake] = useState(false);
  const othersItem = item.placement && me && item.placement.userId !== me.id;
  // Reached a bench: arrived and no longer waiting in the queue (at the bench or done).
  const started = hasArrived(item.status) && !isQueued(item.status);
  const tz = item.event.timeZone;
  const latest = item.safetyChecks[0];
  // The outcome being corrected, by when it was recorded: a newly saved one (now, or sent later from the phone's
  // queue) has another time, which closes the form.
  const [correcting, setCorrecting] = useState<string | null>(null);
  const editing = item.outcome !== null && correcting === item.outcome.recordedAt;
  // A finished item leads with what happened to it; its cautions follow for whoever opens it again.
  const finished = item.status === 'done' && item.outcome !== null && !editing;
  const outcomeSection =
    !started && !item.outcome ? null : item.outcome && !editing ? (
      <>
        <Card className={item.outcome.outcome === 'fixed' ? 'ring-2 ring-sage' : ''}>
          <h2 className="text-lg">
            {t('fixer.outcome.title', { label: t(`fixer.outcomeValue.${item.outcome.outcome}`) })}
          </h2>
          {item.outcome.barrier && (
            <p>{t('fixer.outcome.why', { label: t(`fixer.barrier.${item.outcome.barrier}`) })}</p>
          )}
          {item.outcome.partDescription && (
            <p>
              {t('fixer.outcome.part', { part: item.outcome.partDescription })}
              {item.outcome.partCost !== null &&
                t('fixer.outcome.partCost', { cost: formatMoney(item.outcome.partCost, item.event.currency) })}
              {isWebLink(item.outcome.partLink) && (
                <>
                  {' '}
                  ·{' '}
                  <a className="underline" href={item.outcome.partLink} target="_blank" rel="noreferrer">
                    {t('fixer.outcome.link')}
                  </a>
                </>
              )}
            </p>
          )}
          {item.outcome.minutes !== null && <p>{t('fixer.outcome.minutes', { minutes: item.outcome.minutes })}</p>}
          {item.outcome.notes && <p className="whitespace-pre-line text-ink-soft">{item.outcome.notes}</p>}
          <p className="text-sm text-ink-soft">
            {item.outcome.recordedByName
              ? t('fixer.outcome.recordedBy', {
                  time: formatTime(item.outcome.recordedAt, tz, lang),
                  name: item.outcome.recordedByName,
                })
              : t('fixer.outcome.recorded', { time: formatTime(item.outcome.recordedAt, tz, lang) })}
          </p>
          {item.can.record && (
            <Button
              variant="secondary"
              className="mt-2"
              onClick={() => setCorrecting(item.outcome?.recordedAt ?? null)}
            >
              {t('fixer.outcome.correct')}
            </Button>
          )}
        </Card>
        {whatNext}
      </>
    ) : item.can.record ? (
      <OutcomeForm item={item} latestCheck={latest} onCancel={item.outcome ? () => setCorrecting(null) : undefined} />
    ) : mayInGroup(me, item.event.groupId, 'benchWork') ? (
      <Alert>{t('fixer.withOther', { name: fixerName })}</Alert>
    ) : (
      <Alert>{t('fixer.forFixer')}</Alert>
    );

  return (
    <div className="mx-auto max-w-2xl space-y-4">
      <header className="space-y-1">
        <p className="text-sm text-ink-soft">
          <Link className="underline" to={paths.bench()}>
            {t('fixer.myBench')}
          </Link>{' '}
          · {item.event.title}
        </p>
        <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
          {item.tagCode && (
            <span className="font-mono text-3xl font-extrabold tracking-widest text-navy" data-testid="tag-code">
              {item.tagCode}
            </span>
          )}
          {item.queueNumber !== null && (
            <span className="rounded-lg bg-navy px-2 py-1 text-lg font-extrabold text-white">
              {t('fixer.queueNo', { n: item.queueNumber })}
            </span>
          )}
          <StatusChip status={item.status} />
        </div>
        <h1 className="text-2xl">
          {item.categoryName}
          {(item.brand || item.model) && (
            <span className="font-semibold text-ink-soft"> — {[item.brand, item.model].filter(Boolean).join(' ')}</span>
          )}
        </h1>
        <p className="text-ink-soft">
          {item.booking.visitorName}
          {item.booking.walkIn ? t('fixer.walkIn') : ''} · {t('fixer.about', { minutes: item.estimatedMinutes })}
          {item.ageYears !== null && ` · ${t('fixer.age', { years: item.ageYears })}`}
          {item.placement && (
            <>
              {' '}
              · {item.placement.fixerName}, {item.placement.benchName}
            </>
          )}
        </p>
      </header>

      {item.can.start && !started && (
        <div className="space-y-2">
          {othersItem && <Alert>{t('fixer.plannedFor', { name: item.placement!.fixerName })}</Alert>}
          <Button
            className="w-full text-lg"
            onClick={() => (othersItem ? setConfirmTake(true) : start.mutate())}
            busy={start.isPending}
          >
            {t('fixer.start')}
          </Button>
          <p className="text-center text-sm text-ink-soft">
            {item.cautions.length > 0 ? t('fixer.startHintCautions') : t('fixer.startHint')}
          </p>
        </div>
      )}
      <ConfirmDialog
        open={confirmTake}
        tone="primary"
        title={t('fixer.take.title')}
        message={t('fixer.take.message', { name: fixerName })}
        confirmLabel={t('fixer.take.confirm')}
        cancelLabel={t('fixer.take.cancel')}
        onCancel={() => setConfirmTake(false)}
        onConfirm={() => {
          setConfirmTake(false);
          start.mutate();
        }}
      />
      {start.error && <Alert tone="error">{start.error.message}</Alert>}

      {finished && outcomeSection}

      {item.cautions.length > 0 && (
        <Alert tone="caution" title={t('fixer.cautions.title')}>
          <ul className="mt-1 list-disc space-y-1 pl-5">
            {item.cautions.map((c) => (
              <li key={c.id}>
                <b>{caution(c.id, 'title', c.title)}.</b> {caution(c.id, 'text', c.text)}
              </li>
            ))}
          </ul>
          <p className="mt-2 text-xs">
            {t('fixer.cautions.note')}{' '}
            <Link to={paths.safety()} className="underline">
              {t('fixer.cautions.link')}
            </Link>
          </p>
        </Alert>
      )}

      <Card>
        <h2 className="mb-1 text-lg">{t('fixer.visitorSays')}</h2>
        <p className="whitespace-pre-line">{item.fault}</p>
        {item.photos.some((p) => p.kind === 'intake') && (
          <div className="mt-3 flex flex-wrap gap-2">
            {item.photos
              .filter((p) => p.kind === 'intake')
              .map((p) => (
                <a key={p.id} href={photoUrl(p.id)} target="_blank" rel="noreferrer">
                  <img
                    src={photoUrl(p.id)}
                    alt={t('fixer.photoAlt', { kind: item.categoryName })}
                    className="size-24 rounded-lg object-cover"
                  />
                </a>
              ))}
          </div>
        )}
      </Card>

      {toolkit.similarRepairs}

      {item.mains &&
        ((started && !(item.status === 'done' && item.outcome?.outcome !== 'fixed')) ||
          item.safetyChecks.length > 0) && <SafetySection item={item} />}

      {!finished && outcomeSection}

      {(item.can.record || item.photos.some((p) => p.kind === 'repair')) && <RepairPhotos item={item} />}
      {(started || item.partsUsed.length > 0) && toolkit.salvage}
      {toolkit.calculators}

      <details className="rounded-xl bg-white p-4 ring-1 ring-ink/5">
        <summary className="cursor-pointer font-bold">{t('fixer.history', { count: item.history.length })}</summary>
        <ol className="mt-2 space-y-1 text-sm">
          {item.history.map((h, n) => (
            <li key={n}>
              <span className="font-mono">{formatTime(h.at, tz, lang)}</span> {t(`fixer.status.${h.to}`)}
              {h.byName && ` — ${h.byName}`}
              {h.note && <span className="text-ink-soft"> ({h.note})</span>}
            </li>
          ))}
        </ol>
      </details>
    </div>
  );
}
