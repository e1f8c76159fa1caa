import { asLanguage, DEFAULT_LANGUAGE, type Language } from '../../../../shared/i18n/languages';
import { intlLocale } from '../../../../shared/format';
import { categoryText, translate } from '../../i18n';
import { impact } from '../../../../shared/impact/statistics';
import type { AppContext } from '../../context';
import { enqueueMail } from '../../mail/outbox';
import { composeMail } from '../../mail/templates';
import { displacement, impactCategories } from './queries/stats';
import { eventsDueThanks, markThanked, visitorItems, volunteersWhoCame } from './queries/thanks';
import { stats } from './service';

const kg = (x: number, lang: Language) =>
  `${new Intl.NumberFormat(intlLocale(lang), { maximumFractionDigits: 1 }).format(x)} kg`;

/**
 * Two hours after an event ends (and within a week of it), once: each visitor hears what happened to their items
 * and what that saved; each volunteer who came gets the event's totals.
 */
export async function sendThankYous(ctx: AppContext): Promise<number> {
  const { db } = ctx.database;
  const now = Date.now();
  const n = await db.transaction(async (tx) => {
    const due = await eventsDueThanks(tx, now);
    const cats = await impactCategories(tx);
    const d = await displacement(tx);
    for (const { event, group } of due) {
      const items = await visitorItems(tx, event.id);
      for (const bookingId of new Set(items.map((i) => i.bookingId))) {
        const mine = items.filter((i) => i.bookingId === bookingId);
        const t = impact(
          mine.map((i) => ({
            itemId: i.itemId,
            categoryId: i.categoryId,
            date: event.startsAt,
            outcome: i.outcome,
            weighedKg: i.weighedKg,
          })),
          cats,
          d,
        );
        // In the language the visitor booked in.
        const lang = asLanguage(mine[0].language, asLanguage(group.defaultLanguage));
        const m = (key: string, values?: Record<string, unknown>) => translate(lang, `mail.thanks.${key}`, values);
        const num = (x: number) => new Intl.NumberFormat(lang, { maximumFractionDigits: 1 }).format(x);
        await enqueueMail(
          tx,
          composeMail(mine[0].email!, m('subject', { group: group.name }), {
            paragraphs: [
              translate(lang, 'mail.hello', { name: mine[0].name.split(' ')[0] }),
              m('text', { count: mine.length, event: event.title }),
              ...mine.map((i) => {
                const values = {
                  kind: categoryText(lang, i.categorySlug, 'name', i.categoryName),
                  outcome: i.outcome ? translate(lang, `fixer.outcomeValue.${i.outcome}`) : m('noOutcome'),
                  part: i.part,
                };
                return m(i.outcome === 'parts-needed' && i.part ? 'itemPart' : 'item', values);
              }),
              ...(t.fixed ? [m('saved', { count: t.fixed, kg: num(t.kgDiverted), co2e: num(t.co2eKg) })] : []),
            ],
            footnote: m('footnote'),
            language: lang,
          }),
        );
      }
      const s = await stats(ctx, { eventId: event.id }, DEFAULT_LANGUAGE);
      const team = await volunteersWhoCame(tx, event.id);
      for (const v of team) {
        // In the volunteer's own language, else the group's.
        const lang = asLanguage(v.language, asLanguage(group.defaultLanguage));
        const m = (key: string, values?: Record<string, unknown>) => translate(lang, `mail.team.${key}`, values);
        await enqueueMail(
          tx,
          composeMail(v.email, m('subject', { event: event.title }), {
            paragraphs: [
              translate(lang, 'mail.hello', { name: v.name.split(' ')[0] }),
              m('text', {
                event: event.title,
                items: s.items,
                fixed: s.fixed,
                parts: s.partsNeeded,
                advice: s.advice,
                endOfLife: s.endOfLife,
              }),
              m('saved', { kg: kg(s.kgDiverted, lang), co2e: kg(s.co2eKg, lang) }),
            ],
            action: { label: m('action'), url: `${ctx.env.publicUrl}/events/${event.id}/report` },
            language: lang,
          }),
        );
      }
      await markThanked(tx, event.id);
    }
    return due.length;
  });
  if (n) ctx.outbox.kick();
  return n;
}
