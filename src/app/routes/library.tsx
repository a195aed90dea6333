import { PageHeading } from '../../components/ui/page-heading';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { StartMakeLink } from '../../features/makes/components/start-make-link';
import { PatternLibrary } from '../../features/patterns/components/pattern-library';

/** The shared library: patterns coaches have published, ready to start a make from. */
export function LibraryRoute() {
  const { data: me } = useMe();
  if (!me) return null;
  return (
    <>
      <title>Shared library · Blockwright</title>
      <PageHeading eyebrow="Together" lead="Patterns coaches have published for everyone here. Open one to see its pieces, or start a make from it.">
        Shared library
      </PageHeading>
      <PatternLibrary
        sections={['library']}
        me={me}
        reviewHref={paths.patternReview.build}
        startMake={(pattern) => <StartMakeLink pattern={pattern} />}
      />
    </>
  );
}
