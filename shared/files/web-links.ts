/**
 * A link a person may follow: an absolute http or https URL. Anything else (javascript:, data:, file:, mailto:, a
 * relative path) is refused when typed and never written as a link, on screen or in a mail.
 */
export function isWebLink(value: string | null | undefined): value is string {
  if (!value) return false;
  try {
    const url = new URL(value);
    return (url.protocol === 'http:' || url.protocol === 'https:') && url.hostname !== '';
  } catch {
    return false;
  }
}
