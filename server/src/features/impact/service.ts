import type {
  EventReport,
  Method,
  PublicImpact,
  RecordsPage,
  SessionFigures,
  Stats,
} from '../../../../shared/api/impact';
import { DEFAULT_DISPLACEMENT } from '../../../../shared/impact/factors';
import { sourceForReaders } from '../../../../shared/impact/for-readers';
import { factorSourceWords, methodLines, weightSourceWords, type Words } from '../../../../shared/impact/method-words';
import type { Language } from '../../../../shared/i18n/languages';
import { intlLocale } from '../../../../shared/format';
import { totalsFromCells } from '../../../../shared/impact/statistics';
import { shortName } from '../../../../shared/event-day/tag-code';
import type { AppContext } from '../../context';
import { HttpError, notFound } from '../../http/errors';
import { categoryText, translate } from '../../i18n';
import {
  countEventsWithFigures,
  displacement,
  groupById,
  impactCategories,
  readCells,
  readSessionCells,
  recordRows,
  sessionsInRange,
  setDisplacement as storeDisplacement,
  volunteerShifts,
  type RecordsFilter,
  type StatsFilter,
} from './queries/stats';
import { eventWithGroup } from '../../core/events';

export type { StatsFilter };

export const getDisplacement = (ctx: AppContext) => displacement(ctx.database.db);

export async function setDisplacement(ctx: AppContext, value: number): Promise<number> {
  await storeDisplacement(ctx.database.db, value);
  return getDisplacement(ctx);
}

const hoursOf = (shift: { startsAt: Date; endsAt: Date }) =>
  (shift.endsAt.getTime() - shift.startsAt.getTime()) / 3600_000;
const round2 = (x: number) => Math.round(x * 100) / 100;

/** The kinds of item with their names in the reader's language (an admin's own name as typed). */
async function kindsIn(ctx: AppContext, lang: Language) {
  return (await impactCategories(ctx.database.db)).map((c) => ({
    ...c,
    name: categoryText(lang, c.slug, 'name', c.name),
  }));
}

/** Statistics for a group, an event, a date range or the whole network. */
export async function stats(ctx: AppContext, f: StatsFilter, lang: Language): Promise<Stats> {
  const { db } = ctx.database;
  const [c, cats, d] = await Promise.all([readCells(db, f), kindsIn(ctx, lang), displacement(db)]);
  return { ...totalsFromCells(c, cats, d), displacement: d, filter: f };
}

/** Each past session's outcomes and kilograms, for the group's session list (the same engine as every figure). */
export async function sessionFigures(ctx: AppContext, groupId: number): Promise<SessionFigures[]> {
  const { db } = ctx.database;
  const [cells, cats, d] = await Promise.all([readSessionCells(db, groupId), impactCategories(db), displacement(db)]);
  const byEvent = new Map<number, typeof cells>();
  for (const c of cells) byEvent.set(c.eventId, [...(byEvent.get(c.eventId) ?? []), c]);
  return [...byEvent].map(([eventId, cs]) => {
    const t = totalsFromCells(cs, cats, d);
    return {
      eventId,
      items: t.items,
      fixed: t.fixed,
      partsNeeded: t.partsNeeded,
      advice: t.advice,
      endOfLife: t.endOfLife,
      unknown: t.unknown,
      kgDiverted: t.kgDiverted,
    };
  });
}

const say = (lang: Language, w: Words) => translate(lang, w.key, w.values);
const figure = (lang: Language, n: number) =>
  new Intl.NumberFormat(intlLocale(lang), { maximumFractionDigits: 6 }).format(n);

/**
 * The method and its sources, shown beside every figure, in the reader's language: our sentences by their catalog
 * keys (`figures.method.*`, `figures.source.*`), a publication's title inside them as published. A source an admin
 * typed is shown as typed.
 */
export async function method(ctx: AppContext, lang: Language): Promise<Method> {
  const [cats, d] = await Promise.all([kindsIn(ctx, lang), displacement(ctx.database.db)]);
  const estimate = translate(lang, 'figures.source.estimate');
  return {
    displacement: d,
    displacementNote: translate(lang, 'figures.method.displacementNote', {
      shipped: figure(lang, DEFAULT_DISPLACEMENT),
    }),
    displacementSource: translate(lang, 'figures.method.displacementSource'),
    factorSource: translate(lang, 'figures.source.factors'),
    text: methodLines(figure(lang, d)).map((w) => say(lang, w)),
    categories: cats.map((c) => {
      const weight = weightSourceWords(c.slug, c.weightSource);
      const forReaders = weightSourceWords(c.slug, c.weightSource, true);
      const factor = factorSourceWords(c.slug, c.co2eSource);
      return {
        id: c.id,
        name: c.name,
        avgWeightKg: c.avgWeightKg,
        weightSource: weight ? say(lang, weight) : c.weightSource,
        weightSourceForReaders: forReaders ? say(lang, forReaders) : sourceForReaders(c.weightSource, estimate),
        co2ePerKg: c.co2ePerKg,
        co2eSource: factor ? say(lang, factor) : c.co2eSource,
      };
    }),
  };
}

