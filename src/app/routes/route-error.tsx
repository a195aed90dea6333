import { isRouteErrorResponse, useLocation, useRouteError } from 'react-router-dom';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { isApiError } from '../../lib/api-client';
import { StandalonePage } from './standalone-page';

function describe(error: unknown): { title: string; detail: string; signIn: boolean } {
  if (isApiError(error) && error.status === 401) {
    return {
      title: 'Your session has ended',
      detail: 'Sign in again to carry on where you were.',
      signIn: true,
    };
  }
  if (isApiError(error)) {
    return { title: 'The server could not help with this page', detail: error.message, signIn: false };
  }
  if (isRouteErrorResponse(error)) {
    return { title: `${error.status} ${error.statusText}`, detail: String(error.data ?? ''), signIn: false };
  }
  return {
    title: 'Something went wrong on this page',
    detail: 'Reloading the page often helps. Nothing you saved earlier is lost.',
    signIn: false,
  };
}

/** Shown when a route's loader or component fails. Inside the shell, the navigation stays. */
export function RouteErrorBoundary() {
  const { title, detail, signIn } = describe(useRouteError());
  const { pathname, search } = useLocation();
  return (
    <>
      <title>Something went wrong · Blockwright</title>
      <PageHeading eyebrow="Trouble">{title}</PageHeading>
      <Panel className="max-w-2xl">
        <p role="alert" className="text-ink-900">
          {detail}
        </p>
        <p className="mt-6 text-sm">
          {signIn ? (
            <TextLink to={paths.signIn.build(pathname + search)}>Sign in</TextLink>
          ) : (
            <TextLink to={paths.home.build()}>Go to the start</TextLink>
          )}
        </p>
      </Panel>
    </>
  );
}

/** The outermost boundary, for failures outside the shell. */
export function RootErrorBoundary() {
  return (
    <StandalonePage>
      <RouteErrorBoundary />
    </StandalonePage>
  );
}
