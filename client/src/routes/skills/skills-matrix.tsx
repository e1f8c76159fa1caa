import { useMemo, useState } from 'react';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { GroupTabs } from '../../components/layouts/group-tabs';
import { skillsMatrixQuery, useSkillsMatrix } from '../../features/skills/api/get-skills-matrix';
import { useGroupSettings } from '../../features/groups/api/get-group-settings';
import { queryClient } from '../../lib/query-client';
import { useT } from '../../lib/i18n';

const TONE = ['', 'bg-sage-light text-sage', 'bg-sage/60 text-ink', 'bg-sage text-white'];

/** The page reads the matrix with suspense; a failure to read it is the route's error. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(skillsMatrixQuery(Number(params.groupId)));

/** Volunteers × skills: sort by a skill to find the experts, filter by name or by a skill someone must have. */
export function SkillsMatrixPage() {
  const t = useT();
  const groupId = Number(useParams().groupId);
  const group = useGroupSettings(groupId);
  const matrix = useSkillsMatrix(groupId);
  const [sortBy, setSortBy] = useState<string>('name');
  const [ascending, setAscending] = useState(true);
  const sortOn = (key: string) => {
    if (key === sortBy) setAscending((a) => !a);
    else {
      setSortBy(key);
      setAscending(key === 'name');
    }
  };
  const [filter, setFilter] = useState('');
  const [needs, setNeeds] = useState('');
  const rows = useMemo(() => {
    const list = matrix.data.volunteers.filter(
      (v) => v.name.toLowerCase().includes(filter.trim().toLowerCase()) && (!needs || (v.skills[needs] ?? 0) > 0),
    );
    const dir = ascending ? 1 : -1;
    return [...list].sort((a, b) =>
      sortBy === 'name'
        ? dir * a.name.localeCompare(b.name)
        : dir * ((a.skills[sortBy] ?? 0) - (b.skills[sortBy] ?? 0)) || a.name.localeCompare(b.name),
    );
  }, [matrix.data, filter, needs, sortBy, ascending]);
  const skills = matrix.data.skills;
  return (
    <div>
      <h1 className="mb-2 text-2xl sm:text-3xl">{group.data?.name ?? t('organise.groupTabs.skills')}</h1>
      <GroupTabs groupId={groupId} />
      <div className="mb-3 flex flex-wrap gap-3">
        <label className="text-sm font-semibold">
          {t('organise.rota.name')}
          <input
            value={filter}
            onChange={(e) => setFilter(e.target.value)}
            placeholder={t('organise.skills.filter')}
            className="mt-1 block rounded-lg border border-ink/20 px-3 py-2"
          />
        </label>
        <label className="text-sm font-semibold">
          {t('organise.skills.has')}
          <select
            value={needs}
            onChange={(e) => setNeeds(e.target.value)}
            className="mt-1 block rounded-lg border border-ink/20 px-3 py-2"
          >
            <option value="">{t('organise.skills.any')}</option>
            {skills.map((s) => (
              <option key={s} value={s}>
                {t(`common.skill.${s}`)}
              </option>
            ))}
          </select>
        </label>
      </div>
      <div className="overflow-x-auto rounded-xl bg-white ring-1 ring-ink/5">
        <table className="w-full text-center text-sm">
          <thead className="bg-navy/5 text-navy">
            <tr>
              <th className="sticky left-0 bg-[#eef0f3] px-3 py-2 text-left">
                <button onClick={() => sortOn('name')} className="font-bold underline-offset-2 hover:underline">
                  {t('organise.skills.volunteer')}
                  {sortBy === 'name' ? (ascending ? ' ↑' : ' ↓') : ''}
                </button>
              </th>
              {skills.map((s) => (
                <th
                  key={s}
                  className="px-2 py-2"
                  aria-sort={sortBy === s ? (ascending ? 'ascending' : 'descending') : 'none'}
                >
                  <button
                    onClick={() => sortOn(s)}
                    className={`font-bold hover:underline ${sortBy === s ? 'text-copper-dark' : ''}`}
                  >
                    {t(`common.skill.${s}`)}
                    {sortBy === s ? (ascending ? ' ↑' : ' ↓') : ''}
                  </button>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((v) => (
              <tr key={v.userId} className="border-t border-ink/5">
                <th className="sticky left-0 bg-white px-3 py-2 text-left font-semibold">
                  {v.name}
                  <span className="block text-xs font-normal text-ink-soft">
                    {v.roles.map((r) => t(`organise.role.${r}`)).join(', ')}
                  </span>
                </th>
                {skills.map((s) => {
                  const l = v.skills[s] ?? 0;
                  return (
                    <td key={s} className="px-1 py-1">
                      {l ? (
                        <span
                          className={`inline-block min-w-16 rounded px-1.5 py-0.5 text-xs font-bold ${TONE[l]}`}
                          title={t(`organise.triage.level.${l}`)}
                        >
                          {l} {t(`organise.triage.level.${l}`)}
                        </span>
                      ) : (
                        <span className="text-ink-soft">·</span>
                      )}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
        {rows.length === 0 && <p className="p-4 text-sm text-ink-soft">{t('organise.skills.nobody')}</p>}
      </div>
      <p className="mt-2 text-sm text-ink-soft">{t('organise.skills.levels')}</p>
    </div>
  );
}
