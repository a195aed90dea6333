import { Outlet } from 'react-router-dom';
import { useMe } from '../../features/auth/api/get-me';
import type { Role } from '../../types/api';
import { NotAllowed } from './not-allowed';

/** Shows its child routes only to the given roles; anyone else sees the not-allowed page. */
export function RoleGate({ roles }: { roles: readonly Role[] }) {
  const { data: user } = useMe();
  if (!user) return null;
  return roles.includes(user.role) ? <Outlet /> : <NotAllowed roles={roles} />;
}
