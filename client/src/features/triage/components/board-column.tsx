import type { ReactNode } from 'react';

/** One column of the board: a bench with its fixers' cards, or the items still waiting. */
export function BoardColumn({
  title,
  subtitle,
  tone,
  children,
}: {
  title: string;
  subtitle: string;
  tone?: 'wait';
  children: ReactNode;
}) {
  return (
    <section
      aria-label={title}
      className={`w-72 shrink-0 space-y-3 rounded-xl p-3 ${tone === 'wait' ? 'bg-copper-light/50' : 'bg-navy/5'}`}
    >
      <header>
        <h2 className="text-base">{title}</h2>
        <p className="text-xs text-ink-soft">{subtitle}</p>
      </header>
      {children}
    </section>
  );
}
