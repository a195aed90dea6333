import { PageHeading } from '../../components/ui/page-heading';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
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
        startMake={(pattern) => (
          <TextLink to={paths.makes.build({ newFromPattern: pattern.id })} aria-label={`Start a make from ${pattern.name}`}>
            Start a make
          </TextLink>
        )}
      />
    </>
  );
}
