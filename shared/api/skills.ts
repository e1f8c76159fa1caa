import type { Skill } from '../constants';

/* The skills answers (no dates: the server's and the client's shape are the same). */

export interface Profile {
  skills: Record<string, 1 | 2 | 3>;
  kit: string[];
  notes: string;
}
/** The group's volunteers × skills, levels 1–3. */
export interface SkillsMatrix {
  skills: readonly Skill[];
  volunteers: {
    userId: number;
    name: string;
    email: string;
    roles: string[];
    skills: Record<string, number>;
    kit: string[];
    notes: string;
  }[];
}
