/** A fixer's level in a skill, in words: 0 means they have not said they have it (skills are self-declared). */
export const SKILL_LEVEL_WORDS = ['no skill', 'learning', 'capable', 'expert'] as const;

const levelWord = (level: number) => SKILL_LEVEL_WORDS[Math.max(0, Math.min(3, Math.round(level)))];

/** What an item asks of its fixer: "Electronics, capable or better" (an expert is always enough). */
export function skillNeedPhrase(skillLabel: string, minLevel: number): string {
  return minLevel >= 3 ? `${skillLabel}, expert` : `${skillLabel}, ${levelWord(minLevel)} or better`;
}

/**
 * How a fixer stands against an item's need, for the organiser choosing by hand: "no Toys skill yet",
 * "Toys: learning — below the capable this item needs", "Toys: expert".
 */
export function fixerSkillPhrase(skillLabel: string, level: number, minLevel: number): string {
  if (level <= 0) return `no ${skillLabel} skill yet`;
  const has = `${skillLabel}: ${levelWord(level)}`;
  return level < minLevel ? `${has} — below the ${levelWord(minLevel)} this item needs` : has;
}
