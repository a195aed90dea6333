import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { NewPasswordFields } from '../../../components/ui/new-password-fields';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../components/ui/use-form-errors';
import {
  newPasswordProblems,
  type FieldErrors,
  type KnownErrors,
} from '../../../lib/form-errors';
import { useChangePassword } from '../api/change-password';

const knownErrors: KnownErrors = {
  wrong_password: {
    message: 'Your current password is not the one you entered.',
    fields: { currentPassword: 'This is not your current password.' },
  },
};

export function ChangePasswordForm() {
  const [currentPassword, setCurrentPassword] = useState('');
  const [newPassword, setNewPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [saved, setSaved] = useState(false);
  const change = useChangePassword();

  const { formRef, errors, accept, onError } = useFormErrors(change.error, knownErrors);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setSaved(false);
    const problems: FieldErrors = {};
    if (currentPassword === '') problems.currentPassword = 'Enter your current password.';
    Object.assign(problems, newPasswordProblems('newPassword', newPassword, repeat));
    if (!accept(problems)) return;
    change.mutate(
      { currentPassword, newPassword },
      {
        onSuccess: () => {
          setSaved(true);
          setCurrentPassword('');
          setNewPassword('');
          setRepeat('');
        },
        onError,
      },
    );
  }

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="flex flex-col gap-4">
      <FormAlert>{errors.message}</FormAlert>
      <FormAlert tone="success">{saved && 'Password changed. Use the new one next time you sign in.'}</FormAlert>
      <TextField
        label="Current password"
        name="currentPassword"
        type="password"
        autoComplete="current-password"
        value={currentPassword}
        onChange={(event) => setCurrentPassword(event.target.value)}
        error={errors.fields.currentPassword}
      />
      <NewPasswordFields
        name="newPassword"
        password={newPassword}
        repeat={repeat}
        onPasswordChange={setNewPassword}
        onRepeatChange={setRepeat}
        errors={errors.fields}
      />
      <div>
        <Button type="submit" pending={change.isPending} pendingLabel="Changing…">
          Change password
        </Button>
      </div>
    </form>
  );
}
