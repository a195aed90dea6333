import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../components/ui/use-form-errors';
import { type FieldErrors } from '../../../lib/form-errors';
import type { User } from '../../../types/api';
import { useUpdateAccount } from '../api/update-account';

export function DisplayNameForm({
  user,
  onUpdated,
}: {
  user: User;
  onUpdated: (user: User) => void;
}) {
  const [displayName, setDisplayName] = useState(user.displayName);
  const [saved, setSaved] = useState(false);
  const update = useUpdateAccount({ onSuccess: onUpdated });

  const { formRef, errors, accept, onError } = useFormErrors(update.error);
  const unchanged = displayName.trim() === user.displayName;

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setSaved(false);
    const problems: FieldErrors =
      displayName.trim() === '' ? { displayName: 'Enter the name others will see.' } : {};
    if (!accept(problems)) return;
    update.mutate(
      { displayName: displayName.trim() },
      { onSuccess: () => setSaved(true), onError },
    );
  }

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="flex flex-col gap-4">
      <FormAlert>{errors.message}</FormAlert>
      <FormAlert tone="success">{saved && 'Display name saved.'}</FormAlert>
      <TextField
        label="Display name"
        hint="Shown to people you share a make with, and in the class library."
        name="displayName"
        autoComplete="name"
        value={displayName}
        onChange={(event) => {
          setDisplayName(event.target.value);
          setSaved(false);
        }}
        error={errors.fields.displayName}
      />
      <div>
        <Button type="submit" pending={update.isPending} pendingLabel="Saving…" disabled={unchanged}>
          Save name
        </Button>
      </div>
    </form>
  );
}
