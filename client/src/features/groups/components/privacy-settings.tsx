import { useEffect, useState } from 'react';
import type { GroupSettings } from '../../../../../shared/api/groups';
import { formatDay, formatTime } from '../../../../../shared/format';
import { RETENTION_MONTHS } from '../../../../../shared/privacy/scrub';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import { TextField } from '../../../components/ui/field';
import { ApiError } from '../../../lib/api';
import { useSaveGroupSettings } from '../api/save-group-settings';

/** How long visitors' details are kept, where they write about them, and when the daily clean-up last ran. */
export function PrivacySettings({ settings, privacyPath }: { settings: GroupSettings; privacyPath: string }) {
  const save = useSaveGroupSettings(settings.id);
  const [months, setMonths] = useState(String(settings.retention.months));
  const [contact, setContact] = useState(settings.contactEmail);
  useEffect(() => {
    setMonths(String(settings.retention.months));
    setContact(settings.contactEmail);
  }, [settings]);
  const fields = save.error instanceof ApiError ? (save.error.fields ?? {}) : {};
  const ran = settings.retention.lastRunAt;
  return (
    <Card className="space-y-4">
      <h2 className="text-lg">Visitors&apos; details</h2>
      <TextField
        label="Keep visitors' details for (months after their session)"
        type="number"
        inputMode="numeric"
        min={RETENTION_MONTHS.min}
        max={RETENTION_MONTHS.max}
        value={months}
        error={fields.retentionMonths}
        hint="Then names, e-mail addresses, phone numbers and photos are erased; the repair records stay for your figures."
        onChange={(e) => {
          setMonths(e.target.value);
          save.reset();
        }}
      />
      <TextField
        label="Contact for questions about their details"
        type="email"
        value={contact}
        error={fields.contactEmail}
        hint="Shown on your privacy page. Leave empty to send people to an organiser at a session."
        onChange={(e) => {
          setContact(e.target.value);
          save.reset();
        }}
      />
      <p className="text-sm" data-testid="retention-last-run">
        {ran
          ? `The clean-up last ran ${formatDay(ran, settings.timeZone)} at ${formatTime(ran, settings.timeZone)} and erased the details of ${settings.retention.lastRunAnonymised} ${settings.retention.lastRunAnonymised === 1 ? 'booking' : 'bookings'}.`
          : 'The clean-up has not run yet; it runs once a day.'}
      </p>
      {save.error && !Object.keys(fields).length && <Alert tone="error">{save.error.message}</Alert>}
      {save.isSuccess && <Alert tone="success">Saved.</Alert>}
      <div className="flex flex-wrap items-center gap-3">
        <Button
          busy={save.isPending}
          onClick={() => save.mutate({ retentionMonths: Number(months), contactEmail: contact })}
        >
          Save
        </Button>
        <a href={privacyPath} className="font-bold text-navy underline">
          See your privacy page
        </a>
      </div>
    </Card>
  );
}
