import { useState, type ReactNode } from 'react';
import { Link } from 'react-router';
import { hasArrived, isQueued } from '../../../../../shared/event-day/constants';
import { formatMoney, formatTime } from '../../../../../shared/format';
import { isWebLink } from '../../../../../shared/files/web-links';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Alert, Card } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import { useUser } from '../../../lib/auth';
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
          <h2 className="text-lg">Outcome: {item.outcome.outcomeLabel}</h2>
          {item.outcome.barrierLabel && <p>Why: {item.outcome.barrierLabel}</p>}
          {item.outcome.partDescription && (
            <p>
              Part needed: {item.outcome.partDescription}
              {item.outcome.partCost !== null && ` (about ${formatMoney(item.outcome.partCost, item.event.currency)})`}
              {isWebLink(item.outcome.partLink) && (
                <>
                  {' '}
                  ·{' '}
                  <a className="underline" href={item.outcome.partLink} target="_blank" rel="noreferrer">
                    link
                  </a>
                </>
              )}
            </p>
          )}
          {item.outcome.minutes !== null && <p>{item.outcome.minutes} minutes</p>}
          {item.outcome.notes && <p className="whitespace-pre-line text-ink-soft">{item.outcome.notes}</p>}
          <p className="text-sm text-ink-soft">
            Recorded {formatTime(item.outcome.recordedAt, tz)}
            {item.outcome.recordedByName && ` by ${item.outcome.recordedByName}`}
          </p>
          {item.can.record && (
            <Button
              variant="secondary"
              className="mt-2"
              onClick={() => setCorrecting(item.outcome?.recordedAt ?? null)}
            >
              Correct the outcome
            </Button>
          )}
        </Card>
        {whatNext}
      </>
    ) : item.can.record ? (
      <OutcomeForm item={item} latestCheck={latest} onCancel={item.outcome ? () => setCorrecting(null) : undefined} />
    ) : (
      <Alert>This item is with {item.placement?.fixerName ?? 'another fixer'}. An organiser can move it to you.</Alert>
    );

  return (
    <div className="mx-auto max-w-2xl space-y-4">
      <header className="space-y-1">
        <p className="text-sm text-ink-soft">
          <Link className="underline" to={paths.bench()}>
            My bench
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
              No. {item.queueNumber}
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
          {item.booking.walkIn ? ' (walk-in)' : ''} · about {item.estimatedMinutes} min
          {item.ageYears !== null && ` · ${item.ageYears} years old`}
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
          {othersItem && (
            <Alert>The plan gives this item to {item.placement!.fixerName}. Starting it makes it yours.</Alert>
          )}
          <Button
            className="w-full text-lg"
            onClick={() => (othersItem ? setConfirmTake(true) : start.mutate())}
            busy={start.isPending}
          >
            Start repair
          </Button>
          <p className="text-center text-sm text-ink-soft">
            {item.cautions.length > 0 ? 'Read the cautions below before you open it. ' : ''}The safety check and the
            outcome open once the repair has started.
          </p>
        </div>
      )}
      <ConfirmDialog
        open={confirmTake}
        tone="primary"
        title="Take over this item?"
        message={`It is planned for ${item.placement?.fixerName ?? 'another fixer'}. Tell them you have it, so nobody waits for it.`}
        confirmLabel="Take it"
        cancelLabel="Leave it"
        onCancel={() => setConfirmTake(false)}
        onConfirm={() => {
          setConfirmTake(false);
          start.mutate();
        }}
      />
      {start.error && <Alert tone="error">{start.error.message}</Alert>}

      {finished && outcomeSection}

      {item.cautions.length > 0 && (
        <Alert tone="caution" title="Before you open it">
          <ul className="mt-1 list-disc space-y-1 pl-5">
            {item.cautions.map((c) => (
              <li key={c.id}>
                <b>{c.title}.</b> {c.text}
              </li>
            ))}
          </ul>
          <p className="mt-2 text-xs">
            {item.safetyNote}{' '}
            <Link to={paths.safety()} className="underline">
              Safety at the bench
            </Link>
          </p>
        </Alert>
      )}

      <Card>
        <h2 className="mb-1 text-lg">What the visitor says</h2>
        <p className="whitespace-pre-line">{item.fault}</p>
        {item.photos.some((p) => p.kind === 'intake') && (
          <div className="mt-3 flex flex-wrap gap-2">
            {item.photos
              .filter((p) => p.kind === 'intake')
              .map((p) => (
                <a key={p.id} href={photoUrl(p.id)} target="_blank" rel="noreferrer">
                  <img
                    src={photoUrl(p.id)}
                    alt={`Photo of the ${item.categoryName.toLowerCase()}`}
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
        <summary className="cursor-pointer font-bold">History ({item.history.length})</summary>
        <ol className="mt-2 space-y-1 text-sm">
          {item.history.map((h, n) => (
            <li key={n}>
              <span className="font-mono">{formatTime(h.at, tz)}</span> {h.toLabel}
              {h.byName && ` — ${h.byName}`}
              {h.note && <span className="text-ink-soft"> ({h.note})</span>}
            </li>
          ))}
        </ol>
      </details>
    </div>
  );
}
