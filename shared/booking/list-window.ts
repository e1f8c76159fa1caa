/**
 * The public list of sessions starts a day back, so a session running today stays listed while it runs. The start
 * is rounded down to the hour: every visitor in that hour asks for the same URL, which the page's HTML can name for
 * an early fetch and which a cache can answer.
 */
export function publicListFrom(now: number): string {
  const HOUR = 3600_000;
  return new Date(Math.floor((now - 24 * HOUR) / HOUR) * HOUR).toISOString();
}