/** The records behind a figure, newest first, 50 a page. */
export async function records(
  ctx: AppContext,
  f: RecordsFilter & { page?: number },
  lang: Language,
): Promise<RecordsPage> {
  const page = Math.max(1, f.page ?? 1);
  const rows = await recordRows(ctx.database.db, f, page);
  return {
    total: Number(rows[0]?.total ?? 0),
    page,
    records: rows.map(({ total: _t, visitorName, avgWeightKg, categorySlug, ...r }) => ({
      ...r,
      categoryName: categoryText(lang, categorySlug, 'name', r.categoryName),
      visitor: shortName(visitorName),
      kg: r.weighedKg ?? avgWeightKg,
      outcomeLabel: translate(lang, r.outcome ? `fixer.outcomeValue.${r.outcome}` : 'figures.records.notRecorded'),
      barrierLabel: r.barrier ? translate(lang, `fixer.barrier.${r.barrier}`) : null,
    })),
  };
}

/** A funder's one-page report of an event: totals, categories, the volunteers' hours, the method. */
export async function eventReport(ctx: AppContext, eventId: number, lang: Language): Promise<EventReport> {
  const { db } = ctx.database;
  const e = await eventWithGroup(db, eventId);
  if (!e) throw notFound('That event');
  const hours = (await volunteerShifts(db, [eventId])).map((v) => ({ name: v.name, hours: round2(hoursOf(v)) }));
  return {
    event: {
      id: e.event.id,
      title: e.event.title,
      startsAt: e.event.startsAt,
      endsAt: e.event.endsAt,
      groupId: e.group.id,
      groupName: e.group.name,
      timeZone: e.group.timeZone,
    },
    stats: await stats(ctx, { eventId }, lang),
    volunteers: hours,
    volunteerHours: Math.round(hours.reduce((n, v) => n + v.hours, 0) * 100) / 100,
    method: await method(ctx, lang),
  };
}

/** The same report for a group over a date range: every session in it, the volunteers' hours added up. */
export async function rangeReport(
  ctx: AppContext,
  lang: Language,
  groupId: number,
  from?: string,
  to?: string,
): Promise<EventReport> {
  const { db } = ctx.database;
  const g = await groupById(db, groupId);
  if (!g) throw notFound('That group');
  const sessions = await sessionsInRange(db, groupId, from, to);
  const byName = new Map<string, number>();
  for (const r of await volunteerShifts(
    db,
    sessions.map((e) => e.id),
  ))
    byName.set(r.name, (byName.get(r.name) ?? 0) + hoursOf(r));
  const hours = [...byName]
    .map(([name, h]) => ({ name, hours: round2(h) }))
    .sort((a, b) => a.name.localeCompare(b.name));
  const first = sessions[0]?.startsAt ?? (from ? new Date(`${from}T00:00:00Z`) : new Date());
  const last = sessions[sessions.length - 1]?.endsAt ?? (to ? new Date(`${to}T23:59:59Z`) : new Date());
  return {
    event: {
      id: 0,
      title: translate(lang, 'figures.report.rangeTitle', { group: g.name, n: sessions.length }),
      startsAt: first,
      endsAt: last,
      groupId: g.id,
      groupName: g.name,
      timeZone: g.timeZone,
    },
    range: { from: from ?? null, to: to ?? null, sessions: sessions.length },
    stats: await stats(ctx, { groupId, from, to }, lang),
    volunteers: hours,
    volunteerHours: Math.round(hours.reduce((n, v) => n + v.hours, 0) * 100) / 100,
    method: await method(ctx, lang),
  };
}

/** Public figures: the same totals, with nothing about any person. */
export async function publicImpact(ctx: AppContext, lang: Language, groupId?: number): Promise<PublicImpact> {
  const { db } = ctx.database;
  const g = groupId ? await groupById(db, groupId) : undefined;
  if (groupId && !g) throw notFound('That group');
  const { filter: _f, ...rest } = await stats(ctx, { groupId }, lang);
  return {
    ...rest,
    group: g ? { name: g.name, town: g.town } : null,
    events: await countEventsWithFigures(db, groupId),
    method: await method(ctx, lang),
  };
}

export function assertDateRange(from?: string, to?: string) {
  if (from && to && from > to)
    throw new HttpError(400, 'invalid', 'errors.invalid', {
      to: 'The end date is before the start date.',
    });
}
