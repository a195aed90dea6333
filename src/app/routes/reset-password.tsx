import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { FormAlert } from '../../components/ui/form-alert';
import { Panel } from '../../components/ui/panel';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { ResetPasswordForm } from '../../features/auth/components/reset-password-form';

export function ResetPasswordRoute() {
  const [searchParams] = useSearchParams();
  const token = searchParams.get('token') ?? '';
  const [done, setDone] = useState(false);

  return (
    <Panel>
      <title>Choose a new password · Blockwright</title>
      <h1 tabIndex={-1} className="text-3xl font-semibold">
        Choose a new password
      </h1>
      {done ? (
        <div className="mt-6 flex flex-col gap-4">
          <FormAlert tone="success">Your new password is saved.</FormAlert>
          <p>
            <TextLink to={paths.signIn.build()}>Sign in with it</TextLink>
          </p>
        </div>
      ) : token === '' ? (
        <div className="mt-6">
          <FormAlert>
            This page needs the link from the password-reset e-mail, and the address has no
            reset token in it. Open the link from the e-mail again, or ask for a new one.
          </FormAlert>
        </div>
      ) : (
        <>
          <p className="mt-1 mb-6 text-ink-700">Type it twice, so that a slip of the finger cannot lock you out.</p>
          <ResetPasswordForm token={token} onDone={() => setDone(true)} />
        </>
      )}
      {!done && (
        <p className="mt-6 border-t border-dashed border-calico-300 pt-4 text-sm text-ink-700">
          Link expired? <TextLink to={paths.forgotPassword.build()}>Ask for a new one</TextLink>
        </p>
      )}
    </Panel>
  );
}
