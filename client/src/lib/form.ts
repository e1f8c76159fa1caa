import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, type FieldValues, type Path, type UseFormReturn } from 'react-hook-form';
import type { z } from 'zod';
import { ApiError } from './api';
import { tr } from './i18n';

/** react-hook-form with the zod schema the server also uses. */
export function useZodForm<S extends z.ZodType<FieldValues, FieldValues>>(
  schema: S,
  defaultValues?: Partial<z.input<S>>,
) {
  return useForm<z.input<S>, unknown, z.output<S>>({
    resolver: zodResolver(schema as never) as never,
    defaultValues: defaultValues as never,
    mode: 'onTouched',
  });
}

/** Puts the server's field errors next to their fields; returns the message for the form as a whole. */
export function applyServerErrors<T extends FieldValues>(
  form: UseFormReturn<T, unknown, FieldValues>,
  err: unknown,
): string {
  if (err instanceof ApiError) {
    Object.entries(err.fields ?? {}).forEach(([field, message], i) =>
      form.setError(field as Path<T>, { message }, { shouldFocus: i === 0 }),
    );
    return err.message;
  }
  return tr('common.error.unknown');
}
