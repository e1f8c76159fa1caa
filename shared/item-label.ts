/** How an item is named everywhere, on screen and in mail: "Kettle — Brava K200", or just the kind. */
export function itemLabel(i: { categoryName: string; brand?: string | null; model?: string | null }): string {
  const make = [i.brand, i.model]
    .map((s) => s?.trim())
    .filter(Boolean)
    .join(' ');
  return make ? `${i.categoryName} — ${make}` : i.categoryName;
}
