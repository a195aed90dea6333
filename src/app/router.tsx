import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '../config/paths';
import { usersQueryOptions } from '../features/admin-users/api/get-users';
import { outboxQueryOptions } from '../features/admin-outbox/api/get-outbox';
import { metaQueryOptions } from '../features/meta/api/get-meta';
import { redirectIfSignedIn, requireUser } from './guards';
import { adminRoles, coachRoles } from './navigation';
import { AccountRoute } from './routes/account';
import { AdminOutboxRoute } from './routes/admin-outbox';
import { AdminUsersRoute } from './routes/admin-users';
import { AppShell } from './routes/app-shell';
import { AreaComingRoute } from './routes/area-coming';
import { DashboardRoute } from './routes/dashboard';
import { ForgotPasswordRoute } from './routes/forgot-password';
import { GuestLayout } from './routes/guest-layout';
import { NotFoundRoute } from './routes/not-found';
import { ResetPasswordRoute } from './routes/reset-password';
import { RoleGate } from './routes/role-gate';
import { HydrateFallback, RootLayout } from './routes/root';
import { RootErrorBoundary, RouteErrorBoundary } from './routes/route-error';
import { SignInRoute } from './routes/sign-in';
import { SignUpRoute } from './routes/sign-up';

/** Strip the leading slash: child routes take relative paths. */
const child = (pattern: string) => pattern.replace(/^\//, '');

export function createRouter(queryClient: QueryClient) {
  const signedInOnly = ({ request }: LoaderFunctionArgs) =>
    requireUser(queryClient, request).then(() => null);
  const guestOnly = () => redirectIfSignedIn(queryClient);

  return createBrowserRouter([
    {
      element: <RootLayout />,
      errorElement: <RootErrorBoundary />,
      hydrateFallbackElement: <HydrateFallback />,
      children: [
        {
          element: <GuestLayout />,
          children: [
            {
              path: child(paths.signIn.pattern),
              loader: async () => {
                // The demo accounts are a convenience: a failed fetch must not block sign-in.
                void queryClient.prefetchQuery(metaQueryOptions());
                return guestOnly();
              },
              element: <SignInRoute />,
            },
            { path: child(paths.signUp.pattern), loader: guestOnly, element: <SignUpRoute /> },
            {
              path: child(paths.forgotPassword.pattern),
              loader: guestOnly,
              element: <ForgotPasswordRoute />,
            },
            { path: child(paths.resetPassword.pattern), element: <ResetPasswordRoute /> },
          ],
        },
        {
          id: 'shell',
          loader: signedInOnly,
          element: <AppShell />,
          children: [
            {
              errorElement: <RouteErrorBoundary />,
              children: [
                { index: true, element: <DashboardRoute /> },
                { path: child(paths.makes.pattern), element: <AreaComingRoute areaId="makes" /> },
                { path: child(paths.patterns.pattern), element: <AreaComingRoute areaId="patterns" /> },
                { path: child(paths.fitPlanner.pattern), element: <AreaComingRoute areaId="fitPlanner" /> },
                { path: child(paths.fabrics.pattern), element: <AreaComingRoute areaId="fabrics" /> },
                { path: child(paths.library.pattern), element: <AreaComingRoute areaId="library" /> },
                { path: child(paths.account.pattern), element: <AccountRoute /> },
                {
                  element: <RoleGate roles={coachRoles} />,
                  children: [
                    {
                      path: child(paths.coaching.pattern),
                      element: <AreaComingRoute areaId="coaching" />,
                    },
                  ],
                },
                {
                  element: <RoleGate roles={adminRoles} />,
                  children: [
                    {
                      path: child(paths.adminUsers.pattern),
                      loader: async ({ request }) => {
                        const { allowed } = await requireUser(queryClient, request, adminRoles);
                        if (allowed) await queryClient.ensureQueryData(usersQueryOptions());
                        return null;
                      },
                      element: <AdminUsersRoute />,
                    },
                    {
                      path: child(paths.adminOutbox.pattern),
                      loader: async ({ request }) => {
                        const { allowed } = await requireUser(queryClient, request, adminRoles);
                        if (allowed) await queryClient.ensureQueryData(outboxQueryOptions());
                        return null;
                      },
                      element: <AdminOutboxRoute />,
                    },
                  ],
                },
              ],
            },
          ],
        },
        { path: '*', element: <NotFoundRoute /> },
      ],
    },
  ]);
}
