import { useEffect, useState } from 'react';
import type { GroupSettings } from '../../../../../shared/api/groups';
import { formatDay, formatTime } from '../../../../../shared/format';
import { RETENTION_MONTHS } from '../../../../../shared/privacy/scrub';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import { TextField } from '../../../components/ui/field';
import { ApiError } from '../../../lib/api';
import { useSaveGroupSettings } from '../api/save-group-settings';
import { tr, useLanguage, useT } from '../../../lib/i18n';

/** How long visitors' details are kept, where they write about them, and when the daily clean-up last ran. */
export function PrivacySettings({ settings, privacyPath }: { settings: GroupSettings; privacyPath: string }) {
  const t = useT();
  const lang = useLanguage();
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
      <h2 className="text-lg">{t('organise.privacy.title')}</h2>
      <TextField
        label={t('organise.privacy.months')}
        type="number"
        inputMode="numeric"
        min={RETENTION_MONTHS.min}
        max={RETENTION_MONTHS.max}
        value={months}
        error={fields.retentionMonths}
        hint={t('organise.privacy.monthsHint')}
        onChange={(e) => {
          setMonths(e.target.value);
          save.reset();
        }}
      />
      <TextField
        label={t('organise.privacy.contact')}
        type="email"
        value={contact}
        error={fields.contactEmail}
        hint={t('organise.privacy.contactHint')}
        onChange={(e) => {
          setContact(e.target.value);
          save.reset();
        }}
      />
      <p className="text-sm" data-testid="retention-last-run">
        {ran
          ? t('organise.privacy.lastRun', {
              day: formatDay(ran, settings.timeZone, lang),
              time: formatTime(ran, settings.timeZone, lang),
              n: settings.retention.lastRunAnonymised,
            })
          : t('organise.privacy.notRun')}
      </p>
      {save.error && !Object.keys(fields).length && <Alert tone="error">{tr(save.error.message)}</Alert>}
      {save.isSuccess && <Alert tone="success">{t('organise.manage.saved')}</Alert>}
      <div className="flex flex-wrap items-center gap-3">
        <Button
          busy={save.isPending}
          onClick={() => save.mutate({ retentionMonths: Number(months), contactEmail: contact })}
        >
          {t('organise.privacy.save')}
        </Button>
        <a href={privacyPath} className="font-bold text-navy underline">
          {t('organise.privacy.see')}
        </a>
      </div>
    </Card>
  );
}
