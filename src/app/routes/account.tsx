import { useQueryClient } from '@tanstack/react-query';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { ChangePasswordForm } from '../../features/account/components/change-password-form';
import { DisplayNameForm } from '../../features/account/components/display-name-form';
import { UnitsForm } from '../../features/account/components/units-form';
import { setMe, useMe } from '../../features/auth/api/get-me';
import { roleLabels } from '../../types/api';

const joinedFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'long' });

export function AccountRoute() {
  const queryClient = useQueryClient();
  const { data: user } = useMe();
  if (!user) return null;

  return (
    <>
      <title>Account · Blockwright</title>
      <PageHeading eyebrow="You">Account</PageHeading>
      <div className="grid gap-6 lg:grid-cols-2">
        <Panel title="Profile">
          <dl className="mb-5 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
            <dt className="text-ink-500">E-mail</dt>
            <dd className="font-medium">{user.email}</dd>
            <dt className="text-ink-500">Role</dt>
            <dd className="font-medium">{roleLabels[user.role]}</dd>
            <dt className="text-ink-500">Member since</dt>
            <dd className="font-medium">{joinedFormat.format(new Date(user.createdAt))}</dd>
          </dl>
          <DisplayNameForm user={user} onUpdated={(updated) => setMe(queryClient, updated)} />
        </Panel>
        <Panel title="Password" description="You stay signed in on this device after the change.">
          <ChangePasswordForm />
        </Panel>
        <Panel title="Units" description="For every length you read or type: measurements, amounts of change, print margins.">
          <UnitsForm user={user} onUpdated={(updated) => setMe(queryClient, updated)} />
        </Panel>
      </div>
    </>
  );
}
