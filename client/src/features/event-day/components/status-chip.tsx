import { ITEM_STATUS_LABELS, type ItemStatus } from '../../../../../shared/event-day/constants';

const STATUS_TONE: Record<ItemStatus, string> = {
  booked: 'bg-ink/5 text-ink-soft',
  'checked-in': 'bg-copper-light text-copper-dark',
  waiting: 'bg-copper-light text-copper-dark',
  'at-bench': 'bg-navy/10 text-navy',
  done: 'bg-sage-light text-ink',
  'no-show': 'bg-ink/5 text-ink-soft line-through',
  withdrawn: 'bg-ink/5 text-ink-soft line-through',
};

export function StatusChip({ status }: { status: ItemStatus }) {
  return (
    <span className={`inline-block rounded-full px-2 py-0.5 text-xs font-bold ${STATUS_TONE[status]}`}>
      {ITEM_STATUS_LABELS[status]}
    </span>
  );
}
