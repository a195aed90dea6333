import { NavLink, Outlet, useNavigate } from 'react-router-dom';
import { Button } from '../../components/ui/button';
import { FormAlert } from '../../components/ui/form-alert';
import { Wordmark } from '../../components/ui/logo-mark';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { useSignOut } from '../../features/auth/api/sign-out';
import { cx } from '../../lib/cx';
import { roleLabels, type User } from '../../types/api';
import { areasFor, groupLabels, type AreaGroup } from '../navigation';
import { SiteFooter } from './site-footer';

const groupOrder: AreaGroup[] = ['work', 'together', 'admin', 'self'];

const navLinkClasses = ({ isActive }: { isActive: boolean }) =>
  cx(
    'flex items-center gap-2 rounded-md px-3 py-1.5 text-[0.95rem] font-medium transition-colors',
    isActive
      ? 'bg-denim-600 text-calico-50 shadow-sm'
      : 'text-ink-700 hover:bg-calico-200 hover:text-ink-900',
  );

function MainNavigation({ user }: { user: User }) {
  const visible = areasFor(user.role);
  return (
    <nav aria-label="Main" className="flex flex-wrap gap-x-6 gap-y-3 md:flex-col md:flex-nowrap md:gap-5">
      <ul>
        <li>
          <NavLink to={paths.home.build()} end className={navLinkClasses}>
            Home
          </NavLink>
        </li>
      </ul>
      {groupOrder.map((group) => {
        const inGroup = visible.filter((area) => area.group === group);
        if (inGroup.length === 0) return null;
        const headingId = `nav-group-${group}`;
        return (
          <div key={group}>
            <h2
              id={headingId}
              className="mb-1.5 px-3 font-sans text-[0.7rem] font-semibold uppercase tracking-[0.16em] text-chalk-700"
            >
              {groupLabels[group]}
            </h2>
            <ul aria-labelledby={headingId} className="flex flex-wrap gap-0.5 md:flex-col">
              {inGroup.map((area) => (
                <li key={area.id}>
                  <NavLink to={area.to} className={navLinkClasses}>
                    {area.label}
                  </NavLink>
                </li>
              ))}
            </ul>
          </div>
        );
      })}
    </nav>
  );
}

export function AppShell() {
  const { data: user } = useMe();
  const navigate = useNavigate();
  const signOut = useSignOut({ onSuccess: () => navigate(paths.signIn.build()) });

  // The loader guarantees a user; this covers the moment after sign-out clears it.
  if (!user) return null;

  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#content"
        className="sr-only focus:not-sr-only focus:fixed focus:top-3 focus:left-3 focus:z-50 focus:rounded-md focus:bg-calico-50 focus:px-4 focus:py-2 focus:font-semibold"
      >
        Skip to content
      </a>
      <div className="flex flex-1 flex-col md:flex-row">
        <aside className="border-b border-calico-300 bg-calico-50 md:w-64 md:shrink-0 md:border-r md:border-b-0">
          <div className="px-4 py-5 md:sticky md:top-0 md:max-h-dvh md:overflow-y-auto">
            <div className="mb-6 px-2">
              <Wordmark />
            </div>
            <MainNavigation user={user} />
          </div>
        </aside>
        <div className="flex min-w-0 flex-1 flex-col">
          <header className="flex flex-wrap items-center justify-end gap-x-4 gap-y-2 border-b border-calico-300 bg-calico-50/70 px-6 py-3 backdrop-blur">
            <p className="text-sm text-ink-700">
              Signed in as <span className="font-semibold text-ink-900">{user.displayName}</span>
              <span className="ml-2 rounded-sm bg-denim-50 px-1.5 py-0.5 text-xs font-semibold uppercase tracking-wide text-denim-700">
                {roleLabels[user.role]}
              </span>
            </p>
            <Button
              variant="secondary"
              className="px-3 py-1.5"
              pending={signOut.isPending}
              onClick={() => signOut.mutate()}
            >
              Sign out
            </Button>
            <FormAlert className="basis-full empty:hidden">
              {signOut.isError && 'Signing out did not work. Please try again.'}
            </FormAlert>
          </header>
          <main id="content" className="drafting-grid flex-1 px-6 py-10 sm:px-10">
            <div className="mx-auto max-w-5xl">
              <Outlet />
            </div>
          </main>
          <SiteFooter />
        </div>
      </div>
    </div>
  );
}
