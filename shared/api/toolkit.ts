import type { Outcome } from '../event-day/constants';
import type { PartRatings, PartType } from '../salvage/constants';
import type { SubstituteVerdict } from '../salvage/match';

/* The toolkit API's answers as the server returns them; the client reads them as `Json<T>` (dates as ISO strings). */

/** One repair note: the write-up when there is one, else the fault and the fixer's notes. */
export interface KnowledgeEntry {
  itemId: number;
  groupName: string;
  categoryId: number;
  categoryName: string;
  brand: string;
  model: string;
  outcome: Outcome;
  outcomeLabel: string;
  symptom: string;
  notes: string;
  measured: string;
  faultyPart: string;
  fix: string;
  writtenUp: boolean;
  eventDate: Date;
  score: number;
  photoIds: string[];
}
export interface KnowledgeQuery {
  q?: string;
  categoryId?: number;
  brand?: string;
  model?: string;
  scope?: 'mine' | 'network';
}
export interface SalvagePart {
  id: number;
  groupId: number;
  type: PartType;
  typeLabel: string;
  value: string;
  ratings: PartRatings;
  package: string;
  pinout: string;
  quantity: number;
  box: string;
  sourceItemId: number | null;
  notes: string;
  createdAt: Date;
}
export interface SalvageFilter {
  type?: PartType;
  q?: string;
  inStock?: '1';
}
export type SubstituteQuery = { type: PartType } & PartRatings & { package?: string };
export interface Substitute {
  part: SalvagePart;
  verdict: SubstituteVerdict;
}
export interface KnowledgeSharing {
  share: boolean;
}
