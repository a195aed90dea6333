import { useId } from 'react';
import { formatLength, parseLength, type LengthUnit } from '../../../geometry/units';
import { cx } from '../../lib/cx';
import { FieldError } from './field-error';
import { FieldLabel } from './field-label';

/** What a typed length reads as in the person's units, or null when it is blank or not a length. */
function readBack(text: string, unit: LengthUnit): string | null {
  if (text.trim() === '') return null;
  try {
    return formatLength(parseLength(text, unit), unit);
  } catch {
    return null;
  }
}

/**
 * A length typed in the person's units that may be left blank ("not measured"). It reads like
 * the shared LengthField (`2 1/2`, `2.5in`, `6.35 cm`, `63.5mm`, geometry/units.ts) and shows
 * what it read, but keeps the text as typed until the form is sent, so a blank stays blank and
 * the server's message for the field can be shown beside it. (LengthField is the one for
 * lengths that always have a value.)
 */
export function LengthInput({
  label,
  hint,
  value,
  unit,
  onChange,
  error,
  name,
  className,
}: {
  label: string;
  hint?: string;
  value: string;
  unit: LengthUnit;
  onChange: (text: string) => void;
  error?: string;
  /** The field's key as the API names it (for tests and error focus). */
  name?: string;
  className?: string;
}) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const shown = error ? null : readBack(value, unit);
  const readsAsId = shown && shown !== value.trim() ? `${id}-reads` : undefined;
  return (
    <div className={cx('flex flex-col gap-1', className)}>
      <FieldLabel htmlFor={id} label={label} hint={hint} hintId={hintId} />
      <input
        id={id}
        name={name}
        inputMode="text"
        autoComplete="off"
        value={value}
        aria-invalid={error ? true : undefined}
        aria-describedby={[hintId, errorId, readsAsId].filter(Boolean).join(' ') || undefined}
        onChange={(event) => onChange(event.target.value)}
        className={cx(
          'rounded-md border bg-calico-50 px-3 py-1.5 text-base tabular-nums text-ink-900 focus:border-denim-600 focus:outline-none focus:ring-2 focus:ring-tape-400',
          error ? 'border-madder-700' : 'border-calico-400',
        )}
      />
      {readsAsId && (
        <p id={readsAsId} className="text-xs text-ink-500">
          Reads as {shown}
        </p>
      )}
      <FieldError id={errorId}>{error}</FieldError>
    </div>
  );
}
