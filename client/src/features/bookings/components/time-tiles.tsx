import type { UseFormRegisterReturn } from 'react-hook-form';
import type { Bookability } from '../../../../../shared/booking/bookability';
import { slotHasPassed } from '../../../../../shared/booking/bookability';
import { formatTime } from '../../../../../shared/format';
import { useLanguage, useT } from '../../../lib/i18n';
import { slotWords } from './slot-words';

export interface TimeTile {
  id: number;
  startsAt: string;
  endsAt: string;
}

/**
 * The times of a session as radio tiles. Times that have passed are not offered; each tile says what the shared
 * rule says for the items chosen so far, and a time whose kind's limit is reached cannot be picked.
 */
export function TimeTiles<T extends TimeTile>({
  slots,
  timeZone,
  now,
  chosenId,
  bookability,
  field,
}: {
  slots: T[];
  timeZone: string;
  now: Date;
  chosenId: number;
  bookability: (s: T) => Bookability;
  field: UseFormRegisterReturn;
}) {
  const t = useT();
  const lang = useLanguage();
  return (
    <div className="mt-3 grid grid-cols-3 gap-2 sm:grid-cols-4">
      {slots
        .filter((s) => !slotHasPassed(s, now))
        .map((s) => {
          const b = bookability(s);
          const refused = !b.ok && b.reason === 'skill-full';
          const words = b.ok ? null : slotWords(b, t);
          return (
            <label
              key={s.id}
              title={refused ? words?.message : undefined}
              className={`rounded-lg p-2 text-center ring-1 has-checked:bg-navy has-checked:text-white has-checked:ring-navy has-focus-visible:outline-3 has-focus-visible:outline-offset-2 has-focus-visible:outline-copper ${refused ? 'cursor-not-allowed bg-ink/5 text-ink-soft ring-ink/10' : b.ok ? 'cursor-pointer ring-ink/20' : 'cursor-pointer bg-ink/5 ring-ink/10'}`}
            >
              <input type="radio" value={s.id} className="sr-only" disabled={refused && s.id !== chosenId} {...field} />
              <span className="block text-lg font-extrabold">{formatTime(s.startsAt, timeZone, lang)}</span>
              <span className="block text-xs font-semibold">
                {words ? words.short : t('booking.slot.free', { free: b.ok ? b.free : 0 })}
              </span>
            </label>
          );
        })}
    </div>
  );
}
