import { describe, expect, it } from 'vitest';
import { scrubSharedNote } from '../../shared/privacy/shared-note';

// Worked examples: invented visitors; 07700 900xxx is a range Ofcom keeps for drama (never a real line).
describe('scrubSharedNote', () => {
  it('takes the visitor’s name, address and number out of every free-text part, and keeps the repair', () => {
    const note = {
      itemId: 7,
      symptom: 'Mira Okafor here - toaster only heats one side. Call 07700 900456 or mira.okafor@example.com',
      notes: 'Mira says it was dropped.',
      measured: 'Element B open circuit',
      faultyPart: 'Heating element',
      fix: 'Replaced element; told Mira to keep it away from the sink',
    };
    expect(scrubSharedNote(note, 'Mira Okafor')).toEqual({
      itemId: 7,
      symptom: '[name] here - toaster only heats one side. Call [number] or [e-mail]',
      notes: '[name] says it was dropped.',
      measured: 'Element B open circuit',
      faultyPart: 'Heating element',
      fix: 'Replaced element; told [name] to keep it away from the sink',
    });
  });

  it('still takes out addresses and numbers when the visitor’s name is no longer known', () => {
    const note = { symptom: 'Ring +44 7700 900789 about it', notes: '', measured: '', faultyPart: '', fix: '' };
    expect(scrubSharedNote(note, null).symptom).toBe('Ring [number] about it');
  });

  it('leaves a note without personal data exactly as written', () => {
    const note = { symptom: 'Lamp flickers at 230 V', notes: 'Loose terminal', measured: '', faultyPart: '', fix: '' };
    expect(scrubSharedNote(note, 'Tom Reyes')).toEqual(note);
  });
});
