import { useState } from 'react';
import type { Board, BoardItem } from '../api/types';
import { formatTime } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { useLanguage, useT } from '../../../lib/i18n';
import { useLockItem } from '../api/lock-item';
import { usePlaceItem } from '../api/place-item';
import { useUnplaceItem } from '../api/unplace-item';
import { waitingText, warningText } from '../wording';

/** An item on the board: what it needs, why it waits or what its placement breaks, and moving it by hand. */
export function BoardItemCard({ item, board, eventId }: { item: BoardItem; board: Board; eventId: number }) {
  const place = usePlaceItem(eventId, item.id);
  const lock = useLockItem(eventId, item.id);
  const unplace = useUnplaceItem(eventId, item.id);
  const error = place.error ?? lock.error ?? unplace.error;
  const t = useT();
  const lang = useLanguage();
  const [moving, setMoving] = useState(false);
  const [to, setTo] = useState({
    userId: item.placement?.userId ?? board.fixers[0]?.userId ?? 0,
    benchId: item.placement?.benchId ?? board.benches[0]?.id ?? 0,
  });
  const tz = board.event.timeZone;
  const slot = board.slots.find((s) => s.id === item.slotId);
  const skill = t(`common.skill.${item.needs.skill}`);
  const level = (n: number) => t(`organise.triage.level.${Math.max(0, Math.min(3, Math.round(n)))}`);
  const need = item.needs.minLevel;
  const fixerStanding = (has: number) =>
    has <= 0
      ? t('organise.triage.card.noSkillYet', { skill })
      : has < need
        ? t('organise.triage.card.belowNeed', { skill, level: level(has), need: level(need) })
        : t('organise.triage.card.hasSkill', { skill, level: level(has) });
  const standing = (f: Board['fixers'][number]) => `${f.name} — ${fixerStanding(f.skills[item.needs.skill] ?? 0)}`;
  const chosen = board.fixers.find((f) => f.userId === to.userId);
  return (
    <article
      className={`rounded-lg bg-white p-3 text-sm shadow-sm ring-1 ${item.warnings.length ? 'ring-alert' : item.placement?.locked ? 'ring-navy' : 'ring-ink/10'}`}
    >
      <div className="flex items-start justify-between gap-2">
        <p className="font-bold">
          {item.categoryName}
          {item.brand || item.model ? ` — ${[item.brand, item.model].filter(Boolean).join(' ')}` : ''}
        </p>
        {item.placement?.locked && (
          <span
            className="rounded bg-navy px-1.5 text-xs font-bold text-white"
            title={t('organise.triage.card.lockedHint')}
          >
            {t('organise.triage.card.locked')}
          </span>
        )}
      </div>
      <p className="text-ink-soft">{item.fault}</p>
      <p className="mt-1 text-xs">
        {item.reference} ·{' '}
        {t('organise.triage.card.bookedFor', { time: slot ? formatTime(slot.startsAt, tz, lang) : '—' })} ·{' '}
        {t('organise.triage.card.about', { minutes: item.minutes })}
        {item.placement && item.estimatedStart && (
          <> · {t('organise.triage.card.starts', { time: formatTime(item.estimatedStart, tz, lang) })}</>
        )}
      </p>
      <p className="text-xs text-ink-soft">
        {need >= 3
          ? t('organise.triage.card.needsExpert', { skill })
          : t('organise.triage.card.needs', { skill, level: level(need) })}
        {item.needs.equipment.length
          ? `, ${item.needs.equipment.map((e) => t(`organise.equipment.${e}`)).join(', ')}`
          : ''}
        {item.mains ? ` · ${t('organise.triage.card.mains')}` : ''}
      </p>
      {item.reason && (
        <p className="mt-1 rounded bg-copper-light px-2 py-1 text-xs">
          <span className="font-bold">{t(`organise.triage.reason.${item.reason.reason}`)}:</span>{' '}
          {waitingText(item.reason, t, lang)}
        </p>
      )}
      {item.warnings.map((w) => (
        <p key={w.code} className="mt-1 text-xs font-semibold text-alert">
          ⚠ {warningText(w, t, lang)}
        </p>
      ))}
      {moving ? (
        <div className="mt-2 space-y-2" onKeyDown={(e) => e.key === 'Escape' && setMoving(false)}>
          <select
            autoFocus
            aria-label={t('organise.triage.card.fixer')}
            aria-describedby={`fixer-standing-${item.id}`}
            value={to.userId}
            onChange={(e) => setTo({ ...to, userId: Number(e.target.value) })}
            className="block w-full rounded border border-ink/20 px-2 py-1"
          >
            {board.fixers.map((f) => (
              <option key={f.userId} value={f.userId}>
                {standing(f)}
              </option>
            ))}
          </select>
          {/* The closed picker cuts long text off; the whole line shows here, and is read out with the picker. */}
          <p id={`fixer-standing-${item.id}`} className="text-xs text-ink-soft">
            {chosen ? standing(chosen) : ''}
          </p>
          <select
            aria-label={t('organise.triage.card.bench')}
            value={to.benchId}
            onChange={(e) => setTo({ ...to, benchId: Number(e.target.value) })}
            className="block w-full rounded border border-ink/20 px-2 py-1"
          >
            {board.benches.map((b) => (
              <option key={b.id} value={b.id}>
                {b.name}
              </option>
            ))}
          </select>
          <div className="flex gap-2">
            <Button
              className="min-h-9 px-3 py-1"
              busy={place.isPending}
              onClick={() => place.mutate({ ...to, locked: true }, { onSuccess: () => setMoving(false) })}
            >
              {t('organise.triage.card.placeAndLock')}
            </Button>
            <Button variant="quiet" className="min-h-9 px-3 py-1" onClick={() => setMoving(false)}>
              {t('organise.triage.card.cancel')}
            </Button>
          </div>
        </div>
      ) : (
        <div className="mt-2 flex flex-wrap gap-1">
          <Button
            variant="secondary"
            className="min-h-9 px-3 py-1 text-sm"
            disabled={!board.fixers.length || !board.benches.length}
            onClick={() => setMoving(true)}
          >
            {t('organise.triage.card.move')}
          </Button>
          {item.placement && (
            <Button
              variant="quiet"
              className="min-h-9 px-3 py-1 text-sm"
              busy={lock.isPending}
              onClick={() => lock.mutate(!item.placement!.locked)}
            >
              {item.placement.locked ? t('organise.triage.card.unlock') : t('organise.triage.card.lock')}
            </Button>
          )}
          {item.placement && (
            <Button variant="quiet" className="min-h-9 px-3 py-1 text-sm" onClick={() => unplace.mutate()}>
              {t('organise.triage.card.takeOff')}
            </Button>
          )}
        </div>
      )}
      {error && <p className="mt-1 text-xs font-semibold text-alert">{error.message}</p>}
    </article>
  );
}
