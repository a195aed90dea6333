import { Panel } from '../../components/ui/panel';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { ForgotPasswordForm } from '../../features/auth/components/forgot-password-form';

export function ForgotPasswordRoute() {
  return (
    <Panel>
      <title>Forgot your password · Blockwright</title>
      <h1 tabIndex={-1} className="text-3xl font-semibold">
        Forgot your password?
      </h1>
      <p className="mt-1 mb-6 text-ink-700">
        Enter the e-mail address you signed up with and we will send a link to choose a new
        password.
      </p>
      <ForgotPasswordForm />
      <p className="mt-6 border-t border-dashed border-calico-300 pt-4 text-sm text-ink-700">
        Remembered it? <TextLink to={paths.signIn.build()}>Back to sign in</TextLink>
      </p>
    </Panel>
  );
}
