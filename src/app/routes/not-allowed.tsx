import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import type { Role } from '../../types/api';

const listFormat = new Intl.ListFormat('en', { type: 'disjunction' });
const rolePlurals: Record<Role, string> = { sewist: 'sewists', coach: 'coaches', admin: 'admins' };

export function NotAllowed({ roles }: { roles: readonly Role[] }) {
  const who = listFormat.format(roles.map((role) => rolePlurals[role]));
  return (
    <>
      <title>Not allowed · Blockwright</title>
      <PageHeading eyebrow="Not allowed">This page is not open to your account</PageHeading>
      <Panel className="max-w-2xl">
        <p className="text-ink-900">
          Only {who} can use this page. If you think your account should have that role, ask
          the admin of this Blockwright.
        </p>
        <p className="mt-6 text-sm">
          <TextLink to={paths.home.build()}>Back to your table</TextLink>
        </p>
      </Panel>
    </>
  );
}
