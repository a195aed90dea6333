import { useRef, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { useErrorFocus } from '../../../components/ui/use-error-focus';
import {
  formErrorsOf,
  MIN_PASSWORD_LENGTH,
  passwordProblem,
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
    const problems: FieldErrors = {};
    const issue = passwordProblem(password);
    if (issue) problems.password = issue;
    else if (repeat !== password) problems.repeat = 'The two passwords differ.';
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
      <TextField
        label="New password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters.`}
        name="password"
        type="password"
        autoComplete="new-password"
        value={password}
        onChange={(event) => setPassword(event.target.value)}
        error={errors.fields.password}
      />
      <TextField
        label="Repeat password"
        name="repeat"
        type="password"
        autoComplete="new-password"
        value={repeat}
        onChange={(event) => setRepeat(event.target.value)}
        error={errors.fields.repeat}
      />
      <div className="pt-1">
        <Button type="submit" pending={confirm.isPending} pendingLabel="Saving…">
          Save new password
        </Button>
      </div>
    </form>
  );
}
