/**
 * Label stock for intake tags, in millimetres. Sheet layouts are the common A4 ones (sizes as printed on the
 * packs, from memory); the print page uses these numbers for its CSS so labels line up.
 */
export interface LabelLayout {
  id: string;
  name: string;
  page: { width: number; height: number };
  label: { width: number; height: number };
  columns: number;
  rows: number;
  /** Page margins and gaps between labels. */
  top: number;
  left: number;
  gapX: number;
  gapY: number;
}

export const A4 = { width: 210, height: 297 };

function centred(
  id: string,
  name: string,
  label: { width: number; height: number },
  columns: number,
  rows: number,
  gapX: number,
): LabelLayout {
  const left = Math.round(((A4.width - columns * label.width - (columns - 1) * gapX) / 2) * 100) / 100;
  const top = Math.round(((A4.height - rows * label.height) / 2) * 100) / 100;
  return { id, name, page: A4, label, columns, rows, top, left, gapX, gapY: 0 };
}

export const LABEL_LAYOUTS: LabelLayout[] = [
  centred('a4-24', 'A4 sheet, 24 labels 63.5 × 33.9 mm (3 × 8)', { width: 63.5, height: 33.9 }, 3, 8, 2.5),
  centred('a4-21', 'A4 sheet, 21 labels 63.5 × 38.1 mm (3 × 7)', { width: 63.5, height: 38.1 }, 3, 7, 2.5),
  {
    id: 'roll-62',
    name: 'Label roll 62 mm wide (62 × 40 mm per tag)',
    page: { width: 62, height: 40 },
    label: { width: 62, height: 40 },
    columns: 1,
    rows: 1,
    top: 0,
    left: 0,
    gapX: 0,
    gapY: 0,
  },
];

export const layoutById = (id: string) => LABEL_LAYOUTS.find((l) => l.id === id) ?? LABEL_LAYOUTS[0];

/** Whether the labels, margins and gaps fit on the page. */
export function fits(l: Pick<LabelLayout, 'page' | 'label' | 'columns' | 'rows' | 'gapX' | 'gapY'>): boolean {
  const w = l.columns * l.label.width + (l.columns - 1) * l.gapX;
  const h = l.rows * l.label.height + (l.rows - 1) * l.gapY;
  return w <= l.page.width + 1e-9 && h <= l.page.height + 1e-9;
}

/** Splits tags into pages of the layout; a start offset skips labels already used on a part-used sheet. */
export function paginate<T>(tags: readonly T[], l: LabelLayout, skip = 0): (T | null)[][] {
  const per = l.columns * l.rows;
  const cells: (T | null)[] = [...Array(Math.min(Math.max(0, skip), per - 1)).fill(null), ...tags];
  const pages: (T | null)[][] = [];
  for (let i = 0; i < cells.length; i += per) pages.push(cells.slice(i, i + per));
  return pages;
}
