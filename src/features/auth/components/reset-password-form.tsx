import { useRef, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { NewPasswordFields } from '../../../components/ui/new-password-fields';
import { useErrorFocus } from '../../../components/ui/use-error-focus';
import {
  formErrorsOf,
  newPasswordProblems,
  type FieldErrors,
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
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const [failure, setFailure] = useState<unknown>(null);
  const formRef = useRef<HTMLFormElement>(null);
  const confirm = useConfirmPasswordReset();
  useErrorFocus(formRef, failure);

  const errors = formErrorsOf(clientErrors, confirm.error, knownErrors);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const problems = newPasswordProblems('password', password, repeat);
    setClientErrors(problems);
    if (Object.keys(problems).length > 0) {
      setFailure({});
      return;
    }
    confirm.mutate({ token, password }, { onSuccess: onDone, onError: (error) => setFailure(error) });
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
