import { useState } from 'react';
import { PART_TYPES, PART_TYPE_LABELS, type PartType } from '../../../../../shared/salvage/constants';
import { salvagePartSchema } from '../../../../../shared/schemas/toolkit';
import { Button } from '../../../components/ui/button';
import { Alert } from '../../../components/ui/feedback';
import { SelectField, TextField } from '../../../components/ui/field';
import { useAddPart } from '../api/add-part';
import { RatingFields, parseRatings, type RatingsDraft } from './ratings';

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
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [i.path.join('.'), i.message])));
      return;
    }
    setErrors({});
    add.mutate(body, {
      onSuccess: (p) => {
        setSaved(`${p.quantity} × ${p.value} put in ${p.box}.`);
        setV({ ...v, value: '', package: '', pinout: '', quantity: '1', notes: '' });
        setRatings({});
      },
    });
  };
  return (
    <form
      className="space-y-3 rounded-xl bg-white p-4 ring-2 ring-copper"
      aria-label="Add parts"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <h2 className="text-lg">Add parts{sourceItemId ? ' from this item' : ''}</h2>
      {saved && <Alert tone="success">{saved} Add the next one, or close.</Alert>}
      <div className="grid gap-3 sm:grid-cols-3">
        <SelectField
          label="Kind"
          value={v.type}
          onChange={(e) => {
            setV({ ...v, type: e.target.value as PartType });
            setRatings({});
          }}
        >
          {PART_TYPES.map((t) => (
            <option key={t} value={t}>
              {PART_TYPE_LABELS[t]}
            </option>
          ))}
        </SelectField>
        <TextField
          label="Value or description"
          value={v.value}
          onChange={(e) => setV({ ...v, value: e.target.value })}
          error={errors.value}
          placeholder="e.g. 13 A ceramic, MJE13003"
        />
        <TextField
          label="How many"
          inputMode="numeric"
          value={v.quantity}
          onChange={(e) => setV({ ...v, quantity: e.target.value })}
          error={errors.quantity}
        />
      </div>
      <RatingFields type={v.type} value={ratings} onChange={setRatings} errors={errors} />
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField
          label="Package (optional)"
          value={v.package}
          onChange={(e) => setV({ ...v, package: e.target.value })}
          placeholder="TO-220, axial…"
        />
        <TextField
          label="Pin-out (optional)"
          value={v.pinout}
          onChange={(e) => setV({ ...v, pinout: e.target.value })}
          placeholder="BCE, GDS…"
        />
        <TextField
          label="Box"
          value={v.box}
          onChange={(e) => setV({ ...v, box: e.target.value })}
          error={errors.box}
          placeholder="e.g. Box 3, fuse tin"
        />
      </div>
      <TextField label="Notes (optional)" value={v.notes} onChange={(e) => setV({ ...v, notes: e.target.value })} />
      {add.error && <Alert tone="error">{add.error.message}</Alert>}
      <div className="flex gap-2">
        <Button type="submit" busy={add.isPending}>
          Add to the stock
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          Close
        </Button>
      </div>
    </form>
  );
}
