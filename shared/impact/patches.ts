/**
 * Shares of a whole as a fixed number of patches (the public page's quilt): each part gets its whole number of
 * patches, then the patches left over go to the largest remainders (Hamilton's method), so they always add up.
 */
export function patchesOf(counts: readonly number[], patches: number): number[] {
  const total = counts.reduce((n, c) => n + c, 0);
  if (total <= 0) return counts.map(() => 0);
  const exact = counts.map((c) => (c / total) * patches);
  const given = exact.map(Math.floor);
  const left = patches - given.reduce((n, g) => n + g, 0);
  const byRemainder = exact
    .map((e, i) => ({ i, r: e - given[i] }))
    .sort((a, b) => b.r - a.r || a.i - b.i)
    .slice(0, left);
  for (const { i } of byRemainder) given[i]++;
  return given;
}
