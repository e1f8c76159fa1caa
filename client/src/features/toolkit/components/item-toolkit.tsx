import { useState } from 'react';
import { Link } from 'react-router';
import { PART_TYPES, PART_TYPE_LABELS, type PartType } from '../../../../../shared/salvage/constants';
import { formatDay } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { Alert, Card, Spinner } from '../../../components/ui/feedback';
import { SelectField, TextField } from '../../../components/ui/field';
import { paths } from '../../../config/paths';
import type { ItemStatus, Outcome } from '../../../../../shared/event-day/constants';
import { queryString } from '../../../lib/query-string';
import { useSimilarRepairs } from '../api/get-similar-repairs';
import { useSubstitutes } from '../api/get-substitutes';
import { useTakePart } from '../api/take-part';
import { AddPartForm } from './add-part-form';
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
  const similar = useSimilarRepairs(item.id);
  return (
    <Card>
      <div className="flex items-baseline justify-between gap-2">
        <h2 className="text-lg">Similar past repairs</h2>
        <Link
          className="text-sm font-semibold text-navy underline"
          to={paths.knowledge(queryString({ categoryId: item.categoryId, brand: item.brand, model: item.model }))}
        >
          Search all notes
        </Link>
      </div>
      {similar.isPending ? (
        <Spinner />
      ) : similar.error ? (
        <Alert tone="error">{similar.error.message}</Alert>
      ) : similar.data.length === 0 ? (
        <p className="text-sm text-ink-soft">
          No notes on this kind of item yet. Yours will be the first: add notes to the outcome.
        </p>
      ) : (
        <ol className="mt-2 space-y-2">
          {similar.data.slice(0, 3).map((e) => (
            <li key={e.itemId}>
              <KnowledgeCard entry={e} when={formatDay(e.eventDate, item.event.timeZone)} canWrite={false} />
            </li>
          ))}
        </ol>
      )}
    </Card>
  );
}

/** The bench calculators this item is likely to need, one tap away. */
export function CalculatorLinks({ item }: { item: Pick<ToolkitItem, 'mains'> }) {
  const links = [
    ...(item.mains
      ? [
          ['discharge', 'Capacitor discharge'],
          ['mains-peak', 'Rectified mains peak'],
          ['earth-limit', 'Earth limit for the cord'],
        ]
      : []),
    ['resistor-bands', 'Resistor colour bands'],
    ['resistor-code', 'Printed resistor codes'],
    ['measure', 'Measured resistance'],
    ['e-series', 'Nearest standard value'],
    ['transistor', 'Transistor substitute'],
    ['diode-test', 'Transistor diode test'],
  ];
  return (
    <Card>
      <h2 className="mb-2 text-lg">Bench calculators</h2>
      <ul className="flex flex-wrap gap-2">
        {links.map(([id, label]) => (
          <li key={id}>
            <Link
              to={paths.calculators(id)}
              className="inline-flex min-h-11 items-center rounded-lg bg-white px-3 font-semibold text-navy ring-1 ring-navy/25 hover:bg-navy/5"
            >
              {label}
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
  const canLookUp = item.status !== 'done' || item.outcome?.outcome === 'parts-needed';
  const endOfLife = item.outcome?.outcome === 'end-of-life';
  // Once the outcome is in, a card with no part taken and nothing to save would be a heading alone.
  if (!canLookUp && !endOfLife && item.partsUsed.length === 0) return null;
  return (
    <Card>
      <h2 className="text-lg">Salvage stock</h2>
      {item.partsUsed.length > 0 && (
        <ul className="my-2 text-sm" aria-label="Parts used">
          {item.partsUsed.map((p) => (
            <li key={p.id}>
              Used: {p.quantity} × {p.value}
              {p.package && ` (${p.package})`} from {p.box}
              {p.takenBy && ` — ${p.takenBy}`}
            </li>
          ))}
        </ul>
      )}
      {canLookUp && (
        <form
          className="space-y-3"
          aria-label="Find a substitute"
          onSubmit={(e) => {
            e.preventDefault();
            const parsed = parseRatings(ratings);
            const bad = Object.entries(parsed)
              .filter(([, v]) => typeof v === 'number' && Number.isNaN(v))
              .map(([k]) => k);
            setLookupErrors(
              Object.fromEntries(bad.map((k) => [`ratings.${k}`, 'Enter a number (a decimal comma is fine).'])),
            );
            if (!bad.length) setSearch({ type, ...parsed, ...(pkg ? { package: pkg } : {}) });
          }}
        >
          <p className="text-sm text-ink-soft">
            Say what the item needs; the stock is checked against the substitution rule.
          </p>
          <div className="grid gap-3 sm:grid-cols-2">
            <SelectField
              label="Part needed"
              value={type}
              onChange={(e) => {
                setType(e.target.value as PartType);
                setRatings({});
                setSearch(null);
              }}
            >
              {PART_TYPES.map((t) => (
                <option key={t} value={t}>
                  {PART_TYPE_LABELS[t]}
                </option>
              ))}
            </SelectField>
            <TextField
              label="Package (optional)"
              value={pkg}
              onChange={(e) => setPkg(e.target.value)}
              placeholder="TO-126, axial…"
            />
          </div>
          <RatingFields type={type} value={ratings} onChange={setRatings} errors={lookupErrors} />
          <Button type="submit" variant="secondary" className="w-full">
            Look in the stock
          </Button>
        </form>
      )}
      {search &&
        (found.isPending ? (
          <Spinner />
        ) : found.error ? (
          <Alert tone="error">{found.error.message}</Alert>
        ) : found.data.length === 0 ? (
          <p className="mt-3 text-sm text-ink-soft">Nothing of that kind in the stock.</p>
        ) : (
          <ul className="mt-3 space-y-2" aria-label="Candidates">
            {found.data.map(({ part: p, verdict: v }) => (
              <li
                key={p.id}
                className={`rounded-lg p-3 ring-1 ${v.verdict === 'refuse' ? 'bg-ink/5 ring-ink/10' : v.verdict === 'accept' ? 'bg-sage-light ring-sage' : 'bg-copper-light ring-copper'}`}
                data-testid="substitute"
              >
                <p className="font-bold">
                  {p.value}{' '}
                  <span className="font-normal text-ink-soft">
                    · {p.quantity} in {p.box}
                    {p.package && ` · ${p.package}`}
                    {ratingsText(p.ratings) && ` · ${ratingsText(p.ratings)}`}
                  </span>
                </p>
                <p className="text-sm font-semibold">
                  {v.verdict === 'accept'
                    ? 'Suitable'
                    : v.verdict === 'accept-with-warnings'
                      ? 'Suitable, with care'
                      : 'Not suitable'}
                </p>
                {[...v.reasons, ...v.warnings].length > 0 && (
                  <ul className="list-disc pl-5 text-sm">
                    {[...v.reasons, ...v.warnings].map((r) => (
                      <li key={r}>{r}</li>
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
                    Take one for this item
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
              <p className="text-sm">
                This item has reached the end of its life. Save its good parts for the next repair: fuses, switches,
                motors, capacitors, transistors.
              </p>
              <Button className="mt-2" variant="secondary" onClick={() => setAdding(true)}>
                Save its reusable parts
              </Button>
            </>
          )}
        </div>
      )}
    </Card>
  );
}
