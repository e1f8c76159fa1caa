import type { ReactNode } from 'react';
import { useT } from '../../lib/i18n';

export function Alert({
  tone = 'info',
  title,
  children,
}: {
  tone?: 'info' | 'error' | 'success' | 'caution';
  title?: string;
  children: ReactNode;
}) {
  const styles = {
    info: 'bg-navy/5 border-navy/30',
    error: 'bg-alert-light border-alert text-alert',
    success: 'bg-sage-light border-sage',
    caution: 'bg-copper-light border-copper',
  };
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={`rounded-lg border-l-4 px-4 py-3 ${styles[tone]}`}>
      {title && <p className="font-bold">{title}</p>}
      <div className="text-sm leading-relaxed">{children}</div>
    </div>
  );
}

export function Spinner({ label }: { label?: string }) {
  const t = useT();
  return (
    <div role="status" className="flex items-center gap-3 py-8 text-ink-soft">
      <span className="size-5 animate-spin rounded-full border-2 border-navy border-r-transparent" aria-hidden />
      {label ?? t('common.loading')}
    </div>
  );
}

export function EmptyState({ title, children, icon = '○' }: { title: string; children?: ReactNode; icon?: string }) {
  return (
    <div className="rounded-xl border-2 border-dashed border-ink/15 px-6 py-10 text-center">
      <div className="mb-2 text-3xl text-copper" aria-hidden>
        {icon}
      </div>
      <p className="font-bold text-navy">{title}</p>
      {children && <div className="mx-auto mt-1 max-w-md text-sm text-ink-soft">{children}</div>}
    </div>
  );
}

export function Card({
  children,
  className = '',
  flush = false,
}: {
  children: ReactNode;
  className?: string;
  flush?: boolean;
}) {
  return (
    <section className={`rounded-xl bg-white shadow-sm ring-1 ring-ink/5 ${flush ? '' : 'p-5'} ${className}`}>
      {children}
    </section>
  );
}

export function PageTitle({ title, lead }: { title: string; lead?: ReactNode }) {
  return (
    <header className="mb-6">
      <h1 className="text-2xl sm:text-3xl">{title}</h1>
      {lead && <p className="mt-1 text-ink-soft">{lead}</p>}
    </header>
  );
}
