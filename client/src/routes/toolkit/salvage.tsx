import { useState } from 'react';
import { useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { PART_TYPES, PART_TYPE_LABELS, type PartType } from '../../../../shared/salvage/constants';
import { GroupTabs } from '../../components/layouts/group-tabs';
import { Button } from '../../components/ui/button';
import { ConfirmDialog } from '../../components/ui/confirm-dialog';
import { Alert, EmptyState, PageTitle } from '../../components/ui/feedback';
import { SelectField, TextField } from '../../components/ui/field';
import { useUser } from '../../lib/auth';
import { queryClient } from '../../lib/query-client';
import type { SalvagePart } from '../../features/toolkit/api/types';
import { useRemovePart } from '../../features/toolkit/api/remove-part';
import { salvageQuery, useSalvage } from '../../features/toolkit/api/get-salvage';
import { useTakePart } from '../../features/toolkit/api/take-part';
import { useUpdatePart } from '../../features/toolkit/api/update-part';
import { ratingsText } from '../../features/toolkit/components/ratings';
import { AddPartForm } from '../../features/toolkit/components/add-part-form';

/** The list's filters as the address says them: kind, words, and whether used-up parts show too. */
const filterOf = (params: URLSearchParams) => {
  const type = (PART_TYPES as readonly string[]).includes(params.get('type') ?? '')
    ? (params.get('type') as PartType)
    : undefined;
  const q = params.get('q') ?? '';
  return { type, q, filter: { type, q: q || undefined, inStock: params.get('all') ? undefined : ('1' as const) } };
};

/** The page reads what the loader fetched; a failure to fetch it is the route's error, shown in the page frame. */
export const loader = ({ params, request }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(salvageQuery(Number(params.groupId), filterOf(new URL(request.url).searchParams).filter));

/** /groups/:groupId/salvage: the parts the group has saved, by box, with what each is rated for. */
export function SalvagePage() {
  const groupId = Number(useParams().groupId);
  const { data: user } = useUser();
  const [params, setParams] = useSearchParams();
  const { type, q, filter } = filterOf(params);
  const { data: parts } = useSalvage(groupId, filter);
  const [adding, setAdding] = useState(params.get('add') === '1');
  // The field keeps what is typed: the address (and so `q`) changes only once the loader has the list for it.
  const [typed, setTyped] = useState(q);
  const organiser = user?.admin || user?.roles.some((r) => r.groupId === groupId && r.role === 'organiser');
  return (
    <div className="space-y-5">
      {organiser && <GroupTabs groupId={groupId} />}
      <PageTitle
        title="Salvage stock"
        lead="Parts saved from items beyond mending or given to the group, and the box each is in."
      />
      <form
        role="search"
        className="flex flex-wrap items-end gap-3 rounded-xl bg-white p-4 ring-1 ring-ink/5"
        onSubmit={(e) => e.preventDefault()}
      >
        <div className="min-w-40 flex-1">
          <TextField
            label="Search"
            value={typed}
            onChange={(e) => {
              setTyped(e.target.value);
              const n = new URLSearchParams(params);
              if (e.target.value) n.set('q', e.target.value);
              else n.delete('q');
              setParams(n, { replace: true });
            }}
            placeholder="value, package, box"
          />
        </div>
        <SelectField
          label="Kind"
          value={type ?? ''}
          onChange={(e) => {
            const n = new URLSearchParams(params);
            if (e.target.value) n.set('type', e.target.value);
            else n.delete('type');
            setParams(n);
          }}
        >
          <option value="">All kinds</option>
          {PART_TYPES.map((t) => (
            <option key={t} value={t}>
              {PART_TYPE_LABELS[t]}
            </option>
          ))}
        </SelectField>
        <label className="flex min-h-11 items-center gap-2 text-sm">
          <input
            type="checkbox"
            className="size-5 accent-copper"
            checked={Boolean(params.get('all'))}
            onChange={(e) => {
              const n = new URLSearchParams(params);
              if (e.target.checked) n.set('all', '1');
              else n.delete('all');
              setParams(n);
            }}
          />
          Show used-up parts
        </label>
        <Button type="button" onClick={() => setAdding(true)}>
          Add parts
        </Button>
      </form>
      {adding && (
        <AddPartForm
          groupId={groupId}
          sourceItemId={Number(params.get('from')) || undefined}
          onDone={() => setAdding(false)}
        />
      )}
      {parts.length === 0 && (q || type) ? (
        <EmptyState title="No parts match" icon="○">
          Nothing in the boxes matches {q ? `“${q}”` : 'that kind'}
          {params.get('all') ? '' : ' (used-up parts are hidden)'}.
        </EmptyState>
      ) : parts.length === 0 ? (
        <EmptyState title="No parts here yet" icon="▣">
          When an item reaches the end of its life, save its good parts here: fuses, switches, motors, capacitors,
          transistors.
        </EmptyState>
      ) : (
        <ul className="grid gap-3 md:grid-cols-2" aria-label="Parts">
          {parts.map((p) => (
            <li key={p.id}>
              <PartCard groupId={groupId} part={p} canRemove={Boolean(organiser)} />
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

function PartCard({ groupId, part: p, canRemove }: { groupId: number; part: SalvagePart; canRemove: boolean }) {
  const take = useTakePart(groupId);
  const update = useUpdatePart(groupId);
  const remove = useRemovePart(groupId);
  const [confirm, setConfirm] = useState(false);
  const [took, setTook] = useState<string | null>(null);
  return (
    <article className="rounded-xl bg-white p-4 shadow-sm ring-1 ring-ink/5" data-testid="salvage-part">
      <div className="flex items-baseline justify-between gap-2">
        <h3 className="text-lg">{p.value}</h3>
        <span
          className={`rounded-full px-2 py-0.5 text-xs font-bold ${p.quantity ? 'bg-sage-light' : 'bg-ink/5 text-ink-soft'}`}
        >
          {p.quantity} in {p.box}
        </span>
      </div>
      <p className="text-sm text-ink-soft">
        {p.typeLabel}
        {p.package && ` · ${p.package}`}
        {p.pinout && ` · pins ${p.pinout}`}
        {ratingsText(p.ratings) && ` · ${ratingsText(p.ratings)}`}
      </p>
      {p.notes && <p className="mt-1 text-sm">{p.notes}</p>}
      {(take.error || update.error) && (
        <div className="mt-2">
          <Alert tone="error">{(take.error ?? update.error)!.message}</Alert>
        </div>
      )}
      {took && (
        <p role="status" className="mt-2 text-sm font-semibold text-sage">
          {took}
        </p>
      )}
      <div className="mt-2 flex flex-wrap gap-2">
        <Button
          variant="secondary"
          disabled={p.quantity === 0}
          busy={take.isPending}
          aria-label={`Take one ${p.value}`}
          onClick={() =>
            take.mutate(p.id, { onSuccess: (after) => setTook(`Took one from ${after.box}: ${after.quantity} left.`) })
          }
        >
          Take one
        </Button>
        <Button
          variant="quiet"
          onClick={() => update.mutate({ id: p.id, quantity: p.quantity + 1 }, { onSuccess: () => setTook(null) })}
        >
          {/* The part's name is read out but not shown: each card already has it as its title. */}
          {took ? (
            <>
              Put it back<span className="sr-only">: {p.value}</span>
            </>
          ) : (
            <>
              Add one<span className="sr-only"> {p.value}</span> to the box
            </>
          )}
        </Button>
        {canRemove && (
          <Button variant="quiet" aria-label={`Remove ${p.value}`} onClick={() => setConfirm(true)}>
            Remove
          </Button>
        )}
      </div>
      <ConfirmDialog
        open={confirm}
        title="Remove this part from the list?"
        message={`${p.value} (${p.quantity} in ${p.box}) goes from the stock list. The record of where earlier ones went stays with those items.`}
        confirmLabel="Remove"
        onCancel={() => setConfirm(false)}
        onConfirm={() => remove.mutate(p.id, { onSuccess: () => setConfirm(false) })}
        busy={remove.isPending}
      />
    </article>
  );
}
