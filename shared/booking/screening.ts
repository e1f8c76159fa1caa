import type { Hazard } from '../constants';

export interface ScreenCategory {
  id: number;
  name: string;
  refusal?: { reason: string; suggestion: string } | null;
}

/**
 * Why an item is refused, as a code and its values; the screen or the API words it in the reader's language
 * (booking.hazard.* and booking.refusedGeneric on the client, problems.hazard.* and problems.notTaken on the
 * server). A kind's own refusal carries its words as stored for the kind (the API's, in the reader's language).
 */
export type ScreenRefusal =
  | { ok: false; code: 'hazard'; hazard: Hazard }
  | { ok: false; code: 'category'; categoryId: number; reason: string; suggestion: string }
  | { ok: false; code: 'not-taken'; categoryId: number; group: string; category: string };
export type ScreenResult = { ok: true } | ScreenRefusal;

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
  if (hazard) return { ok: false, code: 'hazard', hazard };
  if (group.excludedCategoryIds.includes(category.id)) {
    return category.refusal
      ? {
          ok: false,
          code: 'category',
          categoryId: category.id,
          reason: category.refusal.reason,
          suggestion: category.refusal.suggestion,
        }
      : { ok: false, code: 'not-taken', categoryId: category.id, group: group.name, category: category.name };
  }
  return { ok: true };
}
