import { useState } from 'react';
import { PART_TYPES, type PartType } from '../../../../../shared/salvage/constants';
import { salvagePartSchema } from '../../../../../shared/schemas/toolkit';
import { Button } from '../../../components/ui/button';
import { Alert } from '../../../components/ui/feedback';
import { SelectField, TextField } from '../../../components/ui/field';
import { useAddPart } from '../api/add-part';
import { RatingFields, parseRatings, type RatingsDraft } from './ratings';
import { tr, useT } from '../../../lib/i18n';

/** Adding parts: the ratings asked for follow the kind of part. */
export function AddPartForm({
  groupId,
  sourceItemId,
  onDone,
  onChanged,
}: {
  groupId: number;
  sourceItemId?: number;
  onDone: () => void;
  /** Runs after the part is saved, for a page that shows the parts saved from its item. */
  onChanged?: () => void;
}) {
  const t = useT();
  const add = useAddPart(groupId, onChanged);
  const [v, setV] = useState({
    type: 'fuse' as PartType,
    value: '',
    package: '',
    pinout: '',
    quantity: '1',
    box: '',
    notes: '',
  });
  const [ratings, setRatings] = useState<RatingsDraft>({});
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState<string | null>(null);
  const submit = () => {
    const body = { ...v, ratings: parseRatings(ratings), sourceItemId };
    const parsed = salvagePartSchema.safeParse(body);
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [i.path.join('.'), tr(i.message)])));
      return;
    }
    setErrors({});
    add.mutate(body, {
      onSuccess: (p) => {
        setSaved(t('bench.tool.add.saved', { quantity: p.quantity, value: p.value, box: p.box }));
        setV({ ...v, value: '', package: '', pinout: '', quantity: '1', notes: '' });
        setRatings({});
      },
    });
  };
  return (
    <form
      className="space-y-3 rounded-xl bg-white p-4 ring-2 ring-copper"
      aria-label={t('bench.tool.add.title')}
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <h2 className="text-lg">{t(sourceItemId ? 'bench.tool.add.titleFromItem' : 'bench.tool.add.title')}</h2>
      {saved && (
        <Alert tone="success">
          {saved} {t('bench.tool.add.next')}
        </Alert>
      )}
      <div className="grid gap-3 sm:grid-cols-3">
        <SelectField
          label={t('bench.tool.add.kind')}
          value={v.type}
          onChange={(e) => {
            setV({ ...v, type: e.target.value as PartType });
            setRatings({});
          }}
        >
          {PART_TYPES.map((pt) => (
            <option key={pt} value={pt}>
              {t(`bench.tool.part.${pt}`)}
            </option>
          ))}
        </SelectField>
        <TextField
          label={t('bench.tool.add.value')}
          value={v.value}
          onChange={(e) => setV({ ...v, value: e.target.value })}
          error={errors.value}
          placeholder={t('bench.tool.add.valuePlaceholder')}
        />
        <TextField
          label={t('bench.tool.add.quantity')}
          inputMode="numeric"
          value={v.quantity}
          onChange={(e) => setV({ ...v, quantity: e.target.value })}
          error={errors.quantity}
        />
      </div>
      <RatingFields type={v.type} value={ratings} onChange={setRatings} errors={errors} />
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField
          label={t('bench.tool.part.package')}
          value={v.package}
          onChange={(e) => setV({ ...v, package: e.target.value })}
          placeholder={t('bench.tool.add.packagePlaceholder')}
        />
        <TextField
          label={t('bench.tool.add.pinout')}
          value={v.pinout}
          onChange={(e) => setV({ ...v, pinout: e.target.value })}
          placeholder={t('bench.tool.add.pinoutPlaceholder')}
        />
        <TextField
          label={t('bench.tool.add.box')}
          value={v.box}
          onChange={(e) => setV({ ...v, box: e.target.value })}
          error={errors.box}
          placeholder={t('bench.tool.add.boxPlaceholder')}
        />
      </div>
      <TextField
        label={t('bench.tool.add.notes')}
        value={v.notes}
        onChange={(e) => setV({ ...v, notes: e.target.value })}
      />
      {add.error && <Alert tone="error">{add.error.message}</Alert>}
      <div className="flex gap-2">
        <Button type="submit" busy={add.isPending}>
          {t('bench.tool.add.submit')}
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          {t('bench.tool.add.close')}
        </Button>
      </div>
    </form>
  );
}
