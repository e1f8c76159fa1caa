import type { Hazard } from '../constants';

export interface ScreenCategory {
  id: number;
  name: string;
  refusal?: { reason: string; suggestion: string } | null;
}

export type ScreenResult = { ok: true } | { ok: false; reason: string; suggestion: string };

/** Common practice of repair groups: conditions that rule an item out whatever the group's own list says. */
export const HAZARD_REFUSALS: Record<Hazard, { question: string; reason: string; suggestion: string }> = {
  'swollen-battery': {
    question: 'The battery is swollen, bulging or has leaked',
    reason: 'A swollen lithium battery can catch fire when pressed, punctured or charged.',
    suggestion:
      'Do not charge it. Take it to a battery recycling point, and bring the item back once the battery is out.',
  },
  'damaged-cable': {
    question: 'The mains cable or plug is cut, melted or has bare wires',
    reason: 'An item with damaged mains insulation is dangerous to plug in, even to find the fault.',
    suggestion:
      'Do not plug it in. A qualified electrician can replace the cable; or contact the group to ask whether a fixer can fit a new one.',
  },
  gas: {
    question: 'It runs on gas',
    reason: 'Gas appliances must be serviced by a registered gas engineer.',
    suggestion: 'Contact a registered gas engineer near you.',
  },
};

/**
 * Decides whether a group takes an item: hazards first (they rule an item out anywhere), then the group's
 * excluded categories, explained with the category's own reason where it has one (microwave ovens…).
 */
export function screenItem(
  category: ScreenCategory,
  hazards: readonly Hazard[],
  group: { name: string; excludedCategoryIds: readonly number[] },
): ScreenResult {
  const hazard = hazards[0];
  if (hazard)
    return { ok: false, reason: HAZARD_REFUSALS[hazard].reason, suggestion: HAZARD_REFUSALS[hazard].suggestion };
  if (group.excludedCategoryIds.includes(category.id)) {
    return category.refusal
      ? { ok: false, reason: category.refusal.reason, suggestion: category.refusal.suggestion }
      : {
          ok: false,
          reason: `${group.name} does not take this kind of item (${category.name.toLowerCase()}).`,
          suggestion: 'Look for another group’s event that takes it, or ask the organisers.',
        };
  }
  return { ok: true };
}
