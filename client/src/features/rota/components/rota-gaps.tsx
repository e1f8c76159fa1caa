import { useState } from 'react';
import type { Rota } from '../api/types';
import { SKILL_LABELS, type Skill } from '../../../../../shared/constants';
import { formatTimeRange } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import { useAskForSkills } from '../api/ask-for-skills';

/** Times when booked items wait for a skill nobody coming has, and a mail to the group's fixers who have it. */
export function RotaGaps({ eventId, gaps, timeZone }: { eventId: number; gaps: Rota['gaps']; timeZone: string }) {
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
      <h2 className="text-lg">Gaps</h2>
      {gaps.length === 0 ? (
        <p className="text-sm text-ink-soft">Every booked item has a fixer with its skill in its slot.</p>
      ) : (
        <ul className="space-y-1 text-sm">
          {gaps.map((g) => (
            <li key={`${g.skill}${g.from}`}>
              <span className="font-bold">No {SKILL_LABELS[g.skill as Skill]?.toLowerCase() ?? g.skill} fixer</span>{' '}
              {formatTimeRange(g.from, g.to, timeZone)} ({g.items} item{g.items === 1 ? '' : 's'})
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
              {SKILL_LABELS[s] ?? s}
            </label>
          ))}
          <Button className="mt-2" disabled={!picked.size} busy={ask.isPending} onClick={() => ask.mutate([...picked])}>
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
  );
}
