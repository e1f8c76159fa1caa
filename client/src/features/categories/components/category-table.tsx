import { useState } from 'react';
import type { Category } from '../../../../../shared/api/categories';
import { Button } from '../../../components/ui/button';
import { CategoryEditRow } from './category-edit-row';
import { useLanguage, useT } from '../../../lib/i18n';
import { intlLocale } from '../../../../../shared/format';

/** The item taxonomy, one row per kind; a row turns into its form in place. */
export function CategoryTable({ categories }: { categories: Category[] }) {
  const t = useT();
  const lang = useLanguage();
  const num = new Intl.NumberFormat(intlLocale(lang), { maximumFractionDigits: 3 });
  const [editing, setEditing] = useState<number | null>(null);
  return (
    <div className="overflow-x-auto rounded-xl bg-white ring-1 ring-ink/5">
      <table className="w-full text-left text-sm">
        <thead className="bg-navy/5 text-navy">
          <tr>
            <th className="px-3 py-2">{t('admin.categories.category')}</th>
            <th className="px-3 py-2">
              <abbr title={t('admin.categories.weeeTitle')} className="no-underline">
                {t('admin.categories.weee')}
              </abbr>
            </th>
            <th className="px-3 py-2">{t('admin.categories.avgKg')}</th>
            <th className="px-3 py-2">{t('admin.categories.factor')}</th>
            <th className="px-3 py-2">{t('admin.categories.skill')}</th>
            <th className="px-3 py-2">{t('admin.categories.kit')}</th>
            <th className="px-3 py-2">{t('admin.categories.minutes')}</th>
            <th className="px-3 py-2">{t('admin.categories.mains')}</th>
            <th className="px-3 py-2">
              <span className="sr-only">{t('admin.categories.actions')}</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {categories.map((c) =>
            editing === c.id ? (
              <CategoryEditRow key={c.id} category={c} done={() => setEditing(null)} />
            ) : (
              <tr key={c.id} className="border-t border-ink/5 align-top">
                <td className="px-3 py-2">
                  <p className="font-bold">{c.name}</p>
                  <p className="text-xs text-ink-soft">{c.weightSource}</p>
                  {c.refusal && <p className="text-xs font-semibold text-alert">{t('admin.categories.refused')}</p>}
                </td>
                <td className="px-3 py-2">{c.weeeCategory ?? '—'}</td>
                <td className="px-3 py-2">{num.format(c.avgWeightKg)}</td>
                <td className="px-3 py-2">
                  {c.co2ePerKg == null ? (
                    '—'
                  ) : (
                    <span title={num.format(c.co2ePerKg)}>{num.format(Math.round(c.co2ePerKg * 100) / 100)}</span>
                  )}
                  {c.co2eSource && <p className="text-xs text-ink-soft">{c.co2eSource.split(':')[0]}</p>}
                </td>
                <td className="px-3 py-2">{t(`common.skill.${c.skill}`)}</td>
                <td className="px-3 py-2">{c.equipment.map((e) => t(`organise.equipment.${e}`)).join(', ') || '—'}</td>
                <td className="px-3 py-2">{c.repairMinutes}</td>
                <td className="px-3 py-2">{c.mains ? t('admin.categories.yes') : t('admin.categories.no')}</td>
                <td className="px-3 py-2">
                  <Button variant="quiet" onClick={() => setEditing(c.id)}>
                    {t('admin.categories.edit')}
                    <span className="sr-only"> {c.name}</span>
                  </Button>
                </td>
              </tr>
            ),
          )}
        </tbody>
      </table>
    </div>
  );
}
