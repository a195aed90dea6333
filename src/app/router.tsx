import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import { createBrowserRouter, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '../config/paths';
import { metaQueryOptions } from '../features/meta/api/get-meta';
import { redirectIfSignedIn, requireUser } from './guards';
import type { Role } from '../types/api';
import { adminRoles, coachRoles, type AreaId } from './navigation';
import { ForgotPasswordRoute } from './routes/forgot-password';
import { GuestLayout } from './routes/guest-layout';
import { NotFoundRoute } from './routes/not-found';
import { ResetPasswordRoute } from './routes/reset-password';
import { HydrateFallback, RootLayout } from './routes/root';
import { RootErrorBoundary, RouteErrorBoundary } from './routes/route-error';
import { SignInRoute } from './routes/sign-in';
import { SignUpRoute } from './routes/sign-up';

/*
 * Code splitting: the guest pages (sign-in and its neighbours) are in the entry chunk; every
 * signed-in page, the app shell and the role gate load on demand through the routes' `lazy`.
 * Guards stay static loaders here, so they run at once, in parallel with fetching the page's
 * code, exactly as before; loaders that need a feature's query options import them when they
 * run. Pages drawing patterns (paper.js, geometry/) must only ever be reached through `lazy`.
 */

/** Only a route module's component: `lazy: page(() => import('./routes/x'), (m) => m.XRoute)`. */
const page =
  <M,>(load: () => Promise<M>, pick: (module: M) => ComponentType) =>
  () =>
    load().then((module) => ({ Component: pick(module) }));

/** The "coming" page of an area, loaded on demand. */
const areaComing = (areaId: AreaId) =>
  page(
    () => import('./routes/area-coming'),
    ({ AreaComingRoute }) =>
      function AreaComing() {
        return <AreaComingRoute areaId={areaId} />;
      },
  );

/** The role gate (a layout route), loaded on demand with the pages behind it. */
const roleGate = (roles: readonly Role[]) =>
  page(
    () => import('./routes/role-gate'),
    ({ RoleGate }) =>
      function Gate() {
        return <RoleGate roles={roles} />;
      },
  );

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
          lazy: page(() => import('./routes/app-shell'), (m) => m.AppShell),
          children: [
            {
              errorElement: <RouteErrorBoundary />,
              children: [
                { index: true, lazy: page(() => import('./routes/dashboard'), (m) => m.DashboardRoute) },
                {
                  path: child(paths.makes.pattern),
                  loader: async ({ request }) => {
                    await requireUser(queryClient, request);
                    const { makesQueryOptions } = await import('../features/makes/api/get-makes');
                    const archived = new URL(request.url).searchParams.get('show') === 'archived';
                    await queryClient.ensureQueryData(makesQueryOptions({ archived }));
                    return null;
                  },
                  lazy: page(() => import('./routes/makes'), (m) => m.MakesRoute),
                },
                { path: child(paths.make.pattern), lazy: () => import('./routes/make-workspace') },
                {
                  path: child(paths.patterns.pattern),
                  loader: async ({ request }) => {
                    await requireUser(queryClient, request);
                    const { patternsQueryOptions } = await import('../features/patterns/api/get-patterns');
                    await queryClient.ensureQueryData(patternsQueryOptions('mine'));
                    return null;
                  },
                  lazy: page(() => import('./routes/patterns'), (m) => m.PatternsRoute),
                },
                {
                  path: child(paths.patternReview.pattern),
                  loader: async ({ request, params }) => {
                    await requireUser(queryClient, request);
                    const { patternQueryOptions } = await import('../features/patterns/api/get-pattern');
                    // A missing or private pattern shows its message on the page, not the error boundary.
                    await queryClient.prefetchQuery(patternQueryOptions(params.id ?? ''));
                    return null;
                  },
                  lazy: page(() => import('./routes/pattern-review'), (m) => m.PatternReviewRoute),
                },
                {
                  path: child(paths.fitPlanner.pattern),
                  loader: async ({ request }) => {
                    await requireUser(queryClient, request);
                    const { profilesQueryOptions } = await import('../features/profiles/api/get-profiles');
                    await queryClient.ensureQueryData(profilesQueryOptions());
                    return null;
                  },
                  lazy: page(() => import('./routes/fit-planner'), (m) => m.FitPlannerRoute),
                },
                {
                  path: child(paths.fabrics.pattern),
                  loader: async ({ request }) => {
                    await requireUser(queryClient, request);
                    const { fabricsQueryOptions } = await import('../features/fabrics/api/get-fabrics');
                    await queryClient.ensureQueryData(fabricsQueryOptions());
                    return null;
                  },
                  lazy: page(() => import('./routes/fabrics'), (m) => m.FabricsRoute),
                },
                {
                  path: child(paths.library.pattern),
                  loader: async ({ request }) => {
                    await requireUser(queryClient, request);
                    const { patternsQueryOptions } = await import('../features/patterns/api/get-patterns');
                    await queryClient.ensureQueryData(patternsQueryOptions('library'));
                    return null;
                  },
                  lazy: page(() => import('./routes/library'), (m) => m.LibraryRoute),
                },
                { path: child(paths.account.pattern), lazy: page(() => import('./routes/account'), (m) => m.AccountRoute) },
                {
                  lazy: roleGate(coachRoles),
                  children: [
                    {
                      path: child(paths.coaching.pattern),
                      lazy: areaComing('coaching'),
                    },
                  ],
                },
                {
                  lazy: roleGate(adminRoles),
                  children: [
                    {
                      path: child(paths.adminUsers.pattern),
                      loader: async ({ request }) => {
                        const { allowed } = await requireUser(queryClient, request, adminRoles);
                        if (allowed) {
                          const { usersQueryOptions } = await import('../features/admin-users/api/get-users');
                          await queryClient.ensureQueryData(usersQueryOptions());
                        }
                        return null;
                      },
                      lazy: page(() => import('./routes/admin-users'), (m) => m.AdminUsersRoute),
                    },
                    {
                      path: child(paths.adminOutbox.pattern),
                      loader: async ({ request }) => {
                        const { allowed } = await requireUser(queryClient, request, adminRoles);
                        if (allowed) {
                          const { outboxQueryOptions } = await import('../features/admin-outbox/api/get-outbox');
                          await queryClient.ensureQueryData(outboxQueryOptions());
                        }
                        return null;
                      },
                      lazy: page(() => import('./routes/admin-outbox'), (m) => m.AdminOutboxRoute),
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
