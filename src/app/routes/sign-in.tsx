import { useState } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { Panel } from '../../components/ui/panel';
import { TextLink } from '../../components/ui/text-link';
import { paths, safeRedirectTarget } from '../../config/paths';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { useMeta } from '../../features/meta/api/get-meta';
import { DemoAccounts } from '../../features/meta/components/demo-accounts';

export function SignInRoute() {
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  const redirectTo = safeRedirectTarget(searchParams.get('redirectTo'));
  const meta = useMeta();
  const [picked, setPicked] = useState<{ email: string; password: string } | null>(null);
  const demoAccounts = meta.data?.demoAccounts ?? [];

  return (
    <>
      <title>Sign in · Blockwright</title>
      <Panel>
        <h1 tabIndex={-1} className="text-3xl font-semibold">
          Sign in
        </h1>
        <p className="mt-1 mb-6 text-ink-700">
          {redirectTo
            ? 'Sign in to go on to the page you asked for.'
            : 'Welcome back to the table.'}
        </p>
        <SignInForm
          key={picked?.email ?? 'blank'}
          initialEmail={picked?.email}
          initialPassword={picked?.password}
          onSignedIn={() => navigate(redirectTo ?? paths.home.build(), { replace: true })}
        />
        <p className="mt-6 border-t border-dashed border-calico-300 pt-4 text-sm text-ink-700">
          New here? <TextLink to={paths.signUp.build()}>Create an account</TextLink>
        </p>
      </Panel>
      {demoAccounts.length > 0 && (
        <DemoAccounts
          accounts={demoAccounts}
          onPick={(account) => setPicked({ email: account.email, password: account.password })}
        />
      )}
    </>
  );
}
