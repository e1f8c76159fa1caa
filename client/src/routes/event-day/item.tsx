import { useParams, type LoaderFunctionArgs } from 'react-router';
import { Alert, Spinner } from '../../components/ui/feedback';
import { itemQuery, useItem } from '../../features/event-day/api/get-item';
import { eventDayKeys } from '../../features/event-day/api/keys';
import { ItemBody } from '../../features/event-day/components/item-body';
import { CalculatorLinks, SalvageForItem, SimilarRepairs } from '../../features/toolkit/components/item-toolkit';
import { queryClient } from '../../lib/query-client';

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(itemQuery(Number(params.itemId))).catch(() => null);

/** The fixer's page for one item; the toolkit's parts (similar repairs, salvage, calculators) are composed here. */
export function ItemPage() {
  const id = Number(useParams().itemId);
  const { data: item, isPending, error } = useItem(id);
  if (isPending) return <Spinner />;
  if (error) return <Alert tone="error">{error.message}</Alert>;
  return (
    <ItemBody
      item={item}
      toolkit={{
        similarRepairs: <SimilarRepairs item={item} />,
        salvage: (
          <SalvageForItem
            item={item}
            onChanged={() => void queryClient.invalidateQueries({ queryKey: eventDayKeys.item(item.id) })}
          />
        ),
        calculators: <CalculatorLinks item={item} />,
      }}
    />
  );
}
