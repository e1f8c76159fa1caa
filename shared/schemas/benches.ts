import { z } from 'zod';
import { EQUIPMENT } from '../constants';

/** The tables in the hall, in order: a venue's usual layout or one event's copy of it. */
export const benchesSchema = z
  .array(
    z.object({
      id: z.number().int().positive().optional(),
      name: z.string().trim().min(1, 'Name the bench.').max(80),
      seats: z.number().int('Use a whole number.').min(1, 'A bench has at least one seat.').max(20),
      equipment: z.array(z.enum(EQUIPMENT)).max(EQUIPMENT.length),
    }),
  )
  .max(60, 'At most 60 benches.');
export const layoutSchema = z.object({ benches: benchesSchema });
export type BenchesInput = z.input<typeof benchesSchema>;
