import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { areaById, type AreaId } from '../navigation';

/** An area of the product that is planned but not built: what it will do, and that it is not here yet. */
export function AreaComingRoute({ areaId }: { areaId: AreaId }) {
  const area = areaById(areaId);
  return (
    <>
      <title>{`${area.label} · Blockwright`}</title>
      <PageHeading eyebrow="Coming">{area.label}</PageHeading>
      <Panel className="max-w-2xl">
        <p className="text-lg text-ink-900">{area.summary}</p>
        <p className="mt-4 flex items-center gap-2 text-ink-700">
          <span aria-hidden className="inline-block h-0 w-8 border-t-2 border-dashed border-chalk-600" />
          This area is not built yet, so there is nothing to show here today.
        </p>
        <p className="mt-6 text-sm">
          <TextLink to={paths.home.build()}>Back to your table</TextLink>
        </p>
      </Panel>
    </>
  );
}
