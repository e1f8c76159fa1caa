import { useParams, type LoaderFunctionArgs } from 'react-router';
import { itemQuery, useItem } from '../../features/event-day/api/get-item';
import { eventDayKeys } from '../../features/event-day/api/keys';
import { ItemBody } from '../../features/event-day/components/item-body';
import { CalculatorLinks, SalvageForItem, SimilarRepairs } from '../../features/toolkit/components/item-toolkit';
import { NextInQueue } from '../../features/workbench/components/next-in-queue';
import { queryClient } from '../../lib/query-client';

/** The page reads what the loader fetched; a failure to fetch it is the route's error, shown in the page frame. */
export const loader = ({ params }: LoaderFunctionArgs) => queryClient.ensureQueryData(itemQuery(Number(params.itemId)));

/**
 * The fixer's page for one item; the toolkit's parts (similar repairs, salvage, calculators) and the way on from the
 * workbench queue (next item, back to the queue) are composed here.
 */
export function ItemPage() {
  const id = Number(useParams().itemId);
  const { data: item } = useItem(id);
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
      whatNext={<NextInQueue doneItemId={item.id} />}
    />
  );
}
