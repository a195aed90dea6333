import { useId, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { formErrorsOf, type KnownErrors } from '../../../lib/form-errors';
import { roleLabels, roles, type Role, type User } from '../../../types/api';
import { useUpdateUserRole } from '../api/update-user-role';

const knownErrors: KnownErrors = {
  last_admin: {
    message: 'Blockwright needs at least one admin. Make someone else an admin first.',
  },
};

const joinedFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

function RoleForm({
  user,
  onChanged,
}: {
  user: User;
  onChanged: (user: User) => void;
}) {
  const [role, setRole] = useState<Role>(user.role);
  const selectId = useId();
  const update = useUpdateUserRole({ onSuccess: onChanged });
  const errors = formErrorsOf({}, update.error, knownErrors);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    update.mutate({ id: user.id, role }, { onError: () => setRole(user.role) });
  }

  return (
    <form onSubmit={handleSubmit} className="flex flex-col gap-2">
      <div className="flex items-center gap-2">
        <label htmlFor={selectId} className="sr-only">
          Role for {user.displayName}
        </label>
        <select
          id={selectId}
          value={role}
          onChange={(event) => setRole(event.target.value as Role)}
          className="rounded-md border border-calico-400 bg-calico-50 px-2.5 py-1.5 text-sm focus:border-denim-600 focus:outline-none focus:ring-2 focus:ring-tape-400"
        >
          {roles.map((each) => (
            <option key={each} value={each}>
              {roleLabels[each]}
            </option>
          ))}
        </select>
        <Button
          type="submit"
          variant="secondary"
          className="px-3 py-1.5"
          disabled={role === user.role}
          pending={update.isPending}
          aria-label={`Save role for ${user.displayName}`}
        >
          Save
        </Button>
      </div>
      <FormAlert className="max-w-xs">{errors.message}</FormAlert>
    </form>
  );
}

export function UsersTable({
  users,
  currentUserId,
  onRoleChanged,
}: {
  users: User[];
  currentUserId: string;
  onRoleChanged: (user: User) => void;
}) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[36rem] border-collapse text-left text-sm">
        <caption className="sr-only">Accounts and their roles</caption>
        <thead>
          <tr className="border-b-2 border-calico-300 text-xs uppercase tracking-wider text-ink-500">
            <th scope="col" className="py-2 pr-4 font-semibold">Name</th>
            <th scope="col" className="py-2 pr-4 font-semibold">E-mail</th>
            <th scope="col" className="py-2 pr-4 font-semibold">Joined</th>
            <th scope="col" className="py-2 font-semibold">Role</th>
          </tr>
        </thead>
        <tbody>
          {users.map((user) => (
            <tr key={user.id} className="border-b border-dashed border-calico-300 align-top">
              <th scope="row" className="py-3 pr-4 font-semibold">
                {user.displayName}
                {user.id === currentUserId && (
                  <span className="ml-2 text-xs font-medium text-ink-500">(you)</span>
                )}
              </th>
              <td className="py-3 pr-4 text-ink-700">{user.email}</td>
              <td className="py-3 pr-4 whitespace-nowrap text-ink-700">
                {joinedFormat.format(new Date(user.createdAt))}
              </td>
              <td className="py-3">
                <RoleForm user={user} onChanged={onRoleChanged} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
