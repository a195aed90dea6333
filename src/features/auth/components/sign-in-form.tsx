import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { TextLink } from '../../../components/ui/text-link';
import { useFormErrors } from '../../../components/ui/use-form-errors';
import { paths } from '../../../config/paths';
import { emailProblem, type FieldErrors, type KnownErrors } from '../../../lib/form-errors';
import type { User } from '../../../types/api';
import { useSignIn } from '../api/sign-in';

const knownErrors: KnownErrors = {
  invalid_credentials: { message: 'That e-mail address and password do not match an account.' },
};

type SignInFormProps = {
  onSignedIn: (user: User) => void;
  /** Filled in when someone picks a demo account. */
  initialEmail?: string;
  initialPassword?: string;
};

export function SignInForm({ onSignedIn, initialEmail = '', initialPassword = '' }: SignInFormProps) {
  const [email, setEmail] = useState(initialEmail);
  const [password, setPassword] = useState(initialPassword);
  const signIn = useSignIn({ onSuccess: onSignedIn });

  const { formRef, errors, accept, onError } = useFormErrors(signIn.error, knownErrors);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const problems: FieldErrors = {};
    const emailIssue = emailProblem(email);
    if (emailIssue) problems.email = emailIssue;
    if (password === '') problems.password = 'Enter your password.';
    if (!accept(problems)) return;
    signIn.mutate({ email: email.trim(), password }, { onError });
  }

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="flex flex-col gap-4">
      <FormAlert>{errors.message}</FormAlert>
      <TextField
        label="E-mail address"
        name="email"
        type="email"
        autoComplete="username"
        value={email}
        onChange={(event) => setEmail(event.target.value)}
        error={errors.fields.email}
      />
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="current-password"
        value={password}
        onChange={(event) => setPassword(event.target.value)}
        error={errors.fields.password}
      />
      <div className="flex flex-wrap items-center justify-between gap-3 pt-1">
        <Button
          type="submit"
          pending={signIn.isPending}
          pendingLabel="Signing in…"
          // A picked demo account fills the form; the next key press can sign in.
          autoFocus={initialPassword !== ''}
        >
          Sign in
        </Button>
        <TextLink to={paths.forgotPassword.build()} className="text-sm">
          Forgot your password?
        </TextLink>
      </div>
    </form>
  );
}
