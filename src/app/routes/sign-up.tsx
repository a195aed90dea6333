import { useNavigate } from 'react-router-dom';
import { Panel } from '../../components/ui/panel';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { SignUpForm } from '../../features/auth/components/sign-up-form';

export function SignUpRoute() {
  const navigate = useNavigate();
  return (
    <Panel>
      <title>Create an account · Blockwright</title>
      <h1 tabIndex={-1} className="text-3xl font-semibold">
        Create an account
      </h1>
      <p className="mt-1 mb-6 text-ink-700">
        New accounts start as sewists. A studio admin can make you a coach.
      </p>
      <SignUpForm onSignedUp={() => navigate(paths.home.build(), { replace: true })} />
      <p className="mt-6 border-t border-dashed border-calico-300 pt-4 text-sm text-ink-700">
        Already have an account? <TextLink to={paths.signIn.build()}>Sign in</TextLink>
      </p>
    </Panel>
  );
}
