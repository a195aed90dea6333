import { useId, type InputHTMLAttributes, type Ref } from 'react';
import { cx } from '../../lib/cx';
import { FieldError } from './field-error';
import { FieldLabel } from './field-label';

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
      <FieldLabel htmlFor={id} label={label} hint={hint} hintId={hintId} />
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
      <FieldError id={errorId}>{error}</FieldError>
    </div>
  );
}
