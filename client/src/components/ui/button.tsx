import type { ButtonHTMLAttributes } from 'react';

const styles = {
  primary: 'bg-copper text-white hover:bg-copper-dark',
  secondary: 'bg-white text-navy ring-1 ring-navy/25 hover:bg-navy/5',
  danger: 'bg-alert text-white hover:brightness-90',
  quiet: 'text-navy hover:bg-navy/5',
};

export function Button({
  variant = 'primary',
  busy,
  className = '',
  children,
  disabled,
  ...rest
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: keyof typeof styles; busy?: boolean }) {
  return (
    <button
      {...rest}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      className={`inline-flex min-h-11 items-center justify-center gap-2 rounded-lg px-4 py-2 font-bold transition disabled:cursor-not-allowed disabled:opacity-60 ${styles[variant]} ${className}`}
    >
      {busy && (
        <span className="size-4 animate-spin rounded-full border-2 border-current border-r-transparent" aria-hidden />
      )}
      {children}
    </button>
  );
}
