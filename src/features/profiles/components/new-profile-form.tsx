import { useState } from 'react';
import { TextField } from '../../../components/ui/text-field';
import type { LengthUnit } from '../../../../geometry/units';
import { useCreateProfile } from '../api/create-profile';
import type { Profile } from '../api/schemas';
import { draftFrom, type FieldErrors } from '../model';
import { MeasurementsForm } from './measurements-form';

/** A new profile: whose measurements they are, and the first dated set. */
export function NewProfileForm({
  unit,
  onCreated,
  onCancel,
}: {
  unit: LengthUnit;
  onCreated: (profile: Profile) => void;
  onCancel: () => void;
}) {
  const [name, setName] = useState('');
  const create = useCreateProfile({ onSuccess: onCreated });
  const [initialDraft] = useState(() => draftFrom(null, unit));

  return (
    <MeasurementsForm
      unit={unit}
      initialDraft={initialDraft}
      origin={null}
      before={(errors) => (
        <TextField
          label="Profile name"
          hint="Whose measurements these are: “Me”, “Sam (son)”."
          name="name"
          value={name}
          onChange={(event) => setName(event.target.value)}
          error={errors.name}
        />
      )}
      check={(): FieldErrors => {
        const trimmed = name.trim();
        if (trimmed === '') return { name: 'Enter a name for the profile.' };
        if (trimmed.length > 80) return { name: 'Keep the name to 80 characters.' };
        return {};
      }}
      save={(set, { onError }) => create.mutate({ name: name.trim(), ...set }, { onError })}
      pending={create.isPending}
      serverError={create.error}
      submitLabel="Save the profile"
      onCancel={onCancel}
    />
  );
}
