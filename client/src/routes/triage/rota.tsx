import { useState } from 'react';
import { useParams } from 'react-router';
import { SKILL_LABELS, SKILLS, type Skill } from '../../../../shared/constants';
import { formatTime, formatTimeRange } from '../../../../shared/format';
import { EventTabs } from '../../components/layouts/event-tabs';
import { Button } from '../../components/ui/button';
import { Alert, Card, EmptyState, Spinner } from '../../components/ui/feedback';
import { useEvent } from '../../features/events/api/get-event';
import { useEventBenches } from '../../features/benches/api/get-event-benches';
import { useAskForSkills } from '../../features/rota/api/ask-for-skills';
import { useRota } from '../../features/rota/api/get-rota';
import { useSeatFixer } from '../../features/rota/api/seat-fixer';
import { useRefreshBoard } from '../../features/triage/api/get-board';

/** Who comes when, as a chart of skills × slots: green where covered, red where items wait for a skill nobody has. */
export function RotaPage() {
  const id = Number(useParams().eventId);
  const event = useEvent(id);
  const rota = useRota(id);
  const benches = useEventBenches(id);
  const ask = useAskForSkills(id);
  const seat = useSeatFixer(id, useRefreshBoard(id));
  const [picked, setPicked] = useState<Set<Skill>>(new Set());
  if (rota.isPending || event.isPending) return <Spinner label="Loading the rota…" />;
  if (rota.error) return <Alert tone="error">{rota.error.message}</Alert>;
  if (event.error) return <Alert tone="error">{event.error.message}</Alert>;
  const r = rota.data;
  const tz = event.data.timeZone;
  const shown = SKILLS.filter(
    (s) => r.coverage.some((c) => c.bySkill[s] > 0) || r.slots.some((sl) => sl.demand[s] > 0),
  );
  const gapSkills = [...new Set(r.gaps.map((g) => g.skill as Skill))];
  const toggle = (s: Skill) =>
    setPicked((p) => {
      const n = new Set(p);
      if (n.has(s)) n.delete(s);
      else n.add(s);
      return n;
    });

  return (
    <div>
      <h1 className="text-2xl sm:text-3xl">{event.data.title}</h1>
      <p className="mb-3 font-bold text-copper-dark">
        Rota · {formatTimeRange(event.data.startsAt, event.data.endsAt, tz)}
      </p>
      <EventTabs eventId={id} />

      <div className="grid gap-4 lg:grid-cols-[1fr_20rem]">
        <Card>
          <h2 className="text-lg">Skills covered, slot by slot</h2>
          <p className="text-sm text-ink-soft">
            Each cell: fixers with the skill present for the whole slot / items booked that need it.
          </p>
          <div className="mt-3 overflow-x-auto">
            <table className="text-center text-xs" aria-label="Skill cover by slot">
              <thead>
                <tr>
                  <th className="sticky left-0 bg-white px-2 py-1 text-left">Skill</th>
                  {r.slots.map((s) => (
                    <th key={s.id} className="px-1 py-1 font-bold">
                      {formatTime(s.startsAt, tz)}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {shown.map((skill) => (
                  <tr key={skill}>
                    <th className="sticky left-0 bg-white px-2 py-1 text-left font-semibold">{SKILL_LABELS[skill]}</th>
                    {r.slots.map((s, i) => {
                      const have = r.coverage[i].bySkill[skill];
                      const need = s.demand[skill];
                      const tone =
                        need > 0 && have === 0
                          ? 'bg-alert text-white'
                          : have === 0
                            ? 'bg-ink/5 text-ink-soft'
                            : need > have
                              ? 'bg-copper-light'
                              : 'bg-sage-light';
                      return (
                        <td
                          key={s.id}
                          className={`h-9 min-w-12 border border-white px-1 font-bold ${tone}`}
                          title={`${have} fixer(s), ${need} item(s)`}
                        >
                          {have}/{need}
                        </td>
                      );
                    })}
                  </tr>
                ))}
                <tr>
                  <th className="sticky left-0 bg-white px-2 py-1 text-left">All fixers</th>
                  {r.coverage.map((c, i) => (
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
              <span className="inline-block size-3 rounded bg-sage-light align-middle" /> covered
            </span>
            <span>
              <span className="inline-block size-3 rounded bg-copper-light align-middle" /> more items than fixers
            </span>
            <span>
              <span className="inline-block size-3 rounded bg-alert align-middle" /> items wait, nobody has the skill
            </span>
          </p>
        </Card>

        <Card className="space-y-3">
          <h2 className="text-lg">Gaps</h2>
          {r.gaps.length === 0 ? (
            <p className="text-sm text-ink-soft">Every booked item has a fixer with its skill in its slot.</p>
          ) : (
            <ul className="space-y-1 text-sm">
              {r.gaps.map((g) => (
                <li key={`${g.skill}${g.from}`}>
                  <span className="font-bold">No {SKILL_LABELS[g.skill as Skill]?.toLowerCase() ?? g.skill} fixer</span>{' '}
                  {formatTimeRange(g.from, g.to, tz)} ({g.items} item{g.items === 1 ? '' : 's'})
                </li>
              ))}
            </ul>
          )}
          {gapSkills.length > 0 && (
            <fieldset className="space-y-1">
              <legend className="text-sm font-bold">Ask the group’s fixers with…</legend>
              {gapSkills.map((s) => (
                <label key={s} className="flex items-center gap-2 text-sm">
                  <input
                    type="checkbox"
                    checked={picked.has(s)}
                    onChange={() => toggle(s)}
                    className="size-4 accent-copper"
                  />
                  {SKILL_LABELS[s as Skill] ?? s}
                </label>
              ))}
              <Button
                className="mt-2"
                disabled={!picked.size}
                busy={ask.isPending}
                onClick={() => ask.mutate([...picked])}
              >
                Mail them
              </Button>
              {ask.isSuccess && (
                <p role="status" className={`text-sm font-bold ${ask.data.sent ? 'text-sage' : 'text-ink-soft'}`}>
                  {ask.data.sent
                    ? `Asked ${ask.data.sent} fixer${ask.data.sent === 1 ? '' : 's'}.`
                    : 'Nobody else in the group has that skill.'}
                </p>
              )}
              {ask.error && <Alert tone="error">{ask.error.message}</Alert>}
            </fieldset>
          )}
        </Card>
      </div>

      <h2 className="mb-2 mt-6 text-xl">Who is coming</h2>
      {r.shifts.length === 0 ? (
        <EmptyState title="Nobody has answered yet" icon="☰">
          Fixers and reception say whether they come on their own page.
        </EmptyState>
      ) : (
        <div className="overflow-x-auto rounded-xl bg-white ring-1 ring-ink/5">
          <table className="w-full text-left text-sm">
            <thead className="bg-navy/5 text-navy">
              <tr>
                <th className="px-4 py-2">Name</th>
                <th className="px-4 py-2">Answer</th>
                <th className="px-4 py-2">Hours</th>
                <th className="px-4 py-2">Skills</th>
                <th className="px-4 py-2">Seat</th>
              </tr>
            </thead>
            <tbody>
              {r.shifts.map((s) => (
                <tr key={s.userId} className="border-t border-ink/5">
                  <td className="px-4 py-2 font-semibold">{s.name}</td>
                  <td className="px-4 py-2">{s.coming ? 'Coming' : 'Not coming'}</td>
                  <td className="px-4 py-2">{s.coming ? formatTimeRange(s.startsAt, s.endsAt, tz) : '—'}</td>
                  <td className="px-4 py-2 text-ink-soft">
                    {Object.entries(s.skills)
                      .map(([k, l]) => `${SKILL_LABELS[k as Skill] ?? k} ${l}`)
                      .join(', ') || '—'}
                  </td>
                  <td className="px-4 py-2">
                    {s.coming && (
                      <select
                        aria-label={`Seat for ${s.name}`}
                        value={s.benchId ?? ''}
                        onChange={(e) =>
                          seat.mutate({ userId: s.userId, benchId: e.target.value ? Number(e.target.value) : null })
                        }
                        className="rounded border border-ink/20 px-2 py-1"
                      >
                        <option value="">Free to move</option>
                        {benches.data?.map((b) => (
                          <option key={b.id} value={b.id}>
                            {b.name}
                          </option>
                        ))}
                      </select>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
