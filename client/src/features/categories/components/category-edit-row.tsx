import { useState } from 'react';
import type { Category } from '../../../../../shared/api/categories';
import { SKILLS } from '../../../../../shared/constants';
import { categoryPatchSchema } from '../../../../../shared/schemas/categories';
import { Button } from '../../../components/ui/button';
import { applyServerErrors, useZodForm } from '../../../lib/form';
import { useUpdateCategory } from '../api/update-category';
import { tr, useT } from '../../../lib/i18n';

const input = 'w-full rounded border border-ink/20 px-2 py-1';

/** One kind's form, checked by the same schema the server applies. */
export function CategoryEditRow({ category: c, done }: { category: Category; done: () => void }) {
  const t = useT();
  const save = useUpdateCategory(c.id);
  const [formError, setFormError] = useState<string | null>(null);
  const form = useZodForm(categoryPatchSchema, {
    avgWeightKg: String(c.avgWeightKg),
    weightSource: c.weightSource,
    skill: c.skill,
    repairMinutes: String(c.repairMinutes),
    mains: c.mains,
    co2ePerKg: c.co2ePerKg?.toString() ?? '',
    co2eSource: c.co2eSource ?? '',
  });
  const { errors } = form.formState;
  const submit = form.handleSubmit((patch) =>
    save.mutateAsync(patch).then(done, (err) => setFormError(applyServerErrors(form, err))),
  );
  const err = (k: keyof typeof errors) =>
    errors[k]?.message && (
      <p id={`cat-${c.id}-${k}`} className="mt-1 text-xs font-semibold text-alert">
        {tr(String(errors[k]?.message))}
      </p>
    );
  const described = (k: keyof typeof errors) => ({
    'aria-invalid': Boolean(errors[k]),
    'aria-describedby': errors[k] ? `cat-${c.id}-${k}` : undefined,
  });
  return (
    <tr className="border-t border-ink/5 bg-copper-light/30 align-top">
      <td className="px-3 py-2" colSpan={2}>
        <p className="font-bold">{c.name}</p>
        <input
          aria-label={t('admin.categories.weightSource')}
          className={input}
          {...form.register('weightSource')}
          {...described('weightSource')}
        />
        {err('weightSource')}
        {formError && <p className="mt-1 text-xs font-semibold text-alert">{tr(formError)}</p>}
      </td>
      <td className="px-3 py-2">
        <input
          aria-label={t('admin.categories.avgWeight')}
          inputMode="decimal"
          className={input}
          {...form.register('avgWeightKg')}
          {...described('avgWeightKg')}
        />
        {err('avgWeightKg')}
      </td>
      <td className="px-3 py-2">
        <input
          aria-label={t('admin.categories.factorLabel')}
          inputMode="decimal"
          placeholder={t('admin.categories.none')}
          className={input}
          {...form.register('co2ePerKg')}
          {...described('co2ePerKg')}
        />
        {err('co2ePerKg')}
        <input
          aria-label={t('admin.categories.factorSource')}
          placeholder={t('admin.categories.source')}
          className={`${input} mt-1`}
          {...form.register('co2eSource')}
          {...described('co2eSource')}
        />
        {err('co2eSource')}
      </td>
      <td className="px-3 py-2">
        <select aria-label={t('admin.categories.skill')} className={input} {...form.register('skill')}>
          {SKILLS.map((s) => (
            <option key={s} value={s}>
              {t(`common.skill.${s}`)}
            </option>
          ))}
        </select>
      </td>
      <td className="px-3 py-2 text-ink-soft">{t('admin.categories.kitCount', { n: c.equipment.length })}</td>
      <td className="px-3 py-2">
        <input
          aria-label={t('admin.categories.repairMinutes')}
          inputMode="numeric"
          className={input}
          {...form.register('repairMinutes')}
          {...described('repairMinutes')}
        />
        {err('repairMinutes')}
      </td>
      <td className="px-3 py-2">
        <input aria-label={t('admin.categories.mains')} type="checkbox" {...form.register('mains')} />
      </td>
      <td className="px-3 py-2">
        <div className="flex gap-1">
          <Button busy={form.formState.isSubmitting} onClick={() => void submit()}>
            {t('admin.categories.save')}
          </Button>
          <Button variant="quiet" onClick={done}>
            {t('admin.categories.cancel')}
          </Button>
        </div>
      </td>
    </tr>
  );
}
