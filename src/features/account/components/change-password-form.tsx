import { useRef, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { NewPasswordFields } from '../../../components/ui/new-password-fields';
import { TextField } from '../../../components/ui/text-field';
import { useErrorFocus } from '../../../components/ui/use-error-focus';
import {
  formErrorsOf,
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
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const [failure, setFailure] = useState<unknown>(null);
  const formRef = useRef<HTMLFormElement>(null);
  const change = useChangePassword();
  useErrorFocus(formRef, failure);

  const errors = formErrorsOf(clientErrors, change.error, knownErrors);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setSaved(false);
    const problems: FieldErrors = {};
    if (currentPassword === '') problems.currentPassword = 'Enter your current password.';
    Object.assign(problems, newPasswordProblems('newPassword', newPassword, repeat));
    setClientErrors(problems);
    if (Object.keys(problems).length > 0) {
      setFailure({});
      return;
    }
    change.mutate(
      { currentPassword, newPassword },
      {
        onSuccess: () => {
          setSaved(true);
          setCurrentPassword('');
          setNewPassword('');
          setRepeat('');
        },
        onError: (error) => setFailure(error),
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
