import { useId, useState } from 'react';
import { formatLength, LengthParseError, parseLength, type LengthUnit } from '../../../geometry/index.ts';
import { cx } from '../../lib/cx';
import { FieldLabel } from './field-label';

type LengthFieldProps = {
  label: string;
  /** Millimetres; shown in `unit`. */
  valueMm: number;
  unit: LengthUnit;
  /** Called with millimetres when the person presses Enter or leaves the field with a valid length. */
  onCommit: (mm: number) => void;
  hint?: string;
  /** Show a + on positive values (amounts that can go either way). */
  signed?: boolean;
  className?: string;
  disabled?: boolean;
};

/**
 * A length typed in the person's units: `2 1/2`, `2.5in`, `6.35 cm`, `63.5mm` (geometry/units.ts).
 * Shows what it read back in the person's units and a clear message for anything else.
 */
export function LengthField({ label, valueMm, unit, onCommit, hint, signed, className, disabled }: LengthFieldProps) {
  const id = useId();
  const shown = formatLength(valueMm, unit, signed ? { signed: true } : {});
  // What the person is typing; null shows the value itself (so a new value from outside shows at once).
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const text = draft ?? shown;

  const commit = () => {
    if (draft === null || draft.trim() === shown) {
      setDraft(null);
      return;
    }
    try {
      const mm = parseLength(draft, unit);
      setError(null);
      setDraft(null);
      onCommit(mm);
    } catch (e) {
      if (e instanceof LengthParseError) setError(e.message);
      else throw e;
    }
  };

  return (
    <div className={cx('flex flex-col gap-1', className)}>
      <FieldLabel htmlFor={id} label={label} hint={hint} />
      <input
        id={id}
        inputMode="text"
        value={text}
        disabled={disabled}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        onChange={(e) => setDraft(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') {
            e.preventDefault();
            commit();
          }
          if (e.key === 'Escape') {
            setDraft(null);
            setError(null);
          }
        }}
        className={cx(
          'rounded-md border bg-calico-50 px-3 py-1.5 text-base tabular-nums text-ink-900 focus:border-denim-600 focus:outline-none focus:ring-2 focus:ring-tape-400',
          error ? 'border-madder-700' : 'border-calico-400',
        )}
      />
      {error && (
        <p id={`${id}-error`} className="text-sm font-medium text-madder-700">
          {error}
        </p>
      )}
    </div>
  );
}
