import type { ItemStatus } from '../../../../../shared/event-day/constants';
import { useT } from '../../../lib/i18n';

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
  const t = useT();
  return (
    <span className={`inline-block rounded-full px-2 py-0.5 text-xs font-bold ${STATUS_TONE[status]}`}>
      {t(`fixer.status.${status}`)}
    </span>
  );
}
