import { useEffect, useRef } from 'react';
import { Outlet, ScrollRestoration, useLocation, useNavigation } from 'react-router-dom';

/** Moves focus to the new page's heading after each navigation (not on first load). */
function useFocusHeadingOnNavigate() {
  const { pathname } = useLocation();
  const previous = useRef(pathname);
  useEffect(() => {
    if (previous.current === pathname) return;
    previous.current = pathname;
    document.querySelector<HTMLElement>('main h1')?.focus();
  }, [pathname]);
}

export function RootLayout() {
  const navigation = useNavigation();
  useFocusHeadingOnNavigate();

  return (
    <>
      {navigation.state !== 'idle' && (
        <div
          role="progressbar"
          aria-label="Loading the next page"
          className="fixed inset-x-0 top-0 z-50 h-1 animate-pulse bg-tape-400"
        />
      )}
      <Outlet />
      <ScrollRestoration />
    </>
  );
}

export function HydrateFallback() {
  return (
    <div className="drafting-grid grid min-h-dvh place-items-center">
      <p role="status" className="font-display text-lg text-ink-500">
        Laying out the table…
      </p>
    </div>
  );
}
