import { useNavigate } from 'react-router-dom';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { PatternLibrary } from '../../features/patterns/components/pattern-library';
import { PatternUpload } from '../../features/patterns/components/pattern-upload';
import { StartMakeLink } from '../../features/makes/components/start-make-link';

/** Your patterns and the upload form; a new upload opens its review. */
export function PatternsRoute() {
  const navigate = useNavigate();
  const { data: me } = useMe();
  if (!me) return null;
  return (
    <>
      <title>Patterns · Blockwright</title>
      <PageHeading eyebrow="Your work" lead="Upload trouser pattern pieces with their nested size lines, then label each piece so alterations know where to work.">
        Patterns
      </PageHeading>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <PatternLibrary
          sections={['mine']}
          me={me}
          reviewHref={paths.patternReview.build}
          startMake={(pattern) => <StartMakeLink pattern={pattern} />}
        />
        <Panel title="Upload a pattern">
          <PatternUpload onUploaded={(pattern) => navigate(paths.patternReview.build(pattern.id))} />
        </Panel>
      </div>
    </>
  );
}
