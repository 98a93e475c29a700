import { Outlet } from 'react-router-dom';
import type { Role } from '#shared/schemas/roles';
import { useCurrentUser } from '../features/auth/api/use-current-user';
import { ForbiddenScreen } from './forbidden-screen';

/** Shows "not allowed" instead of screens a role cannot use; the API refuses them anyway. */
export function RequireRole({ roles }: { roles: readonly Role[] }) {
  const user = useCurrentUser();
  return roles.includes(user.role) ? <Outlet /> : <ForbiddenScreen />;
}
