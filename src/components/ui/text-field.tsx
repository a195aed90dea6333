import { useId, type InputHTMLAttributes, type Ref } from 'react';
import { cx } from '../../lib/cx';

type TextFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> & {
  label: string;
  /** Shown under the label; says what the field expects. */
  hint?: string;
  /** Shown under the field and announced with it. */
  error?: string;
  ref?: Ref<HTMLInputElement>;
};

export function TextField({ label, hint, error, className, ref, ...input }: TextFieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;

  return (
    <div className={cx('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-semibold text-ink-900">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-xs text-ink-500">
          {hint}
        </p>
      )}
      <input
        id={id}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={cx(
          'rounded-md border bg-calico-50 px-3 py-2 text-base text-ink-900 shadow-inner shadow-calico-200/60',
          'placeholder:text-ink-500/70 focus:border-denim-600 focus:outline-none focus:ring-2 focus:ring-tape-400',
          error ? 'border-madder-700' : 'border-calico-400',
        )}
        {...input}
      />
      {error && (
        <p id={errorId} className="flex items-start gap-1.5 text-sm font-medium text-madder-700">
          <span aria-hidden className="mt-1.5 size-2 shrink-0 rotate-45 bg-madder-700" />
          {error}
        </p>
      )}
    </div>
  );
}
