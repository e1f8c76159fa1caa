import { useT } from '../../../lib/i18n';

/** Free places as a bar: people would rather see "nearly full" than read "3 of 24". */
export function PlacesBar({ free, total, label = true }: { free: number; total: number; label?: boolean }) {
  const t = useT();
  const taken = total ? Math.round(((total - free) / total) * 100) : 100;
  const tone = free === 0 ? 'bg-alert' : free / Math.max(total, 1) < 0.25 ? 'bg-copper' : 'bg-sage';
  return (
    <div>
      <div
        className="h-2 w-full overflow-hidden rounded-full bg-ink/10"
        role="meter"
        aria-valuemin={0}
        aria-valuemax={total}
        aria-valuenow={total - free}
        aria-label={t('events.places.taken')}
      >
        <div className={`h-full ${tone}`} style={{ width: `${taken}%` }} />
      </div>
      {label && (
        <p className={`mt-1 text-sm font-semibold ${free === 0 ? 'text-alert' : 'text-ink-soft'}`}>
          {free === 0 ? t('events.places.full') : t('events.places.free', { free, total })}
        </p>
      )}
    </div>
  );
}

export function StatusBadge({ status }: { status: string }) {
  const tones: Record<string, string> = {
    draft: 'bg-ink/10 text-ink',
    published: 'bg-sage-light text-sage',
    closed: 'bg-navy/10 text-navy',
    cancelled: 'bg-alert-light text-alert',
    confirmed: 'bg-sage-light text-sage',
  };
  const t = useT();
  return (
    <span className={`inline-block rounded-full px-2.5 py-0.5 text-xs font-bold ${tones[status] ?? 'bg-ink/10'}`}>
      {status in tones ? t(`events.status.${status}`) : status}
    </span>
  );
}
