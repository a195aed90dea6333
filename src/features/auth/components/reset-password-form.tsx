import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { NewPasswordFields } from '../../../components/ui/new-password-fields';
import { useFormErrors } from '../../../components/ui/use-form-errors';
import {
  newPasswordProblems,
  type KnownErrors,
} from '../../../lib/form-errors';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';

const knownErrors: KnownErrors = {
  invalid_token: {
    message:
      'This reset link has expired or has already been used. Ask for a new one below the form.',
  },
};

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const confirm = useConfirmPasswordReset();

  const { formRef, errors, accept, onError } = useFormErrors(confirm.error, knownErrors);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const problems = newPasswordProblems('password', password, repeat);
    if (!accept(problems)) return;
    confirm.mutate({ token, password }, { onSuccess: onDone, onError });
  }

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="flex flex-col gap-4">
      <FormAlert>{errors.message}</FormAlert>
      <NewPasswordFields
        name="password"
        password={password}
        repeat={repeat}
        onPasswordChange={setPassword}
        onRepeatChange={setRepeat}
        errors={errors.fields}
      />
      <div className="pt-1">
        <Button type="submit" pending={confirm.isPending} pendingLabel="Saving…">
          Save new password
        </Button>
      </div>
    </form>
  );
}
