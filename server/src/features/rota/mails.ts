import { formatDay, formatTimeRange } from '../../../../shared/format';
import { composeMail } from '../../mail/templates';

/** Asks one fixer to come to a session where visitors need a skill of theirs that nobody coming has. */
export function askForSkillMail(
  to: { email: string; name: string },
  event: { title: string; startsAt: Date; endsAt: Date },
  group: { name: string; timeZone: string },
  skills: string[],
  publicUrl: string,
) {
  return composeMail(to.email, `Can you help at ${event.title}?`, {
    paragraphs: [
      `Hello ${to.name},`,
      `${group.name} has visitors booked for ${event.title} on ${formatDay(event.startsAt, group.timeZone)} (${formatTimeRange(event.startsAt, event.endsAt, group.timeZone)}) who need ${skills.join(' and ')} — and nobody with that skill has said they are coming yet.`,
      'If you can come, even for part of the day, say so on your Mendery page.',
    ],
    action: { label: 'Say when I can come', url: `${publicUrl}/bench` },
  });
}
