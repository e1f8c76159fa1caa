import type { ReactNode } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';

/** A fieldset of checkboxes that all write one array field of a form (react-hook-form's `register` of that field). */
export function CheckGroup({
  legend,
  options,
  field,
}: {
  legend: string;
  options: readonly { value: string; label: ReactNode }[];
  field: UseFormRegisterReturn;
}) {
  return (
    <fieldset className="rounded-lg bg-paper p-3">
      <legend className="px-1 text-sm font-bold">{legend}</legend>
      {options.map((o) => (
        <label key={o.value} className="flex items-start gap-2 py-1 text-sm">
          <input type="checkbox" value={o.value} className="mt-0.5 size-5 shrink-0 accent-alert" {...field} />
          {o.label}
        </label>
      ))}
    </fieldset>
  );
}
