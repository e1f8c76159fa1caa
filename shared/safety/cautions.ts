/**
 * The usual cautions at a repair bench (common practice of repair groups, REFERENCE.md §6). They are reminders,
 * not instructions: local codes and a competent person's judgement prevail.
 */
export const HEATING_CATEGORY_SLUGS = ['kettle', 'coffee-maker', 'toaster', 'iron', 'hair-dryer'] as const;

export interface Caution {
  id: string;
  title: string;
  text: string;
}

export const CAUTIONS: Record<'mains' | 'capacitors' | 'thermal' | 'hot' | 'battery' | 'check', Caution> = {
  mains: {
    id: 'mains',
    title: 'Unplug and prove dead',
    text: 'Unplug before opening and prove it dead with a tester you have just checked on a live source. Work on a supply protected by an RCD; live work needs an isolation transformer and someone beside you.',
  },
  capacitors: {
    id: 'capacitors',
    title: 'Capacitors stay charged',
    text: 'Switch-mode power supplies hold about 300 V DC on their main capacitor after unplugging. Discharge it through a suitable resistor and measure before touching.',
  },
  thermal: {
    id: 'thermal',
    title: 'Never bypass a thermal fuse or cut-out',
    text: 'Replace a thermal fuse or cut-out only with one of the same rating, fitted the same way. A bridged cut-out can start a fire.',
  },
  hot: {
    id: 'hot',
    title: 'Hot surfaces',
    text: 'Heating elements, soleplates and toaster guards stay hot long after unplugging. Let them cool before handling.',
  },
  battery: {
    id: 'battery',
    title: 'Lithium batteries',
    text: 'Do not puncture, bend or short a lithium cell. A swollen or hot battery goes into a fire-safe container, away from the bench.',
  },
  check: {
    id: 'check',
    title: 'Safety check before it goes home',
    text: 'A mains item is checked with an appliance tester before it goes home; a failed check is never recorded as fixed.',
  },
};

export const LOCAL_RULES_PREVAIL =
  'These limits and cautions are reminders from common practice and the published test limits. Local codes, your group’s rules and a competent person’s judgement prevail.';

/** Which cautions an item's page shows first. */
export function cautionsFor(item: { mains: boolean; battery: boolean; heating: boolean }): Caution[] {
  const out: Caution[] = [];
  if (item.mains) out.push(CAUTIONS.mains, CAUTIONS.capacitors);
  if (item.heating) out.push(CAUTIONS.thermal, CAUTIONS.hot);
  if (item.battery) out.push(CAUTIONS.battery);
  if (item.mains) out.push(CAUTIONS.check);
  return out;
}
