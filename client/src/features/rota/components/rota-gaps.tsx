import { useState } from 'react';
import type { Rota } from '../api/types';
import type { Skill } from '../../../../../shared/constants';
import { formatTimeRange } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import { useAskForSkills } from '../api/ask-for-skills';
import { tr, useLanguage, useT } from '../../../lib/i18n';

/** A skill's name inside a sentence: lower case, but German keeps its nouns' capitals. */
const skillInText = (name: string, lang: string) => (lang === 'de' ? name : name.toLowerCase());

/** Times when booked items wait for a skill nobody coming has, and a mail to the group's fixers who have it. */
export function RotaGaps({ eventId, gaps, timeZone }: { eventId: number; gaps: Rota['gaps']; timeZone: string }) {
  const t = useT();
  const lang = useLanguage();
  const ask = useAskForSkills(eventId);
  const [picked, setPicked] = useState<Set<Skill>>(new Set());
  const gapSkills = [...new Set(gaps.map((g) => g.skill as Skill))];
  const toggle = (s: Skill) =>
    setPicked((p) => {
      const n = new Set(p);
      if (n.has(s)) n.delete(s);
      else n.add(s);
      return n;
    });
  return (
    <Card className="space-y-3">
      <h2 className="text-lg">{t('organise.rota.gaps')}</h2>
      {gaps.length === 0 ? (
        <p className="text-sm text-ink-soft">{t('organise.rota.noGaps')}</p>
      ) : (
        <ul className="space-y-1 text-sm">
          {gaps.map((g) => (
            <li key={`${g.skill}${g.from}`}>
              <span className="font-bold">
                {t('organise.rota.noFixerFor', { skill: skillInText(t(`common.skill.${g.skill}`), lang) })}
              </span>{' '}
              {t('organise.rota.gapWhen', { time: formatTimeRange(g.from, g.to, timeZone, lang), n: g.items })}
            </li>
          ))}
        </ul>
      )}
      {gapSkills.length > 0 && (
        <fieldset className="space-y-1">
          <legend className="text-sm font-bold">{t('organise.rota.askWith')}</legend>
          {gapSkills.map((s) => (
            <label key={s} className="flex items-center gap-2 text-sm">
              <input
                type="checkbox"
                checked={picked.has(s)}
                onChange={() => toggle(s)}
                className="size-4 accent-copper"
              />
              {t(`common.skill.${s}`)}
            </label>
          ))}
          <Button className="mt-2" disabled={!picked.size} busy={ask.isPending} onClick={() => ask.mutate([...picked])}>
            {t('organise.rota.mailThem')}
          </Button>
          {ask.isSuccess && (
            <p role="status" className={`text-sm font-bold ${ask.data.sent ? 'text-sage' : 'text-ink-soft'}`}>
              {ask.data.sent ? t('organise.rota.asked', { n: ask.data.sent }) : t('organise.rota.nobodyElse')}
            </p>
          )}
          {ask.error && <Alert tone="error">{tr(ask.error.message)}</Alert>}
        </fieldset>
      )}
    </Card>
  );
}
