import { useState } from 'react';
import { EQUIPMENT, SKILLS } from '../../../../shared/constants';
import { Button } from '../../components/ui/button';
import { Alert, Card, PageTitle } from '../../components/ui/feedback';
import { profileQuery, useProfile } from '../../features/skills/api/get-profile';
import { useSaveProfile } from '../../features/skills/api/save-profile';
import { queryClient } from '../../lib/query-client';
import { tr, useT } from '../../lib/i18n';

/** Skill levels 0–3, worded in the catalog (bench.skills.level.N). */
const LEVELS = [0, 1, 2, 3] as const;

/** The form starts from the saved profile; a failure to read it is the route's error. */
export const loader = () => queryClient.ensureQueryData(profileQuery());

/** The fixer's own skill levels, the kit they bring and a note for the organisers. */
export function MySkillsPage() {
  const t = useT();
  const { data: profile } = useProfile();
  const save = useSaveProfile();
  const [skills, setSkills] = useState<Record<string, number>>(profile.skills);
  const [kit, setKit] = useState<string[]>(profile.kit);
  const [notes, setNotes] = useState(profile.notes);
  return (
    <div className="mx-auto max-w-2xl space-y-4">
      <PageTitle title={t('common.nav.skills')} lead={t('bench.skills.lead')} />
      <Card className="space-y-3">
        {SKILLS.map((s) => (
          <label key={s} className="grid grid-cols-[1fr_10rem] items-center gap-3">
            <span className="font-semibold">{t(`common.skill.${s}`)}</span>
            <select
              value={String(skills[s] ?? 0)}
              onChange={(e) => {
                save.reset();
                setSkills({ ...skills, [s]: Number(e.target.value) });
              }}
              className="rounded-lg border border-ink/20 px-2 py-2"
            >
              {LEVELS.map((v) => (
                <option key={v} value={String(v)}>
                  {t(`bench.skills.level.${v}`)}
                </option>
              ))}
            </select>
          </label>
        ))}
      </Card>
      <Card>
        <fieldset>
          <legend className="font-semibold">{t('bench.skills.kit')}</legend>
          <div className="mt-2 grid grid-cols-2 gap-2">
            {EQUIPMENT.map((e) => (
              <label key={e} className="flex items-center gap-2 text-sm">
                <input
                  type="checkbox"
                  className="size-4 accent-copper"
                  checked={kit.includes(e)}
                  onChange={(ev) => {
                    save.reset();
                    setKit(ev.target.checked ? [...kit, e] : kit.filter((x) => x !== e));
                  }}
                />
                {t(`organise.equipment.${e}`)}
              </label>
            ))}
          </div>
        </fieldset>
        <label className="mt-4 block font-semibold">
          {t('bench.skills.notes')}
          <textarea
            value={notes}
            onChange={(e) => {
              save.reset();
              setNotes(e.target.value);
            }}
            rows={3}
            className="mt-1 block w-full rounded-lg border border-ink/20 px-3 py-2 font-normal"
          />
        </label>
      </Card>
      {save.error && <Alert tone="error">{tr(save.error.message)}</Alert>}
      <div className="flex items-center gap-3">
        <Button
          busy={save.isPending}
          onClick={() =>
            save.mutate({
              skills: Object.fromEntries(Object.entries(skills).filter(([, l]) => l > 0)) as never,
              kit: kit as never,
              notes,
            })
          }
        >
          {t('bench.skills.save')}
        </Button>
        {save.isSuccess && (
          <span role="status" className="font-bold text-sage">
            {t('bench.skills.saved')}
          </span>
        )}
      </div>
    </div>
  );
}
