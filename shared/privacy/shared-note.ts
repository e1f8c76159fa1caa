import { scrubPersonalData } from './scrub';

/** The free-text parts of a repair note: what the visitor said was wrong, and what the fixers wrote. */
export interface NoteText {
  symptom: string;
  notes: string;
  measured: string;
  faultyPart: string;
  fix: string;
}

/**
 * A repair note as volunteers outside its group read it: the visitor's e-mail addresses, phone numbers and name
 * are taken out of every free-text part; the rest of the note (the thing, the fault, the fix) stays as written.
 */
export function scrubSharedNote<T extends NoteText>(note: T, visitorName: string | null | undefined): T {
  const names = visitorName ? [visitorName] : [];
  return {
    ...note,
    symptom: scrubPersonalData(note.symptom, names),
    notes: scrubPersonalData(note.notes, names),
    measured: scrubPersonalData(note.measured, names),
    faultyPart: scrubPersonalData(note.faultyPart, names),
    fix: scrubPersonalData(note.fix, names),
  };
}
