import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../components/ui/use-form-errors';
import {
  emailProblem,
  MIN_PASSWORD_LENGTH,
  passwordProblem,
  type FieldErrors,
  type KnownErrors,
} from '../../../lib/form-errors';
import type { User } from '../../../types/api';
import { useSignUp } from '../api/sign-up';

const knownErrors: KnownErrors = {
  email_taken: {
    message: 'An account with this e-mail address already exists. Try signing in instead.',
    fields: { email: 'Already in use.' },
  },
};

export function SignUpForm({ onSignedUp }: { onSignedUp: (user: User) => void }) {
  const [email, setEmail] = useState('');
  const [displayName, setDisplayName] = useState('');
  const [password, setPassword] = useState('');
  const signUp = useSignUp({ onSuccess: onSignedUp });

  const { formRef, errors, accept, onError } = useFormErrors(signUp.error, knownErrors);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const problems: FieldErrors = {};
    const emailIssue = emailProblem(email);
    if (emailIssue) problems.email = emailIssue;
    if (displayName.trim() === '') problems.displayName = 'Enter the name others will see.';
    const passwordIssue = passwordProblem(password);
    if (passwordIssue) problems.password = passwordIssue;
    if (!accept(problems)) return;
    signUp.mutate(
      { email: email.trim(), displayName: displayName.trim(), password },
      { onError },
    );
  }

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="flex flex-col gap-4">
      <FormAlert>{errors.message}</FormAlert>
      <TextField
        label="E-mail address"
        name="email"
        type="email"
        autoComplete="email"
        value={email}
        onChange={(event) => setEmail(event.target.value)}
        error={errors.fields.email}
      />
      <TextField
        label="Display name"
        hint="Shown to people you share a make with."
        name="displayName"
        autoComplete="name"
        value={displayName}
        onChange={(event) => setDisplayName(event.target.value)}
        error={errors.fields.displayName}
      />
      <TextField
        label="Password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters. A short sentence works well.`}
        name="password"
        type="password"
        autoComplete="new-password"
        value={password}
        onChange={(event) => setPassword(event.target.value)}
        error={errors.fields.password}
      />
      <div className="pt-1">
        <Button type="submit" pending={signUp.isPending} pendingLabel="Creating your account…">
          Create account
        </Button>
      </div>
    </form>
  );
}
