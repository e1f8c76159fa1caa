import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import { TextField } from '../../../components/ui/field';
import { useImpactSettings } from '../api/get-impact-settings';
import { useSetImpactSettings } from '../api/set-impact-settings';
import { ApiError } from '../../../lib/api';
import { useT } from '../../../lib/i18n';
import { useFormats } from './display';

export function DisplacementCard() {
  const t = useT();
  const { data: settings } = useImpactSettings();
  return (
    <Card className="p-4 sm:p-5">
      <section aria-labelledby="displacement-heading">
        <h2 id="displacement-heading" className="text-lg">
          {t('figures.displacementCard.heading')}
        </h2>
        <p className="mb-3 text-sm text-ink-soft">{t('figures.displacementCard.lead')}</p>
        <DisplacementForm current={settings.displacement} />
      </section>
    </Card>
  );
}

function DisplacementForm({ current }: { current: number }) {
  const t = useT();
  const { whole } = useFormats();
  const save = useSetImpactSettings();
  const [value, setValue] = useState(() => String(current));
  const [error, setError] = useState<string | undefined>();
  const [saved, setSaved] = useState<number | null>(null);
  const serverField = save.error instanceof ApiError ? save.error.fields?.displacement : undefined;

  const submit = (e: FormEvent) => {
    e.preventDefault();
    setSaved(null);
    const text = value.trim().replace(',', '.');
    const n = Number(text);
    if (text === '' || !Number.isFinite(n) || n < 0 || n > 1) {
      setError(t('figures.displacementCard.invalid', { example: whole.format(0.5) }));
      return;
    }
    setError(undefined);
    save.mutate(n, { onSuccess: (r) => setSaved(r.displacement) });
  };

  return (
    <form onSubmit={submit} noValidate className="flex flex-wrap items-start gap-3">
      <div className="w-full sm:w-48">
        <TextField
          label={t('figures.displacementCard.label')}
          inputMode="decimal"
          autoComplete="off"
          value={value}
          onChange={(e) => {
            setValue(e.target.value);
            setError(undefined);
            setSaved(null);
          }}
          error={error ?? serverField}
          hint={t('figures.displacementCard.now', { factor: whole.format(current) })}
        />
      </div>
      <div className="sm:pt-8">
        <Button type="submit" busy={save.isPending}>
          {t('figures.displacementCard.save')}
        </Button>
      </div>
      <div className="w-full" aria-live="polite">
        {saved !== null && (
          <Alert tone="success">{t('figures.displacementCard.saved', { factor: whole.format(saved) })}</Alert>
        )}
        {save.isError && !serverField && (
          <Alert tone="error" title={t('figures.displacementCard.notSaved')}>
            {save.error.message}
          </Alert>
        )}
      </div>
    </form>
  );
}
