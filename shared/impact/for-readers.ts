/**
 * Sources marked "from memory" were not checked. People outside the group read the report and the public page, so
 * there the figure is called an estimate in plain words; the dashboard's method section keeps the mark.
 */
const MEMORY_MARKS = [/\s*\(from memory[^)]*\)/gi, /,?\s*from memory(?=[;,.]|$)/gi];

export const ESTIMATE = 'Estimate: a typical weight, not a published figure';

/** `estimate` is ESTIMATE in the reader's language (figures.source.estimate); the rest is the source as typed. */
export function sourceForReaders(source: string, estimate: string = ESTIMATE): string {
  if (!/from memory/i.test(source)) return source;
  const rest = MEMORY_MARKS.reduce((s, mark) => s.replace(mark, ''), source)
    .replace(/\s+([;,.])/g, '$1')
    .replace(/^[\s;,.]+|\s+$/g, '');
  return rest ? `${estimate}; ${rest.charAt(0).toLowerCase()}${rest.slice(1)}` : estimate;
}
