import { useEffect, useId, useRef, type ReactNode } from 'react';
import { Button } from './button';
import { useT } from '../../lib/i18n';

/** A modal question before anything destructive; Escape or the cancel button ("Keep" unless told) cancels. */
export function ConfirmDialog({
  open,
  title,
  message,
  confirmLabel,
  onConfirm,
  onCancel,
  busy,
  children,
  tone = 'danger',
  cancelLabel,
}: {
  open: boolean;
  title: string;
  message: string;
  confirmLabel: string;
  onConfirm: () => void;
  onCancel: () => void;
  busy?: boolean;
  children?: ReactNode;
  tone?: 'danger' | 'primary';
  cancelLabel?: string;
}) {
  const t = useT();
  const ref = useRef<HTMLDialogElement>(null);
  const id = useId();
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) {
      d.showModal();
      // The safe answer takes the first focus, so Enter or Escape both leave things as they were.
      d.querySelector<HTMLButtonElement>('[data-keep]')?.focus();
    }
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-labelledby={`${id}-title`}
      aria-describedby={`${id}-message`}
      onCancel={(e) => {
        e.preventDefault();
        onCancel();
      }}
      className="m-auto w-[min(28rem,92vw)] rounded-xl p-0 shadow-xl backdrop:bg-ink/40"
    >
      <div className="space-y-3 p-6">
        <h2 id={`${id}-title`} className="text-lg">
          {title}
        </h2>
        <p id={`${id}-message`} className="text-ink-soft">
          {message}
        </p>
        {children}
        <div className="flex justify-end gap-2 pt-2">
          <Button data-keep variant="secondary" onClick={onCancel}>
            {cancelLabel ?? t('common.keep')}
          </Button>
          <Button variant={tone} onClick={onConfirm} busy={busy}>
            {confirmLabel}
          </Button>
        </div>
      </div>
    </dialog>
  );
}
