import { useQueryClient } from '@tanstack/react-query';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { LoadingState } from '../../components/ui/loading-state';
import { FormAlert } from '../../components/ui/form-alert';
import { authKeys } from '../../features/auth/query-keys';
import { useMe } from '../../features/auth/api/get-me';
import { useUsers } from '../../features/admin-users/api/get-users';
import { UsersTable } from '../../features/admin-users/components/users-table';
import type { User } from '../../types/api';

export function AdminUsersRoute() {
  const queryClient = useQueryClient();
  const { data: me } = useMe();
  const users = useUsers();
  if (!me) return null;

  // Changing one's own role changes what one may see: fetch the session user again.
  const handleRoleChanged = (user: User) => {
    if (user.id === me.id) void queryClient.invalidateQueries({ queryKey: authKeys.me() });
  };

  return (
    <>
      <title>Users · Blockwright</title>
      <PageHeading eyebrow="Admin" lead="Everyone with an account here, and the role each holds.">
        Users
      </PageHeading>
      <Panel>
        {users.isPending ? (
          <LoadingState label="Loading accounts…" />
        ) : users.isError ? (
          <FormAlert>{users.error.message}</FormAlert>
        ) : (
          <UsersTable users={users.data} currentUserId={me.id} onRoleChanged={handleRoleChanged} />
        )}
      </Panel>
    </>
  );
}
