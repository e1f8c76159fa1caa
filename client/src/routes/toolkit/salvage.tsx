import { useState } from 'react';
import { useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { PART_TYPES, type PartType } from '../../../../shared/salvage/constants';
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
import { trParts, useLanguage, useT } from '../../lib/i18n';

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
  const t = useT();
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
      <PageTitle title={t('bench.tool.salvage.title')} lead={t('bench.tool.stock.lead')} />
      <form
        role="search"
        className="flex flex-wrap items-end gap-3 rounded-xl bg-white p-4 ring-1 ring-ink/5"
        onSubmit={(e) => e.preventDefault()}
      >
        <div className="min-w-40 flex-1">
          <TextField
            label={t('bench.tool.search')}
            value={typed}
            onChange={(e) => {
              setTyped(e.target.value);
              const n = new URLSearchParams(params);
              if (e.target.value) n.set('q', e.target.value);
              else n.delete('q');
              setParams(n, { replace: true });
            }}
            placeholder={t('bench.tool.stock.searchPlaceholder')}
          />
        </div>
        <SelectField
          label={t('bench.tool.add.kind')}
          value={type ?? ''}
          onChange={(e) => {
            const n = new URLSearchParams(params);
            if (e.target.value) n.set('type', e.target.value);
            else n.delete('type');
            setParams(n);
          }}
        >
          <option value="">{t('bench.tool.stock.allKinds')}</option>
          {PART_TYPES.map((pt) => (
            <option key={pt} value={pt}>
              {t(`bench.tool.part.${pt}`)}
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
          {t('bench.tool.stock.showUsedUp')}
        </label>
        <Button type="button" onClick={() => setAdding(true)}>
          {t('bench.tool.add.title')}
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
        <EmptyState title={t('bench.tool.stock.noMatchTitle')} icon="○">
          {t(`bench.tool.stock.${q ? 'noMatchWords' : 'noMatchKind'}${params.get('all') ? 'All' : ''}`, { q })}
        </EmptyState>
      ) : parts.length === 0 ? (
        <EmptyState title={t('bench.tool.stock.emptyTitle')} icon="▣">
          {t('bench.tool.stock.empty')}
        </EmptyState>
      ) : (
        <ul className="grid gap-3 md:grid-cols-2" aria-label={t('bench.tool.stock.parts')}>
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
  const t = useT();
  const lang = useLanguage();
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
          {t('bench.tool.salvage.inBox', { quantity: p.quantity, box: p.box })}
        </span>
      </div>
      <p className="text-sm text-ink-soft">
        {t(`bench.tool.part.${p.type}`)}
        {p.package && ` · ${p.package}`}
        {p.pinout && ` · ${t('bench.tool.stock.pins', { pinout: p.pinout })}`}
        {ratingsText(p.ratings, lang) && ` · ${ratingsText(p.ratings, lang)}`}
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
          aria-label={t('bench.tool.stock.takeOneOf', { value: p.value })}
          onClick={() =>
            take.mutate(p.id, {
              onSuccess: (after) => setTook(t('bench.tool.stock.took', { box: after.box, n: after.quantity })),
            })
          }
        >
          {t('bench.tool.stock.takeOne')}
        </Button>
        <Button
          variant="quiet"
          onClick={() => update.mutate({ id: p.id, quantity: p.quantity + 1 }, { onSuccess: () => setTook(null) })}
        >
          {/* The part's name is read out but not shown: each card already has it as its title. */}
          {took ? (
            <>
              {trParts('bench.tool.stock.putBack', {
                name: <span className="sr-only">{t('bench.tool.stock.putBackName', { value: p.value })}</span>,
              })}
            </>
          ) : (
            <>{trParts('bench.tool.stock.addOne', { name: <span className="sr-only"> {p.value}</span> })}</>
          )}
        </Button>
        {canRemove && (
          <Button
            variant="quiet"
            aria-label={t('bench.tool.stock.removeOf', { value: p.value })}
            onClick={() => setConfirm(true)}
          >
            {t('bench.tool.stock.remove')}
          </Button>
        )}
      </div>
      <ConfirmDialog
        open={confirm}
        title={t('bench.tool.stock.removeTitle')}
        message={t('bench.tool.stock.removeMessage', { value: p.value, quantity: p.quantity, box: p.box })}
        confirmLabel={t('bench.tool.stock.remove')}
        onCancel={() => setConfirm(false)}
        onConfirm={() => remove.mutate(p.id, { onSuccess: () => setConfirm(false) })}
        busy={remove.isPending}
      />
    </article>
  );
}
