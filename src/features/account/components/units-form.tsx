import { useId, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { formErrorsOf } from '../../../lib/form-errors';
import type { User } from '../../../types/api';
import { useUpdateUnits } from '../api/update-account';

const choices: { value: User['units']; label: string; example: string }[] = [
  { value: 'in', label: 'Inches', example: 'shown with fractions to 1/16: 2 1/2 in' },
  { value: 'cm', label: 'Centimetres', example: 'shown to a millimetre: 6.4 cm' },
];

/** How lengths are shown and read across Blockwright: inches or centimetres. */
export function UnitsForm({ user, onUpdated }: { user: User; onUpdated: (user: User) => void }) {
  const name = useId();
  const [units, setUnits] = useState<User['units']>(user.units);
  const [saved, setSaved] = useState(false);
  const update = useUpdateUnits({ onSuccess: onUpdated });
  const errors = formErrorsOf({}, update.error);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setSaved(false);
    update.mutate(units, { onSuccess: () => setSaved(true) });
  }

  return (
    <form noValidate onSubmit={handleSubmit} className="flex flex-col gap-4">
      <FormAlert>{errors.message}</FormAlert>
      <FormAlert tone="success">{saved && 'Units saved.'}</FormAlert>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-semibold text-ink-900">Show lengths in</legend>
        {choices.map((choice) => (
          <label key={choice.value} className="flex items-start gap-2 text-sm">
            <input
              type="radio"
              name={name}
              value={choice.value}
              checked={units === choice.value}
              onChange={() => {
                setUnits(choice.value);
                setSaved(false);
              }}
              className="mt-0.5 size-4 accent-denim-600"
            />
            <span>
              <span className="font-semibold text-ink-900">{choice.label}</span>
              <span className="block text-ink-500">{choice.example}</span>
            </span>
          </label>
        ))}
      </fieldset>
      <p className="text-xs text-ink-500">
        Either way you may type any unit: 2 1/2, 2.5 in, 6.35 cm and 63.5 mm are all read.
      </p>
      <div>
        <Button type="submit" pending={update.isPending} pendingLabel="Saving…" disabled={units === user.units}>
          Save units
        </Button>
      </div>
    </form>
  );
}
