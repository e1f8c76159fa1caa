import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { Alert, Card } from '../../../components/ui/feedback';
import { TextField } from '../../../components/ui/field';
import { useImpactSettings } from '../api/get-impact-settings';
import { useSetImpactSettings } from '../api/set-impact-settings';
import { ApiError } from '../../../lib/api';

export function DisplacementCard() {
  const { data: settings } = useImpactSettings();
  return (
    <Card className="p-4 sm:p-5">
      <section aria-labelledby="displacement-heading">
        <h2 id="displacement-heading" className="text-lg">
          Displacement factor
        </h2>
        <p className="mb-3 text-sm text-ink-soft">
          The share of repairs that really spare a purchase, between 0 and 1. It scales every emissions figure on
          Mendery, for every group.
        </p>
        <DisplacementForm current={settings.displacement} />
      </section>
    </Card>
  );
}

const DISPLACEMENT_MESSAGE = 'Enter a number between 0 and 1, for example 0.5.';

function DisplacementForm({ current }: { current: number }) {
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
      setError(DISPLACEMENT_MESSAGE);
      return;
    }
    setError(undefined);
    save.mutate(n, { onSuccess: (r) => setSaved(r.displacement) });
  };

  return (
    <form onSubmit={submit} noValidate className="flex flex-wrap items-start gap-3">
      <div className="w-full sm:w-48">
        <TextField
          label="Factor (0–1)"
          inputMode="decimal"
          autoComplete="off"
          value={value}
          onChange={(e) => {
            setValue(e.target.value);
            setError(undefined);
            setSaved(null);
          }}
          error={error ?? serverField}
          hint={`Now ${current}.`}
        />
      </div>
      <div className="sm:pt-8">
        <Button type="submit" busy={save.isPending}>
          Save
        </Button>
      </div>
      <div className="w-full" aria-live="polite">
        {saved !== null && <Alert tone="success">Saved. Emissions are now counted with a factor of {saved}.</Alert>}
        {save.isError && !serverField && (
          <Alert tone="error" title="Not saved">
            {save.error.message}
          </Alert>
        )}
      </div>
    </form>
  );
}
