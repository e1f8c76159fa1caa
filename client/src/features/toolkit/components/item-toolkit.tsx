import { useState } from 'react';
import { Link } from 'react-router';
import { PART_TYPES, type PartType } from '../../../../../shared/salvage/constants';
import { formatDay } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { Alert, Card, Spinner } from '../../../components/ui/feedback';
import { SelectField, TextField } from '../../../components/ui/field';
import { paths } from '../../../config/paths';
import type { ItemStatus, Outcome } from '../../../../../shared/event-day/constants';
import { queryString } from '../../../lib/query-string';
import { useUser } from '../../../lib/auth';
import { mayInGroup } from '../../../../../shared/permissions';
import { useSimilarRepairs } from '../api/get-similar-repairs';
import { useSubstitutes } from '../api/get-substitutes';
import { useTakePart } from '../api/take-part';
import { useLanguage, useT } from '../../../lib/i18n';
import { AddPartForm } from './add-part-form';
import { saidIn } from './said';
import { KnowledgeCard } from './knowledge-card';
import { parseRatings, RatingFields, ratingsText, type RatingsDraft } from './ratings';

/** What the toolkit needs to know of the item on the fixer's page; the page passes its own item, which has more. */
export interface ToolkitItem {
  id: number;
  status: ItemStatus;
  categoryId: number;
  brand: string | null;
  model: string | null;
  mains: boolean;
  event: { groupId: number; timeZone: string };
  outcome: { outcome: Outcome } | null;
  partsUsed: { id: number; quantity: number; value: string; package: string; box: string; takenBy: string | null }[];
}

/** "Similar past repairs": start where the last fixer ended. */
export function SimilarRepairs({ item }: { item: ToolkitItem }) {
  const t = useT();
  const lang = useLanguage();
  const similar = useSimilarRepairs(item.id);
  return (
    <Card>
      <div className="flex items-baseline justify-between gap-2">
        <h2 className="text-lg">{t('bench.tool.similar.title')}</h2>
        <Link
          className="text-sm font-semibold text-navy underline"
          to={paths.knowledge(queryString({ categoryId: item.categoryId, brand: item.brand, model: item.model }))}
        >
          {t('bench.tool.similar.searchAll')}
        </Link>
      </div>
      {similar.isPending ? (
        <Spinner />
      ) : similar.error ? (
        <Alert tone="error">{similar.error.message}</Alert>
      ) : similar.data.length === 0 ? (
        <p className="text-sm text-ink-soft">{t('bench.tool.similar.none')}</p>
      ) : (
        <ol className="mt-2 space-y-2">
          {similar.data.slice(0, 3).map((e) => (
            <li key={e.itemId}>
              <KnowledgeCard entry={e} when={formatDay(e.eventDate, item.event.timeZone, lang)} canWrite={false} />
            </li>
          ))}
        </ol>
      )}
    </Card>
  );
}

/** The bench calculators this item is likely to need, one tap away. */
export function CalculatorLinks({ item }: { item: Pick<ToolkitItem, 'mains'> }) {
  const t = useT();
  const links = [
    ...(item.mains ? ['discharge', 'mains-peak', 'earth-limit'] : []),
    'resistor-bands',
    'resistor-code',
    'measure',
    'e-series',
    'transistor',
    'diode-test',
  ];
  return (
    <Card>
      <h2 className="mb-2 text-lg">{t('bench.tool.calculators')}</h2>
      <ul className="flex flex-wrap gap-2">
        {links.map((id) => (
          <li key={id}>
            <Link
              to={paths.calculators(id)}
              className="inline-flex min-h-11 items-center rounded-lg bg-white px-3 font-semibold text-navy ring-1 ring-navy/25 hover:bg-navy/5"
            >
              {t(`bench.tool.link.${id}`)}
            </Link>
          </li>
        ))}
      </ul>
    </Card>
  );
}

/**
 * The parts taken for this item, and a search of the stock for one that can stand in for what is needed.
 * `onChanged` runs after a part is taken for the item or saved from it, so the page can refresh its item.
 */
