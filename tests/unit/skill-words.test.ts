import { describe, expect, it } from 'vitest';
import { fixerSkillPhrase, skillNeedPhrase } from '../../shared/triage/skill-words';

// Levels as Mendery defines them (shared/constants.ts): 1 learning, 2 capable, 3 expert; 0 is no skill.
describe('a fixer’s skill level in words', () => {
  it('says a fixer without the skill has none yet, not a zero', () => {
    expect(fixerSkillPhrase('Toys', 0, 1)).toBe('no Toys skill yet');
  });
  it('names the level, and says when it is below what the item needs', () => {
    expect(fixerSkillPhrase('Toys', 2, 1)).toBe('Toys: capable');
    expect(fixerSkillPhrase('Electrical', 1, 2)).toBe('Electrical: learning — below the capable this item needs');
    expect(fixerSkillPhrase('Electrical', 3, 2)).toBe('Electrical: expert');
  });
  it('words an item’s need as a floor', () => {
    expect(skillNeedPhrase('Textiles', 1)).toBe('Textiles, learning or better');
    expect(skillNeedPhrase('Electrical', 2)).toBe('Electrical, capable or better');
    expect(skillNeedPhrase('Electrical', 3)).toBe('Electrical, expert');
  });
});
