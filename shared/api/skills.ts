/* The skills answers as the client reads them. */

export interface Profile {
  skills: Record<string, 1 | 2 | 3>;
  kit: string[];
  notes: string;
}
/** The group's volunteers × skills, levels 1–3. */
export interface SkillsMatrix {
  skills: string[];
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
