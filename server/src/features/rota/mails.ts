import { formatDay, formatTimeRange } from '../../../../shared/format';
import { asLanguage } from '../../../../shared/i18n/languages';
import { translate } from '../../i18n';
import { composeMail } from '../../mail/templates';

/**
 * Asks one fixer to come to a session where visitors need a skill of theirs that nobody coming has: in the fixer's
 * own language, else the group's.
 */
export function askForSkillMail(
  to: { email: string; name: string; language: string | null },
  event: { title: string; startsAt: Date; endsAt: Date },
  group: { name: string; timeZone: string; defaultLanguage: string },
  skills: string[],
  publicUrl: string,
) {
  const lang = asLanguage(to.language, asLanguage(group.defaultLanguage));
  const m = (key: string, values?: Record<string, unknown>) => translate(lang, `mail.askSkill.${key}`, values);
  const names = skills.map((s) => translate(lang, `common.skill.${s}`));
  const list = new Intl.ListFormat(lang, { type: 'conjunction' }).format(
    lang === 'de' ? names : names.map((n) => n.toLowerCase()),
  );
  return composeMail(to.email, m('subject', { event: event.title }), {
    paragraphs: [
      translate(lang, 'mail.hello', { name: to.name }),
      m('text', {
        group: group.name,
        event: event.title,
        day: formatDay(event.startsAt, group.timeZone, lang),
        time: formatTimeRange(event.startsAt, event.endsAt, group.timeZone, lang),
        skills: list,
      }),
      m('come'),
    ],
    action: { label: m('action'), url: `${publicUrl}/bench` },
    language: lang,
  });
}
