import { z } from 'zod';
import { IMPORT_FIELDS } from '../impact/open-repair-data';

const fieldMatch = z.partialRecord(z.enum(IMPORT_FIELDS), z.string().trim().max(200));

/** The form fields sent with a file to bring in. `mapping` is JSON text: our field → the sheet's column. */
export const importForm = z
  .object({
    scope: z.enum(['group', 'network'], { error: 'validation.import.scope' }).default('group'),
    groupId: z.preprocess((v) => (v === '' ? undefined : v), z.coerce.number().int().positive().optional()),
    mapping: z
      .string()
      .max(10_000)
      .optional()
      .transform((s, c) => {
        if (!s) return {};
        try {
          const parsed = fieldMatch.safeParse(JSON.parse(s));
          if (parsed.success) return Object.fromEntries(Object.entries(parsed.data).filter(([, v]) => v));
        } catch {
          // Reported below.
        }
        c.addIssue({ code: 'custom', message: 'validation.import.mapping' });
        return z.NEVER;
      }),
  })
  .refine((v) => v.scope === 'network' || v.groupId !== undefined, {
    path: ['groupId'],
    message: 'validation.import.group',
  });

export const importListQuery = z.object({
  groupId: z.preprocess((v) => (v === '' ? undefined : v), z.coerce.number().int().positive().optional()),
});
