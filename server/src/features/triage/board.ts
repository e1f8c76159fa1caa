import { dayPlan } from '../../../../shared/triage/day-plan';
import type { Board } from '../../../../shared/api/triage';
import type { TriageResult } from '../../../../shared/triage/engine';
import type { AppContext } from '../../context';
import { loadEvent, warningsFor, windowOf } from './event-data';
import { recentRuns, runRow } from './queries';
import { storedReasons } from '../../../../shared/triage/run-summary';
import { storedWhy } from '../../../../shared/triage/waiting';
import { categoryText } from '../../i18n';
import { DEFAULT_LANGUAGE, type Language } from '../../../../shared/i18n/languages';

/** The triage board: benches and fixers with their items, the unplaced items with reasons, the day plan. */
export async function board(ctx: AppContext, eventId: number, lang: Language = DEFAULT_LANGUAGE): Promise<Board> {
  const data = await loadEvent(ctx, eventId);
  const runs = await recentRuns(ctx.database.db, eventId);
  const latest = runs[0]?.result as TriageResult | undefined;
  // A run stored before reasons kept their values has them worked out again from its input.
  const old = (latest?.unassigned ?? []).some((u) => !storedWhy(u));
  const whyOf = storedReasons(old ? (await runRow(ctx.database.db, eventId, runs[0].id))?.input : undefined);
  const reasons = new Map(
    (latest?.unassigned ?? []).flatMap((u) => {
      const why = whyOf(u);
      return why ? [[Number(u.itemId), { ...why, detail: u.detail }] as const] : [];
    }),
  );
  const placedBy = new Map(data.placed.map((p) => [p.itemId, p]));
  const plan = dayPlan({
    slots: data.slots.map((s) => ({ id: String(s.id), startsAt: s.startsAt, endsAt: s.endsAt })),
    items: data.items.map((i) => ({
      id: String(i.id),
      slotIndex: i.slotIndex,
      skill: i.needs.skill,
      minLevel: i.needs.minLevel,
      equipment: i.needs.equipment,
      minutes: i.minutes,
      order: i.order,
    })),
    volunteers: data.fixers.map((f) => ({
      id: String(f.userId),
      skills: f.skills,
      from: f.startsAt,
      to: f.endsAt,
      ...(f.benchId ? { benchId: String(f.benchId) } : {}),
    })),
    benches: data.benches.map((b) => ({ id: String(b.id), equipment: b.equipment, seats: b.seats })),
  });
  const items = data.items.map((i) => {
    const p = placedBy.get(i.id);
    const fixer = p && data.fixers.find((f) => f.userId === p.userId);
    const bench = p && data.benches.find((b) => b.id === p.benchId);
    const w = p ? windowOf(data, i.id, p.startsAt) : null;
    const warnings =
      p && fixer && bench && w ? warningsFor(data, i, fixer, bench, w) : p ? [{ code: 'gone' as const }] : [];
    return {
      id: i.id,
      reference: i.reference,
      visitorName: i.visitorName,
      bookedAt: i.bookedAt,
      slotId: i.slotId,
      categoryName: categoryText(lang, i.categorySlug, 'name', i.categoryName),
      brand: i.brand,
      model: i.model,
      fault: i.fault,
      mains: i.mains,
      minutes: i.minutes,
      needs: i.needs,
      photoIds: i.photoIds,
      placement: p
        ? { userId: p.userId, benchId: p.benchId, locked: Boolean(p.locked), source: p.source, startsAt: p.startsAt }
        : null,
      warnings,
      reason: p ? null : (reasons.get(i.id) ?? null),
      estimatedStart: p ? (p.startsAt ?? plan.start[String(i.id)]) : null,
    };
  });
  return {
    event: {
      id: data.event.id,
      title: data.event.title,
      status: data.event.status,
      startsAt: data.event.startsAt,
      endsAt: data.event.endsAt,
      groupId: data.group.id,
      groupName: data.group.name,
      timeZone: data.group.timeZone,
    },
    slots: data.slots.map((s) => ({ id: s.id, startsAt: s.startsAt, endsAt: s.endsAt })),
    benches: data.benches.map((b) => ({ id: b.id, name: b.name, seats: b.seats, equipment: b.equipment })),
    fixers: data.fixers,
    items,
    runs: runs.map((r) => ({
      id: r.id,
      slotId: r.slotId,
      createdAt: r.createdAt,
      assigned: (r.result as TriageResult).assignments.length,
      unassigned: (r.result as TriageResult).unassigned.length,
      lockedKept: r.lockedKept,
    })),
  };
}
