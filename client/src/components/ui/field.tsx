import {
  forwardRef,
  useId,
  type InputHTMLAttributes,
  type ReactNode,
  type SelectHTMLAttributes,
  type TextareaHTMLAttributes,
} from 'react';
import { tr } from '../../lib/i18n';

interface FieldProps {
  label: string;
  error?: string;
  hint?: ReactNode;
}

const inputClass = (error?: string) =>
  `block w-full rounded-lg border bg-white px-3 py-2.5 text-base text-ink shadow-sm outline-none focus:border-copper focus:ring-2 focus:ring-copper/30 ${error ? 'border-alert' : 'border-ink/20'}`;

export const TextField = forwardRef<HTMLInputElement, FieldProps & InputHTMLAttributes<HTMLInputElement>>(
  function TextField({ label, error, hint, ...rest }, ref) {
    const id = useId();
    return (
      <div className="space-y-1">
        <label htmlFor={id} className="block font-semibold">
          {label}
        </label>
        <input
          ref={ref}
          id={id}
          aria-invalid={Boolean(error)}
          aria-describedby={error || hint ? `${id}-msg` : undefined}
          className={inputClass(error)}
          {...rest}
        />
        {(error || hint) && (
          <p id={`${id}-msg`} className={`text-sm ${error ? 'font-semibold text-alert' : 'text-ink-soft'}`}>
            {error ? tr(error) : hint}
          </p>
        )}
      </div>
    );
  },
);

export const SelectField = forwardRef<HTMLSelectElement, FieldProps & SelectHTMLAttributes<HTMLSelectElement>>(
  function SelectField({ label, error, hint, children, ...rest }, ref) {
    const id = useId();
    return (
      <div className="space-y-1">
        <label htmlFor={id} className="block font-semibold">
          {label}
        </label>
        <select
          ref={ref}
          id={id}
          aria-invalid={Boolean(error)}
          aria-describedby={error || hint ? `${id}-msg` : undefined}
          className={inputClass(error)}
          {...rest}
        >
          {children}
        </select>
        {(error || hint) && (
          <p id={`${id}-msg`} className={`text-sm ${error ? 'font-semibold text-alert' : 'text-ink-soft'}`}>
            {error ? tr(error) : hint}
          </p>
        )}
      </div>
    );
  },
);

export const TextAreaField = forwardRef<HTMLTextAreaElement, FieldProps & TextareaHTMLAttributes<HTMLTextAreaElement>>(
  function TextAreaField({ label, error, hint, ...rest }, ref) {
    const id = useId();
    return (
      <div className="space-y-1">
        <label htmlFor={id} className="block font-semibold">
          {label}
        </label>
        <textarea
          ref={ref}
          id={id}
          rows={3}
          aria-invalid={Boolean(error)}
          aria-describedby={error || hint ? `${id}-msg` : undefined}
          className={inputClass(error)}
          {...rest}
        />
        {(error || hint) && (
          <p id={`${id}-msg`} className={`text-sm ${error ? 'font-semibold text-alert' : 'text-ink-soft'}`}>
            {error ? tr(error) : hint}
          </p>
        )}
      </div>
    );
  },
);

/** A tick box with its label beside it, big enough to hit with a thumb. */
export const CheckField = forwardRef<HTMLInputElement, FieldProps & InputHTMLAttributes<HTMLInputElement>>(
  function CheckField({ label, error, hint, ...rest }, ref) {
    const id = useId();
    return (
      <div className="space-y-1">
        <label htmlFor={id} className="flex min-h-11 cursor-pointer items-center gap-3">
          <input
            ref={ref}
            id={id}
            type="checkbox"
            aria-invalid={Boolean(error)}
            aria-describedby={error || hint ? `${id}-msg` : undefined}
            className="size-5 accent-copper"
            {...rest}
          />
          <span className="font-semibold">{label}</span>
        </label>
        {(error || hint) && (
          <p id={`${id}-msg`} className={`text-sm ${error ? 'font-semibold text-alert' : 'text-ink-soft'}`}>
            {error ? tr(error) : hint}
          </p>
        )}
      </div>
    );
  },
);
