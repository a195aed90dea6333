import { useParams } from 'react-router-dom';
import { FormAlert } from '../../components/ui/form-alert';
import { LoadingState } from '../../components/ui/loading-state';
import { PageHeading } from '../../components/ui/page-heading';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { usePattern } from '../../features/patterns/api/get-pattern';
import { PatternReview } from '../../features/patterns/components/pattern-review';
import { SizeTable } from '../../features/patterns/components/size-table';
import { piecesIncludeSeamAllowance } from '../../features/patterns/model/size-chart';
import { StartMakeLink } from '../../features/makes/components/start-make-link';

/** One pattern: its owner reviews and labels it; anyone else who may see it reads it and can start a make. */
export function PatternReviewRoute() {
  const { id = '' } = useParams();
  const { data: me } = useMe();
  const pattern = usePattern(id);
  if (!me) return null;
  if (pattern.isPending) return <LoadingState label="Loading the pattern…" />;
  if (pattern.isError) return <FormAlert>{pattern.error.message}</FormAlert>;
  const detail = pattern.data;
  return (
    <>
      <title>{`${detail.name} · Blockwright`}</title>
      <PageHeading
        eyebrow={detail.canEdit ? 'Review and label' : `Pattern by ${detail.owner.displayName}`}
        lead={detail.canEdit ? 'Name the pieces and sizes, then mark the grainline, levels, lengthen/shorten lines, notches and seams on each piece.' : undefined}
      >
        {detail.name}
      </PageHeading>
      <p className="-mt-6 mb-6 text-sm">
        <TextLink to={detail.canEdit ? paths.patterns.build() : paths.library.build()}>{detail.canEdit ? 'Back to your patterns' : 'Back to the shared library'}</TextLink>
      </p>
      <PatternReview
        detail={detail}
        units={me.units}
        startMake={<StartMakeLink pattern={detail} />}
      />
      <div className="mt-8">
        <SizeTable patternId={detail.id} units={me.units} canEdit={detail.canEdit} includesSeamAllowance={piecesIncludeSeamAllowance(detail.pattern)} />
      </div>
    </>
  );
}