export function SalvageForItem({ item, onChanged }: { item: ToolkitItem; onChanged?: () => void }) {
  const t = useT();
  const lang = useLanguage();
  const groupId = item.event.groupId;
  const [type, setType] = useState<PartType>('fuse');
  const [ratings, setRatings] = useState<RatingsDraft>({});
  const [pkg, setPkg] = useState('');
  const [search, setSearch] = useState<null | ({ type: PartType; package?: string } & ReturnType<typeof parseRatings>)>(
    null,
  );
  const found = useSubstitutes(groupId, search ?? { type }, search !== null);
  const take = useTakePart(groupId, item.id, onChanged);
  const [adding, setAdding] = useState(false);
  const [lookupErrors, setLookupErrors] = useState<Record<string, string>>({});
  const { data: me } = useUser();
  // Reception reads which parts were taken; looking one up, taking it and saving parts is the bench's (as the server says).
  const mayUse = mayInGroup(me, groupId, 'useSalvage');
  const canLookUp = mayUse && (item.status !== 'done' || item.outcome?.outcome === 'parts-needed');
  const endOfLife = mayUse && item.outcome?.outcome === 'end-of-life';
  // Once the outcome is in, a card with no part taken and nothing to save would be a heading alone.
  if (!canLookUp && !endOfLife && item.partsUsed.length === 0) return null;
  return (
    <Card>
      <h2 className="text-lg">{t('bench.tool.salvage.title')}</h2>
      {item.partsUsed.length > 0 && (
        <ul className="my-2 text-sm" aria-label={t('bench.tool.salvage.partsUsed')}>
          {item.partsUsed.map((p) => (
            <li key={p.id}>
              {t('bench.tool.salvage.used', {
                quantity: p.quantity,
                value: p.package ? `${p.value} (${p.package})` : p.value,
                box: p.box,
              })}
              {p.takenBy && ` — ${p.takenBy}`}
            </li>
          ))}
        </ul>
      )}
      {!mayUse && <p className="text-sm text-ink-soft">{t('bench.tool.salvage.forFixers')}</p>}
      {canLookUp && (
        <form
          className="space-y-3"
          aria-label={t('bench.tool.salvage.find')}
          onSubmit={(e) => {
            e.preventDefault();
            const parsed = parseRatings(ratings);
            const bad = Object.entries(parsed)
              .filter(([, v]) => typeof v === 'number' && Number.isNaN(v))
              .map(([k]) => k);
            setLookupErrors(Object.fromEntries(bad.map((k) => [`ratings.${k}`, t('bench.tool.salvage.notNumber')])));
            if (!bad.length) setSearch({ type, ...parsed, ...(pkg ? { package: pkg } : {}) });
          }}
        >
          <p className="text-sm text-ink-soft">{t('bench.tool.salvage.lead')}</p>
          <div className="grid gap-3 sm:grid-cols-2">
            <SelectField
              label={t('bench.tool.salvage.partNeeded')}
              value={type}
              onChange={(e) => {
                setType(e.target.value as PartType);
                setRatings({});
                setSearch(null);
              }}
            >
              {PART_TYPES.map((pt) => (
                <option key={pt} value={pt}>
                  {t(`bench.tool.part.${pt}`)}
                </option>
              ))}
            </SelectField>
            <TextField
              label={t('bench.tool.part.package')}
              value={pkg}
              onChange={(e) => setPkg(e.target.value)}
              placeholder={t('bench.tool.salvage.packagePlaceholder')}
            />
          </div>
          <RatingFields type={type} value={ratings} onChange={setRatings} errors={lookupErrors} />
          <Button type="submit" variant="secondary" className="w-full">
            {t('bench.tool.salvage.look')}
          </Button>
        </form>
      )}
      {search &&
        (found.isPending ? (
          <Spinner />
        ) : found.error ? (
          <Alert tone="error">{found.error.message}</Alert>
        ) : found.data.length === 0 ? (
          <p className="mt-3 text-sm text-ink-soft">{t('bench.tool.salvage.nothing')}</p>
        ) : (
          <ul className="mt-3 space-y-2" aria-label={t('bench.tool.salvage.candidates')}>
            {found.data.map(({ part: p, verdict: v }) => (
              <li
                key={p.id}
                className={`rounded-lg p-3 ring-1 ${v.verdict === 'refuse' ? 'bg-ink/5 ring-ink/10' : v.verdict === 'accept' ? 'bg-sage-light ring-sage' : 'bg-copper-light ring-copper'}`}
                data-testid="substitute"
              >
                <p className="font-bold">
                  {p.value}{' '}
                  <span className="font-normal text-ink-soft">
                    · {t('bench.tool.salvage.inBox', { quantity: p.quantity, box: p.box })}
                    {p.package && ` · ${p.package}`}
                    {ratingsText(p.ratings, lang) && ` · ${ratingsText(p.ratings, lang)}`}
                  </span>
                </p>
                <p className="text-sm font-semibold">
                  {v.verdict === 'accept'
                    ? t('bench.tool.salvage.accept')
                    : v.verdict === 'accept-with-warnings'
                      ? t('bench.tool.salvage.acceptWithWarnings')
                      : t('bench.tool.salvage.refuse')}
                </p>
                {[...v.said.reasons, ...v.said.warnings].length > 0 && (
                  <ul className="list-disc pl-5 text-sm">
                    {[...v.said.reasons, ...v.said.warnings].map((r, i) => (
                      <li key={`${r.code}-${i}`}>{saidIn(r, lang)}</li>
                    ))}
                  </ul>
                )}
                {v.verdict !== 'refuse' && (
                  <Button
                    className="mt-2"
                    variant="secondary"
                    busy={take.isPending && take.variables === p.id}
                    onClick={() => take.mutate(p.id)}
                  >
                    {t('bench.tool.salvage.take')}
                  </Button>
                )}
              </li>
            ))}
          </ul>
        ))}
      {take.error && (
        <div className="mt-2">
          <Alert tone="error">{take.error.message}</Alert>
        </div>
      )}
      {endOfLife && (
        <div className="mt-3 border-t border-ink/10 pt-3">
          {adding ? (
            <AddPartForm
              groupId={groupId}
              sourceItemId={item.id}
              onDone={() => setAdding(false)}
              onChanged={onChanged}
            />
          ) : (
            <>
              <p className="text-sm">{t('bench.tool.salvage.endOfLife')}</p>
              <Button className="mt-2" variant="secondary" onClick={() => setAdding(true)}>
                {t('bench.tool.salvage.saveParts')}
              </Button>
            </>
          )}
        </div>
      )}
    </Card>
  );
}
