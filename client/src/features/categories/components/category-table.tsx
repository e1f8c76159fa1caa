import { useState } from 'react';
import type { Category } from '../../../../../shared/api/categories';
import { EQUIPMENT_LABELS, SKILL_LABELS } from '../../../../../shared/constants';
import { Button } from '../../../components/ui/button';
import { CategoryEditRow } from './category-edit-row';

/** The item taxonomy, one row per kind; a row turns into its form in place. */
export function CategoryTable({ categories }: { categories: Category[] }) {
  const [editing, setEditing] = useState<number | null>(null);
  return (
    <div className="overflow-x-auto rounded-xl bg-white ring-1 ring-ink/5">
      <table className="w-full text-left text-sm">
        <thead className="bg-navy/5 text-navy">
          <tr>
            <th className="px-3 py-2">Category</th>
            <th className="px-3 py-2">
              <abbr title="The EU e-waste (WEEE) category, 1 to 6" className="no-underline">
                E-waste class
              </abbr>
            </th>
            <th className="px-3 py-2">Avg. kg</th>
            <th className="px-3 py-2">kg CO2e / kg</th>
            <th className="px-3 py-2">Skill</th>
            <th className="px-3 py-2">Bench kit</th>
            <th className="px-3 py-2">Minutes</th>
            <th className="px-3 py-2">Mains</th>
            <th className="px-3 py-2">
              <span className="sr-only">Actions</span>
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
                  {c.refusal && <p className="text-xs font-semibold text-alert">Usually refused</p>}
                </td>
                <td className="px-3 py-2">{c.weeeCategory ?? '—'}</td>
                <td className="px-3 py-2">{c.avgWeightKg}</td>
                <td className="px-3 py-2">
                  {c.co2ePerKg == null ? '—' : <span title={String(c.co2ePerKg)}>{c.co2ePerKg.toFixed(2)}</span>}
                  {c.co2eSource && <p className="text-xs text-ink-soft">{c.co2eSource.split(':')[0]}</p>}
                </td>
                <td className="px-3 py-2">{SKILL_LABELS[c.skill]}</td>
                <td className="px-3 py-2">{c.equipment.map((e) => EQUIPMENT_LABELS[e]).join(', ') || '—'}</td>
                <td className="px-3 py-2">{c.repairMinutes}</td>
                <td className="px-3 py-2">{c.mains ? 'yes' : 'no'}</td>
                <td className="px-3 py-2">
                  <Button variant="quiet" onClick={() => setEditing(c.id)}>
                    Edit<span className="sr-only"> {c.name}</span>
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
