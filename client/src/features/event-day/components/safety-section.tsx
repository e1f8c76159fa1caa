import { useState } from 'react';
import { formatTime } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import type { ItemView } from '../api/types';
import { SafetyForm, storedFaultsText } from './safety-form';

import { useLanguage, useT } from '../../../lib/i18n';

/** The electrical safety check: visual inspection, class, readings; the verdict is worked out as you type. */
export function SafetySection({ item }: { item: ItemView }) {
  const latest = item.safetyChecks[0];
  const t = useT();
  const lang = useLanguage();
  // A passed check, or any check on a done item, closes the form until the fixer asks for another. Asking is kept
  // for that check and status only: a new check or a new status starts from the rule again.
  const closed = Boolean(latest) && (latest.pass || item.status === 'done');
  const closedBy = `${latest?.id}:${latest?.pass}:${item.status}`;
  const [reopenedFor, setReopenedFor] = useState<string | null>(null);
  const open = !closed || reopenedFor === closedBy;
  // Only the item's fixer (or an organiser) may record a check: anyone else reads the latest one, or is told who does it.
  if (!item.can.record && !latest)
    return (
      <Card>
        <h2 className="text-lg">{t('fixer.check.title')}</h2>
        <p className="text-sm text-ink-soft">{t('fixer.check.forFixer')}</p>
      </Card>
    );
  if ((!open || !item.can.record) && latest) {
    return (
      <Card>
        <h2 className="text-lg">{t('fixer.check.title')}</h2>
        <div className="my-3" data-testid="latest-check">
          <Alert
            tone={latest.pass ? 'success' : 'error'}
            title={t(latest.pass ? 'fixer.check.passedAt' : 'fixer.check.failedAt', {
              time: formatTime(latest.createdAt, item.event.timeZone, lang),
            })}
          >
            {t('fixer.check.class', { cls: latest.applianceClass })}
            {latest.instrument && `, ${latest.instrument}`}
            {latest.checkedByName && t('fixer.check.by', { name: latest.checkedByName })}.{' '}
            {!latest.pass && storedFaultsText(latest, lang)}{' '}
            {item.safetyChecks.length > 1 && t('fixer.check.earlier', { count: item.safetyChecks.length - 1 })}
          </Alert>
        </div>
        {item.status !== 'done' && item.can.record && (
          <Button variant="secondary" className="w-full" onClick={() => setReopenedFor(closedBy)}>
            {t('fixer.check.another')}
          </Button>
        )}
      </Card>
    );
  }
  return <SafetyForm item={item} />;
}
