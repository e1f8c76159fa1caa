/** A table set out in the hall; `id` is missing on one not saved yet. */
export interface Bench {
  id?: number;
  name: string;
  seats: number;
  equipment: string[];
}
