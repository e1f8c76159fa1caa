import type { Rota } from '../api/types';
import { formatTimeRange } from '../../../../../shared/format';
import { Alert, EmptyState } from '../../../components/ui/feedback';
import { useSeatFixer } from '../api/seat-fixer';
import { tr, useLanguage, useT } from '../../../lib/i18n';

const phoneLabel = 'font-bold text-ink-soft sm:hidden';

/**
 * Who answered, with their hours and skills, and a seat for each one coming; `benches` are the session's, and
 * `onSeated` runs after a seat changes (the triage board places by seats).
 */
export function ShiftTable({
  eventId,
  shifts,
  benches,
  timeZone,
  onSeated,
}: {
  eventId: number;
  shifts: Rota['shifts'];
  benches: { id?: number; name: string }[];
  timeZone: string;
  onSeated?: () => void;
}) {
  const t = useT();
  const lang = useLanguage();
  const seat = useSeatFixer(eventId, onSeated);
  if (shifts.length === 0)
    return (
      <EmptyState title={t('organise.rota.noAnswers')} icon="☰">
        {t('organise.rota.noAnswersBody')}
      </EmptyState>
    );
  return (
    <>
      {seat.error && <Alert tone="error">{tr(seat.error.message)}</Alert>}
      {/* On a phone each person is a card, with the column's name beside each value; from 640 px it is a table. */}
      <div className="rounded-xl bg-white ring-1 ring-ink/5">
        <table className="block w-full text-left text-sm sm:table">
          <thead className="hidden bg-navy/5 text-navy sm:table-header-group">
            <tr>
              <th className="px-4 py-2">{t('organise.rota.name')}</th>
              <th className="px-4 py-2">{t('organise.rota.answer')}</th>
              <th className="px-4 py-2">{t('organise.rota.hours')}</th>
              <th className="px-4 py-2">{t('organise.rota.skills')}</th>
              <th className="px-4 py-2">{t('organise.rota.seat')}</th>
            </tr>
          </thead>
          <tbody className="block sm:table-row-group">
            {shifts.map((s) => (
              <tr key={s.userId} className="block border-t border-ink/5 py-2 first:border-t-0 sm:table-row sm:py-0">
                <td className="block px-4 py-1 font-semibold sm:table-cell sm:py-2">{s.name}</td>
                <td className="block px-4 py-1 sm:table-cell sm:py-2">
                  <span className={phoneLabel}>{t('organise.rota.answer')}: </span>
                  {s.coming ? t('organise.rota.coming') : t('organise.rota.notComing')}
                </td>
                <td className="block px-4 py-1 sm:table-cell sm:py-2">
                  <span className={phoneLabel}>{t('organise.rota.hours')}: </span>
                  {s.coming ? formatTimeRange(s.startsAt, s.endsAt, timeZone, lang) : '—'}
                </td>
                <td className="block px-4 py-1 text-ink-soft sm:table-cell sm:py-2">
                  <span className={phoneLabel}>{t('organise.rota.skills')}: </span>
                  {Object.entries(s.skills)
                    .map(([k, l]) => `${t(`common.skill.${k}`)} ${l}`)
                    .join(', ') || '—'}
                </td>
                <td className="block px-4 py-1 sm:table-cell sm:py-2">
                  {s.coming && (
                    <label className="flex flex-col gap-1 sm:block">
                      <span className={phoneLabel}>{t('organise.rota.seat')}</span>
                      <select
                        aria-label={t('organise.rota.seatFor', { name: s.name })}
                        value={s.benchId ?? ''}
                        onChange={(e) =>
                          seat.mutate({ userId: s.userId, benchId: e.target.value ? Number(e.target.value) : null })
                        }
                        className="min-h-11 w-full rounded border border-ink/20 px-2 py-1 sm:w-auto"
                      >
                        <option value="">{t('organise.rota.freeToMove')}</option>
                        {benches.map((b) => (
                          <option key={b.id} value={b.id}>
                            {b.name}
                          </option>
                        ))}
                      </select>
                    </label>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}
