import { useId, useState } from 'react';
import type { AdminGroup } from '../../../../../shared/api/admin';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Alert } from '../../../components/ui/feedback';
import { useMergeGroup } from '../api/merge-group';
import { tr, useT } from '../../../lib/i18n';

/** For a group an import made (records only): move its history into the group it belongs to. */
export function MergeGroup({ group, groups }: { group: AdminGroup; groups: AdminGroup[] }) {
  const t = useT();
  const [into, setInto] = useState('');
  const [asking, setAsking] = useState(false);
  const merge = useMergeGroup();
  const id = useId();
  const target = groups.find((g) => String(g.id) === into);
  return (
    <div className="mt-1 flex flex-wrap items-end gap-2">
      <div>
        <label htmlFor={id} className="block text-sm font-semibold">
          {t('admin.merge.into')}
        </label>
        <select
          id={id}
          value={into}
          onChange={(e) => setInto(e.target.value)}
          className="min-h-11 rounded-lg border border-ink/20 bg-white px-2 text-base focus:outline-none focus-visible:ring-2 focus-visible:ring-copper"
        >
          <option value="">{t('admin.merge.choose')}</option>
          {groups
            .filter((g) => g.id !== group.id)
            .map((g) => (
              <option key={g.id} value={g.id}>
                {g.name}
              </option>
            ))}
        </select>
      </div>
      <Button variant="secondary" disabled={!target} onClick={() => setAsking(true)}>
        {t('admin.merge.button')}
      </Button>
      {merge.error && <Alert tone="error">{tr(merge.error.message)}</Alert>}
      {asking && target && (
        <ConfirmDialog
          open
          title={t('admin.merge.question', { from: group.name, into: target.name })}
          message={t('admin.merge.message', { from: group.name, into: target.name })}
          confirmLabel={t('admin.merge.confirm')}
          busy={merge.isPending}
          onCancel={() => setAsking(false)}
          onConfirm={() => merge.mutate({ from: group.id, into: target.id }, { onSettled: () => setAsking(false) })}
        />
      )}
    </div>
  );
}
