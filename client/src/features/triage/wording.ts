import { EQUIPMENT_LABELS, SKILL_LABELS, type Equipment, type Skill } from '../../../../shared/constants';
import { intlLocale } from '../../../../shared/format';
import type { Language } from '../../../../shared/i18n/languages';
import type { PlacementWarning } from '../../../../shared/triage/needs';
import type { WaitingWhy } from '../../../../shared/triage/waiting';

/** A translate function: useT()'s in a component, a catalog's own in the tests. */
type T = (key: string, values?: Record<string, unknown>) => string;

/*
 * The triage board's reasons and warnings, worded from their codes and values (shared/triage/waiting.ts and
 * needs.ts) in the reader's language: skills and kinds of kit by their translated names, lists as the language
 * joins them ("A, B and C", "A, B en C").
 */

/** A catalog's word, else the stored English label, else the slug itself. */
const named = (t: T, key: string, label: string | undefined, slug: string) => {
  const word = t(key);
  return word === key ? (label ?? slug) : word;
};
/** A name inside a sentence: lower case as a common noun, except in German, where nouns keep their capital. */
const inSentence = (word: string, lang: Language) =>
  lang === 'de' ? word : word.charAt(0).toLocaleLowerCase(lang) + word.slice(1);

export const skillWord = (t: T, lang: Language, slug: string) =>
  inSentence(named(t, `common.skill.${slug}`, SKILL_LABELS[slug as Skill], slug), lang);
export const kitWord = (t: T, lang: Language, slug: string) =>
  inSentence(named(t, `organise.equipment.${slug}`, EQUIPMENT_LABELS[slug as Equipment], slug), lang);
const listOf = (lang: Language, words: string[]) =>
  new Intl.ListFormat(intlLocale(lang), { type: 'conjunction' }).format(words);
const kitList = (t: T, lang: Language, kit: string[]) =>
  listOf(
    lang,
    kit.map((k) => kitWord(t, lang, k)),
  );

/** Why an item waits, in a sentence an organiser can act on. */
export function waitingText(why: WaitingWhy, t: T, lang: Language): string {
  switch (why.reason) {
    case 'no-skill':
      return t('organise.triage.why.noSkill', {
        skill: skillWord(t, lang, why.skill),
        level: why.level,
        levelWord: t(`organise.triage.level.${Math.max(1, Math.min(3, Math.round(why.level)))}`),
      });
    case 'no-equipment':
      return why.missing.length
        ? t('organise.triage.why.noKit', { kit: kitList(t, lang, why.missing) })
        : t('organise.triage.why.noKitTogether', { kit: kitList(t, lang, why.kit) });
    case 'no-pair':
      return t('organise.triage.why.noPair', {
        fixers: listOf(lang, why.fixers),
        n: why.fixers.length,
        skill: skillWord(t, lang, why.skill),
        kit: kitList(t, lang, why.kit),
      });
    case 'capacity':
      return t(why.allDay ? 'organise.triage.why.busyAllDay' : 'organise.triage.why.busy');
  }
}

/** A rule a placement breaks, in a sentence. */
export function warningText(w: PlacementWarning, t: T, lang: Language): string {
  const key = `organise.triage.warning.${w.code}`;
  switch (w.code) {
    case 'missing-skill':
      return t(key, { fixer: w.fixer, skill: skillWord(t, lang, w.skill) });
    case 'low-level':
      return t(key, { fixer: w.fixer, skill: skillWord(t, lang, w.skill), level: w.level, need: w.need });
    case 'missing-equipment':
      return t(key, { bench: w.bench, kit: kitList(t, lang, w.missing) });
    case 'seated-elsewhere':
      return t(key, { fixer: w.fixer });
    case 'over-capacity':
      return t(key, { fixer: w.fixer, n: w.n });
    case 'bench-full':
      return t(key, { bench: w.bench, n: w.seats });
    case 'gone':
      return t(key);
  }
}

/* A run's summary (shared/triage/run-summary.ts): needs, kit, skills and rules from their codes and values. */

const levelOf = (t: T, level: number) => t(`organise.triage.level.${Math.max(0, Math.min(3, Math.round(level)))}`);
const skillName = (t: T, slug: string) => named(t, `common.skill.${slug}`, SKILL_LABELS[slug as Skill], slug);

/** What an item asks of its fixer: "Electrical, capable or better"; an expert is always enough. */
export const needText = (t: T, skill: string, minLevel: number) =>
  t(minLevel >= 3 ? 'organise.triage.summary.needTop' : 'organise.triage.summary.needAtLeast', {
    skill: skillName(t, skill),
    level: levelOf(t, minLevel),
  });

/** Kinds of kit, by name, as a table cell lists them ("Soldering station, Multimeter"); empty when none. */
export const kitNames = (t: T, lang: Language, kit: string[]) =>
  new Intl.ListFormat(intlLocale(lang), { type: 'unit', style: 'short' }).format(
    kit.map((k) => named(t, `organise.equipment.${k}`, EQUIPMENT_LABELS[k as Equipment], k)),
  );

/** A fixer's skills, the strongest first: "Textiles (expert), Jewellery (capable)". */
export function skillsText(t: T, lang: Language, skills: { skill: string; level: number }[]): string {
  if (!skills.length) return t('organise.triage.summary.noSkills');
  const words = skills
    .map((s) => ({ level: s.level, name: skillName(t, s.skill) }))
    .sort((a, b) => b.level - a.level || a.name.localeCompare(b.name, intlLocale(lang)))
    .map((s) => t('organise.triage.summary.skillLevel', { skill: s.name, level: levelOf(t, s.level) }));
  return new Intl.ListFormat(intlLocale(lang), { type: 'unit', style: 'short' }).format(words);
}

/** The rules a run kept, in sentences: the whole session slot by slot, or one slot's round. */
export const ruleTexts = (t: T, scope: 'day' | 'slot', lockedKept: number) => [
  t('organise.triage.rule.match'),
  t('organise.triage.rule.seats'),
  t(scope === 'day' ? 'organise.triage.rule.day' : 'organise.triage.rule.slot'),
  t('organise.triage.rule.experts'),
  t('organise.triage.rule.locked', { n: lockedKept }),
];
