import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { StandalonePage } from './standalone-page';

export function NotFoundRoute() {
  return (
    <StandalonePage>
      <title>Page not found · Blockwright</title>
      <PageHeading eyebrow="404">This page is not on the table</PageHeading>
      <Panel>
        <p className="text-ink-900">
          Nothing lives at this address. It may have been mistyped, or the link that brought you
          here is out of date.
        </p>
        <p className="mt-6 text-sm">
          <TextLink to={paths.home.build()}>Go to the start</TextLink>
        </p>
      </Panel>
    </StandalonePage>
  );
}
