import { useState, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextLink } from '../../../components/ui/text-link';
import { useDeletePattern } from '../api/delete-pattern';
import { useUpdatePattern } from '../api/update-pattern';
import { sourceFormatLabels, type PatternSummary } from '../types';

const dateFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

/** One pattern in a list: what it is, whose it is, and what its owner (or a visitor) can do with it. */
export function PatternCard({
  pattern,
  isOwner,
  canPublish,
  reviewHref,
  startMake,
}: {
  pattern: PatternSummary;
  isOwner: boolean;
  /** The owner is a coach or admin: the card offers publishing and withdrawing. */
  canPublish: boolean;
  reviewHref: string;
  /** The "Start a make" link, put here by the route (the makes area owns creating makes). */
  startMake?: ReactNode;
}) {
  const [confirming, setConfirming] = useState(false);
  const remove = useDeletePattern();
  const publish = useUpdatePattern();
  const error = remove.error ?? publish.error;
  const pieces = `${pattern.pieceCount} piece${pattern.pieceCount === 1 ? '' : 's'}`;

  return (
    <li className="flex flex-col gap-3 rounded-md border border-calico-300 bg-calico-50 p-4" aria-labelledby={`pattern-${pattern.id}`}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={`pattern-${pattern.id}`} className="text-lg font-semibold">
          {pattern.name}
        </h3>
        {pattern.published && (
          <span className="rounded-full border border-sage-700/40 bg-sage-50 px-2 py-0.5 text-xs font-semibold text-sage-700">
            In the shared library
          </span>
        )}
      </div>
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
        <dt className="text-ink-500">Owner</dt>
        <dd>{isOwner ? `${pattern.owner.displayName} (you)` : pattern.owner.displayName}</dd>
        <dt className="text-ink-500">Sizes</dt>
        <dd>{pattern.sizes.join(', ') || '—'}</dd>
        <dt className="text-ink-500">Pieces</dt>
        <dd>{pieces}</dd>
        <dt className="text-ink-500">Source</dt>
        <dd>
          {sourceFormatLabels[pattern.sourceFormat] ?? pattern.sourceFormat}
          {pattern.sourceName && <span className="text-ink-500"> · {pattern.sourceName}</span>}
        </dd>
        <dt className="text-ink-500">Added</dt>
        <dd>{dateFormat.format(new Date(pattern.createdAt))}</dd>
      </dl>
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <TextLink to={reviewHref} aria-label={`${isOwner ? 'Review' : 'Open'} ${pattern.name}`}>
          {isOwner ? 'Review and label' : 'Open'}
        </TextLink>
        {startMake}
        {isOwner && canPublish && (
          <Button
            variant="secondary"
            className="px-3 py-1.5"
            pending={publish.isPending}
            onClick={() => publish.mutate({ id: pattern.id, published: !pattern.published })}
            aria-label={`${pattern.published ? 'Withdraw' : 'Publish'} ${pattern.name}`}
          >
            {pattern.published ? 'Withdraw from library' : 'Publish to library'}
          </Button>
        )}
        {isOwner &&
          (confirming ? (
            <span className="flex items-center gap-2" role="group" aria-label={`Confirm deleting ${pattern.name}`}>
              <span className="font-medium text-madder-700">Delete for good?</span>
              <Button
                variant="secondary"
                className="px-3 py-1.5"
                pending={remove.isPending}
                onClick={() => remove.mutate(pattern.id, { onSettled: () => setConfirming(false) })}
                aria-label={`Yes, delete ${pattern.name}`}
              >
                Delete
              </Button>
              <Button variant="quiet" className="px-3 py-1.5" onClick={() => setConfirming(false)}>
                Keep it
              </Button>
            </span>
          ) : (
            <Button variant="quiet" className="px-3 py-1.5" onClick={() => { remove.reset(); setConfirming(true); }} aria-label={`Delete ${pattern.name}`}>
              Delete
            </Button>
          ))}
      </div>
      <FormAlert>{error?.message}</FormAlert>
    </li>
  );
}
