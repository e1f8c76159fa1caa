import { useState } from 'react';
import { formatTime } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import type { ItemView } from '../api/types';
import { SafetyForm } from './safety-form';

/** The electrical safety check: visual inspection, class, readings; the verdict is worked out as you type. */
export function SafetySection({ item }: { item: ItemView }) {
  const latest = item.safetyChecks[0];
  // A passed check, or any check on a done item, closes the form until the fixer asks for another. Asking is kept
  // for that check and status only: a new check or a new status starts from the rule again.
  const closed = Boolean(latest) && (latest.pass || item.status === 'done');
  const closedBy = `${latest?.id}:${latest?.pass}:${item.status}`;
  const [reopenedFor, setReopenedFor] = useState<string | null>(null);
  const open = !closed || reopenedFor === closedBy;
  if (!open && latest) {
    return (
      <Card>
        <h2 className="text-lg">Electrical safety check</h2>
        <div className="my-3" data-testid="latest-check">
          <Alert
            tone={latest.pass ? 'success' : 'error'}
            title={`${latest.pass ? 'Passed' : 'Failed'} at ${formatTime(latest.createdAt, item.event.timeZone)}`}
          >
            Class {latest.applianceClass}
            {latest.instrument && `, ${latest.instrument}`}
            {latest.checkedByName && `, by ${latest.checkedByName}`}. {!latest.pass && latest.failures.join(' ')}{' '}
            {item.safetyChecks.length > 1 &&
              `${item.safetyChecks.length - 1} earlier check${item.safetyChecks.length > 2 ? 's' : ''} on record.`}
          </Alert>
        </div>
        {item.status !== 'done' && (
          <Button variant="secondary" className="w-full" onClick={() => setReopenedFor(closedBy)}>
            Record another check
          </Button>
        )}
      </Card>
    );
  }
  return <SafetyForm item={item} />;
}
