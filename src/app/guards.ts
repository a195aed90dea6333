import type { QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router-dom';
import { paths } from '../config/paths';
import { meQueryOptions } from '../features/auth/api/get-me';
import type { Role, User } from '../types/api';

/**
 * Loader guards. A signed-out visitor is sent to sign-in with a way back; a signed-in one
 * with the wrong role gets `allowed: false`, and the route shows the not-allowed page.
 * Loaders run in parallel, so every loader that fetches guarded data calls this itself.
 */
export async function requireUser(
  queryClient: QueryClient,
  request: Request,
  roles?: readonly Role[],
): Promise<{ user: User; allowed: boolean }> {
  const user = await queryClient.ensureQueryData(meQueryOptions());
  if (!user) {
    const url = new URL(request.url);
    throw redirect(paths.signIn.build(url.pathname + url.search));
  }
  return { user, allowed: !roles || roles.includes(user.role) };
}

/**
 * For sign-in and sign-up: someone already signed in goes to the dashboard. Asks the server
 * afresh, because a visitor often arrives here just after their session ended.
 */
export async function redirectIfSignedIn(queryClient: QueryClient): Promise<null> {
  const user = await queryClient.fetchQuery({ ...meQueryOptions(), staleTime: 0 });
  if (user) throw redirect(paths.home.build());
  return null;
}
