import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../components/ui/use-form-errors';
import { emailProblem } from '../../../lib/form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';

export function ForgotPasswordForm() {
  const [email, setEmail] = useState('');
  const [sentTo, setSentTo] = useState<string | null>(null);
  const request = useRequestPasswordReset();

  const { formRef, errors, accept, onError } = useFormErrors(request.error);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const issue = emailProblem(email);
    if (!accept(issue ? { email: issue } : {})) return;
    const address = email.trim();
    request.mutate(
      { email: address },
      { onSuccess: () => setSentTo(address), onError },
    );
  }

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="flex flex-col gap-4">
      <FormAlert>{errors.message}</FormAlert>
      <FormAlert tone="success">
        {sentTo &&
          `If ${sentTo} belongs to an account, we have sent it a link to choose a new password. Look in that inbox, and in its spam folder too.`}
      </FormAlert>
      <TextField
        label="E-mail address"
        name="email"
        type="email"
        autoComplete="email"
        value={email}
        onChange={(event) => setEmail(event.target.value)}
        error={errors.fields.email}
      />
      <div className="pt-1">
        <Button type="submit" pending={request.isPending} pendingLabel="Sending…">
          Send reset link
        </Button>
      </div>
    </form>
  );
}
