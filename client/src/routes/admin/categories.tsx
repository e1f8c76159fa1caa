import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { EQUIPMENT_LABELS, SKILL_LABELS, SKILLS, type Equipment } from '../../../../shared/constants';
import { Button } from '../../components/ui/button';
import { Alert, PageTitle, Spinner } from '../../components/ui/feedback';
import { useCategories, type Category } from '../../features/events/api/events';
import { api, ApiError } from '../../lib/api';

/** The item taxonomy: weights with their sources feed the statistics, skill and kit feed the matching. */
export function AdminCategoriesPage() {
  const categories = useCategories();
  const [editing, setEditing] = useState<number | null>(null);
  if (categories.isPending) return <Spinner />;
  if (categories.error) return <Alert tone="error">{categories.error.message}</Alert>;
  return (
    <div>
      <PageTitle
        title="Item categories"
        lead="Average weights count towards “kilograms kept out of landfill” when an item is not weighed; keep the source beside each one."
      />
      <div className="overflow-x-auto rounded-xl bg-white ring-1 ring-ink/5">
        <table className="w-full text-left text-sm">
          <thead className="bg-navy/5 text-navy">
            <tr>
              <th className="px-3 py-2">Category</th>
              <th className="px-3 py-2">WEEE</th>
              <th className="px-3 py-2">kg</th>
              <th className="px-3 py-2">kg CO2e / kg</th>
              <th className="px-3 py-2">Skill</th>
              <th className="px-3 py-2">Bench kit</th>
              <th className="px-3 py-2">Minutes</th>
              <th className="px-3 py-2">Mains</th>
              <th className="px-3 py-2" />
            </tr>
          </thead>
          <tbody>
            {categories.data.map((c) =>
              editing === c.id ? (
                <EditRow key={c.id} c={c} done={() => setEditing(null)} />
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
                    {c.co2ePerKg ?? '—'}
                    {c.co2eSource && <p className="text-xs text-ink-soft">{c.co2eSource.split(':')[0]}</p>}
                  </td>
                  <td className="px-3 py-2">{SKILL_LABELS[c.skill]}</td>
                  <td className="px-3 py-2">
                    {c.equipment.map((e) => EQUIPMENT_LABELS[e as Equipment]).join(', ') || '—'}
                  </td>
                  <td className="px-3 py-2">{c.repairMinutes}</td>
                  <td className="px-3 py-2">{c.mains ? 'yes' : 'no'}</td>
                  <td className="px-3 py-2">
                    <Button variant="quiet" onClick={() => setEditing(c.id)}>
                      Edit
                    </Button>
                  </td>
                </tr>
              ),
            )}
          </tbody>
        </table>
      </div>
    </div>
  );
}

function EditRow({ c, done }: { c: Category; done: () => void }) {
  const qc = useQueryClient();
  const [v, setV] = useState({
    avgWeightKg: String(c.avgWeightKg),
    weightSource: c.weightSource,
    skill: c.skill,
    repairMinutes: String(c.repairMinutes),
    mains: c.mains,
    co2ePerKg: c.co2ePerKg?.toString() ?? '',
    co2eSource: c.co2eSource ?? '',
  });
  const [localError, setLocalError] = useState<Record<string, string>>({});
  const save = useMutation({
    mutationFn: () =>
      api('PATCH', `/api/categories/${c.id}`, {
        avgWeightKg: Number(v.avgWeightKg),
        weightSource: v.weightSource,
        skill: v.skill,
        repairMinutes: Number(v.repairMinutes),
        mains: v.mains,
        co2ePerKg: v.co2ePerKg.trim() === '' ? null : Number(v.co2ePerKg.replace(',', '.')),
        co2eSource: v.co2eSource.trim() || null,
      }),
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: ['categories'] });
      done();
    },
  });
  const input = 'w-full rounded border border-ink/20 px-2 py-1';
  const fields = { ...(save.error instanceof ApiError ? (save.error.fields ?? {}) : {}), ...localError };
  const submit = () => {
    const factor = v.co2ePerKg.trim().replace(',', '.');
    const errs: Record<string, string> = {};
    if (factor !== '' && !(Number(factor) >= 0))
      errs.co2ePerKg = 'Enter kg CO2e per kg as a number, e.g. 5.65, or leave it empty for no factor.';
    if (factor !== '' && v.co2eSource.trim().length < 3)
      errs.co2eSource = 'Name the source of the factor (at least 3 characters).';
    if (!(Number(v.avgWeightKg) > 0)) errs.avgWeightKg = 'Enter the average weight in kg, above 0.';
    setLocalError(errs);
    if (!Object.keys(errs).length) save.mutate();
  };
  const err = (k: string) => fields[k] && <p className="mt-1 text-xs font-semibold text-alert">{fields[k]}</p>;
  return (
    <tr className="border-t border-ink/5 bg-copper-light/30 align-top">
      <td className="px-3 py-2" colSpan={2}>
        <p className="font-bold">{c.name}</p>
        <input
          aria-label="Weight source"
          className={input}
          value={v.weightSource}
          onChange={(e) => setV({ ...v, weightSource: e.target.value })}
        />
        {err('weightSource')}
        {save.error && !(save.error instanceof ApiError && save.error.fields) && (
          <p className="mt-1 text-xs font-semibold text-alert">{save.error.message}</p>
        )}
      </td>
      <td className="px-3 py-2">
        <input
          aria-label="Average weight in kg"
          type="number"
          step="0.01"
          className={input}
          value={v.avgWeightKg}
          onChange={(e) => setV({ ...v, avgWeightKg: e.target.value })}
          aria-invalid={Boolean(fields.avgWeightKg)}
        />
        {err('avgWeightKg')}
      </td>
      <td className="px-3 py-2">
        <input
          aria-label="Emission factor, kg CO2e per kg"
          inputMode="decimal"
          placeholder="none"
          className={input}
          value={v.co2ePerKg}
          onChange={(e) => setV({ ...v, co2ePerKg: e.target.value })}
          aria-invalid={Boolean(fields.co2ePerKg)}
        />
        {err('co2ePerKg')}
        <input
          aria-label="Source of the emission factor"
          placeholder="source"
          className={`${input} mt-1`}
          value={v.co2eSource}
          onChange={(e) => setV({ ...v, co2eSource: e.target.value })}
          aria-invalid={Boolean(fields.co2eSource)}
        />
        {err('co2eSource')}
      </td>
      <td className="px-3 py-2">
        <select
          aria-label="Skill"
          className={input}
          value={v.skill}
          onChange={(e) => setV({ ...v, skill: e.target.value as Category['skill'] })}
        >
          {SKILLS.map((s) => (
            <option key={s} value={s}>
              {SKILL_LABELS[s]}
            </option>
          ))}
        </select>
      </td>
      <td className="px-3 py-2 text-ink-soft">{c.equipment.length} items</td>
      <td className="px-3 py-2">
        <input
          aria-label="Repair minutes"
          type="number"
          className={input}
          value={v.repairMinutes}
          onChange={(e) => setV({ ...v, repairMinutes: e.target.value })}
        />
      </td>
      <td className="px-3 py-2">
        <input
          aria-label="Mains"
          type="checkbox"
          checked={v.mains}
          onChange={(e) => setV({ ...v, mains: e.target.checked })}
        />
      </td>
      <td className="px-3 py-2">
        <div className="flex gap-1">
          <Button busy={save.isPending} onClick={submit}>
            Save
          </Button>
          <Button variant="quiet" onClick={done}>
            Cancel
          </Button>
        </div>
      </td>
    </tr>
  );
}
