import type { Rota } from '../api/types';
import { SKILLS } from '../../../../../shared/constants';
import { formatTime } from '../../../../../shared/format';
import { Card } from '../../../components/ui/feedback';
import { useLanguage, useT } from '../../../lib/i18n';

/** Skills × slots: fixers present for the whole slot against items booked that need the skill. */
export function SkillCoverChart({ rota, timeZone }: { rota: Rota; timeZone: string }) {
  const t = useT();
  const lang = useLanguage();
  const shown = SKILLS.filter(
    (s) => rota.coverage.some((c) => c.bySkill[s] > 0) || rota.slots.some((sl) => sl.demand[s] > 0),
  );
  return (
    <Card>
      <h2 className="text-lg">{t('organise.rota.coverTitle')}</h2>
      <p className="text-sm text-ink-soft">{t('organise.rota.coverLead')}</p>
      <div className="mt-3 overflow-x-auto">
        <table className="text-center text-xs" aria-label={t('organise.rota.coverTable')}>
          <thead>
            <tr>
              <th className="sticky left-0 bg-white py-1 pl-0 pr-1 text-left sm:px-2">{t('organise.rota.skill')}</th>
              {rota.slots.map((s) => (
                <th key={s.id} className="px-1 py-1 font-bold">
                  {formatTime(s.startsAt, timeZone, lang)}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {shown.map((skill) => (
              <tr key={skill}>
                <th className="sticky left-0 bg-white py-1 pl-0 pr-1 text-left sm:px-2 font-semibold">
                  {t(`common.skill.${skill}`)}
                </th>
                {rota.slots.map((s, i) => {
                  const have = rota.coverage[i].bySkill[skill];
                  const need = s.demand[skill];
                  return (
                    <td
                      key={s.id}
                      className={`h-9 min-w-10 border border-white px-0.5 font-bold sm:min-w-12 sm:px-1 ${coverTone(have, need)}`}
                      title={t('organise.rota.cell', { have, need })}
                    >
                      {have}/{need}
                    </td>
                  );
                })}
              </tr>
            ))}
            <tr>
              <th className="sticky left-0 bg-white py-1 pl-0 pr-1 text-left sm:px-2">
                {t('organise.rota.allFixers')}
              </th>
              {rota.coverage.map((c, i) => (
                <td key={i} className="font-bold">
                  {c.fixers}
                </td>
              ))}
            </tr>
          </tbody>
        </table>
      </div>
      <p className="mt-2 flex flex-wrap gap-3 text-xs text-ink-soft">
        <span>
          <span className="inline-block size-3 rounded bg-sage-light align-middle" /> {t('organise.rota.keyCovered')}
        </span>
        <span>
          <span className="inline-block size-3 rounded bg-copper-light align-middle" /> {t('organise.rota.keyShort')}
        </span>
        <span>
          <span className="inline-block size-3 rounded bg-alert align-middle" /> {t('organise.rota.keyNobody')}
        </span>
      </p>
    </Card>
  );
}

const coverTone = (have: number, need: number) =>
  need > 0 && have === 0
    ? 'bg-alert text-white'
    : have === 0
      ? 'bg-ink/5 text-ink-soft'
      : need > have
        ? 'bg-copper-light'
        : 'bg-sage-light';
