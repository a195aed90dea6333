import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Wordmark } from '../../components/ui/logo-mark';
import { paths } from '../../config/paths';
import { SiteFooter } from './site-footer';

/** A page outside the app shell: the 404 and the last-resort error page. */
export function StandalonePage({ children }: { children: ReactNode }) {
  return (
    <div className="drafting-grid flex min-h-dvh flex-col">
      <header className="px-6 py-5">
        <Link to={paths.home.build()} className="inline-block rounded-md">
          <Wordmark />
        </Link>
      </header>
      <main id="content" className="mx-auto w-full max-w-2xl flex-1 px-6 py-12">
        {children}
      </main>
      <SiteFooter />
    </div>
  );
}
