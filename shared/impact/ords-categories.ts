/**
 * The Open Repair Data Standard's product_category codelist (v0.3, REFERENCE.md §5: id, text) and where Mendery's
 * seeded categories fall in it. The codelist covers powered items only. Its wording belongs to the file; screens show
 * Mendery's category names.
 */
export const ORDS_PRODUCT_CATEGORIES = [
  'Aircon/dehumidifier',
  'Battery/charger/adapter',
  'Decorative or safety lights',
  'Desktop computer',
  'Digital compact camera',
  'DSLR/video camera',
  'Fan',
  'Flat screen',
  'Hair & beauty item',
  'Handheld entertainment device',
  'Headphones',
  'Hi-Fi integrated',
  'Hi-Fi separates',
  'Kettle',
  'Lamp',
  'Laptop',
  'Large home electrical',
  'Misc',
  'Mobile',
  'Musical instrument',
  'Paper shredder',
  'PC accessory',
  'Portable radio',
  'Power tool',
  'Printer/scanner',
  'Projector',
  'Sewing machine',
  'Small home electrical',
  'Small kitchen item',
  'Tablet',
  'Toaster',
  'Toy',
  'TV and gaming-related accessories',
  'Vacuum',
  'Watch/clock',
  'Coffee maker',
  'Food processor',
  'Games console',
  'Hair dryer',
  'Iron',
] as const;
export type OrdsProductCategory = (typeof ORDS_PRODUCT_CATEGORIES)[number];

/** The codelist id of a text: its place in the list, from 1. */
export const ordsCategoryId = (text: OrdsProductCategory) => ORDS_PRODUCT_CATEGORIES.indexOf(text) + 1;

/**
 * Mendery's seeded powered categories in the codelist. Where one of ours spans several codelist entries, it goes to
 * the entry that holds all of it ("Hair dryer, shaver or other personal care" → Hair & beauty item), or to the
 * entry for the items groups see most (our judgement, marked so in the decision record).
 */
export const ORDS_CATEGORY_OF_SLUG: Record<string, OrdsProductCategory> = {
  kettle: 'Kettle',
  'coffee-maker': 'Coffee maker',
  toaster: 'Toaster',
  'food-mixer': 'Food processor',
  iron: 'Iron',
  'vacuum-cleaner': 'Vacuum',
  'hair-dryer': 'Hair & beauty item',
  lamp: 'Lamp',
  'led-lamp': 'Lamp',
  'power-tool': 'Power tool',
  'washing-machine': 'Large home electrical',
  clock: 'Watch/clock',
  'radio-hifi': 'Portable radio',
  speaker: 'Headphones',
  'video-player': 'TV and gaming-related accessories',
  television: 'Flat screen',
  monitor: 'Flat screen',
  'game-console': 'Games console',
  laptop: 'Laptop',
  'desktop-pc': 'Desktop computer',
  printer: 'Printer/scanner',
  'small-it': 'PC accessory',
  phone: 'Mobile',
  tablet: 'Tablet',
  'electric-toy': 'Toy',
  microwave: 'Small kitchen item',
  fridge: 'Large home electrical',
};

/**
 * Unpowered kinds, written the way the published open data summarises them ("Unpowered - <kind>", REFERENCE.md §5;
 * the kinds' names are ours, following that pattern).
 */
export const UNPOWERED_KIND_OF_SLUG: Record<string, string> = {
  toy: 'Toy',
  clothing: 'Clothing',
  'bag-textile': 'Textiles',
  bicycle: 'Bicycle',
  'wooden-chair': 'Furniture',
  table: 'Furniture',
  jewellery: 'Jewellery',
  mechanical: 'Misc',
  'gas-appliance': 'Misc',
};

export type OrdsCategory = { powered: true; id: number; text: OrdsProductCategory } | { powered: false; text: string };

/**
 * Where a category goes in the file. An electrical category (one with a WEEE category) that has no mapping of its
 * own, such as one an admin added, is "Misc"; a category with no WEEE category is unpowered.
 */
export function ordsCategoryOf(c: { slug: string; weeeCategory: number | null }, kept?: string | null): OrdsCategory {
  // A record brought in from a file keeps the category the file gave it.
  if (kept && (ORDS_PRODUCT_CATEGORIES as readonly string[]).includes(kept))
    return { powered: true, id: ordsCategoryId(kept as OrdsProductCategory), text: kept as OrdsProductCategory };
  if (kept && /^Unpowered - \S/.test(kept)) return { powered: false, text: kept };
  const mapped = ORDS_CATEGORY_OF_SLUG[c.slug];
  if (mapped) return { powered: true, id: ordsCategoryId(mapped), text: mapped };
  if (c.weeeCategory !== null) return { powered: true, id: ordsCategoryId('Misc'), text: 'Misc' };
  return { powered: false, text: `Unpowered - ${UNPOWERED_KIND_OF_SLUG[c.slug] ?? 'Misc'}` };
}
