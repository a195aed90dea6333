import { Link, Outlet } from 'react-router-dom';
import { Wordmark } from '../../components/ui/logo-mark';
import { CautionNote } from '../../components/ui/caution-note';
import { paths } from '../../config/paths';

/**
 * Sign-in, sign-up and password pages. The form comes first in reading order (and first on
 * a phone); on a wide screen the introduction sits to its left.
 */
export function GuestLayout() {
  return (
    <div className="drafting-grid flex min-h-dvh flex-col">
      <div className="mx-auto w-full max-w-6xl flex-1 px-6 py-8 lg:py-14">
        <header className="mb-8 lg:mb-10">
          <Link to={paths.home.build()} className="inline-block rounded-md">
            <Wordmark />
          </Link>
        </header>
        <div className="grid gap-10 lg:grid-cols-[1fr_minmax(0,30rem)] lg:gap-16">
          <main id="content" className="flex flex-col gap-6">
            <Outlet />
          </main>
          <aside className="flex flex-col gap-8 lg:order-first lg:pt-4" aria-label="About Blockwright">
            <div className="max-w-md">
              <p className="font-display text-3xl leading-tight font-medium text-ink-900 sm:text-4xl">
                Trousers that fit the body you have, drafted one level at a time.
              </p>
              <p className="mt-4 text-ink-700">
                Blockwright is for people who sew their own trousers and jeans, and the teachers
                who help them fit: compare measurements with the pattern, blend between sizes,
                adjust rise and length, plan for the cloth and print true to scale at home.
                Accounts are open now; the fitting tools are being built.
              </p>
            </div>
            <CautionNote className="max-w-md rounded-md border border-calico-300 bg-calico-50/80 p-4" />
          </aside>
        </div>
      </div>
    </div>
  );
}
