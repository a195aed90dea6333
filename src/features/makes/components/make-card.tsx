import { useId, useState } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { RenameForm } from '../../../components/ui/rename-form';
import { paths } from '../../../config/paths';
import { formErrorsOf } from '../../../lib/form-errors';
import type { MakeDetail, MakeSummary } from '../api/schemas';
import { useDuplicateMake } from '../api/duplicate-make';
import { useUpdateMake } from '../api/update-make';

const savedFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

const actionClasses =
  'inline-flex items-center justify-center gap-2 rounded-md px-3 py-1.5 text-sm font-semibold transition-colors';

function MakeRename({ make, onDone }: { make: MakeSummary; onDone: () => void }) {
  const update = useUpdateMake();
  return (
    <RenameForm
      current={make.name}
      what="make"
      maxLength={120}
      pending={update.isPending}
      error={update.error}
      onRename={(name) => update.mutate({ id: make.id, name }, { onSuccess: onDone })}
      onDone={onDone}
    />
  );
}

function alterationsText(count: number): string {
  if (count === 0) return 'None yet';
  return count === 1 ? '1 alteration' : `${count} alterations`;
}


/** One make in the list: what it is, when it was last saved, and what can be done with it. */
export function MakeCard({
  make,
  onPrint,
  onSewnAgain,
}: {
  make: MakeSummary;
  onPrint?: (make: MakeSummary) => void;
  onSewnAgain: (make: MakeDetail) => void;
}) {
  const headingId = useId();
  const [renaming, setRenaming] = useState(false);
  const update = useUpdateMake();
  const duplicate = useDuplicateMake({ onSuccess: onSewnAgain });
  const failed = update.error ?? duplicate.error;
  const failure = failed ? formErrorsOf({}, failed).message : null;

  return (
    <li>
      <article
        aria-labelledby={headingId}
        className="rounded-lg border border-calico-300 bg-calico-50 p-5 shadow-[0_1px_0_rgb(197_182_151/0.6)]"
      >
        {renaming ? (
          <MakeRename make={make} onDone={() => setRenaming(false)} />
        ) : (
          <h3 id={headingId} className="font-display text-xl font-semibold text-ink-900">
            {make.name}
          </h3>
        )}
        <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
          <dt className="text-ink-500">Pattern</dt>
          <dd className="font-medium">{make.pattern.name}</dd>
          <dt className="text-ink-500">Profile</dt>
          <dd className="font-medium">{make.profile?.name ?? 'None chosen'}</dd>
          <dt className="text-ink-500">Fabric</dt>
          <dd className="font-medium whitespace-pre-line">{make.fabricNote || 'No note yet'}</dd>
          <dt className="text-ink-500">Alterations</dt>
          <dd className="font-medium">{alterationsText(make.alterationCount)}</dd>
          <dt className="text-ink-500">Last saved</dt>
          <dd className="font-medium">
            <time dateTime={make.updatedAt}>{savedFormat.format(new Date(make.updatedAt))}</time>
          </dd>
        </dl>
        <FormAlert className="mt-3 empty:hidden">{failure}</FormAlert>
        <div role="group" aria-label={`Actions for ${make.name}`} className="mt-4 flex flex-wrap gap-2">
          <Link
            to={paths.make.build(make.id)}
            className={`${actionClasses} bg-denim-600 text-calico-50 shadow-sm hover:bg-denim-700`}
            aria-label={`Open ${make.name}`}
          >
            Open
          </Link>
          {!renaming && (
            <Button
              variant="secondary"
              className="px-3 py-1.5"
              aria-label={`Rename ${make.name}`}
              onClick={() => setRenaming(true)}
            >
              Rename
            </Button>
          )}
          <Button
            variant="secondary"
            className="px-3 py-1.5"
            aria-label={`Sew ${make.name} again`}
            title="Start a new make from this one's newest alterations"
            pending={duplicate.isPending}
            pendingLabel="Copying…"
            onClick={() => duplicate.mutate({ id: make.id })}
          >
            Sew it again
          </Button>
          {onPrint && (
            <Button
              variant="secondary"
              className="px-3 py-1.5"
              aria-label={`Print ${make.name}`}
              onClick={() => onPrint(make)}
            >
              Print
            </Button>
          )}
          <Button
            variant="quiet"
            className="px-3 py-1.5"
            aria-label={make.archived ? `Bring back ${make.name}` : `Archive ${make.name}`}
            pending={update.isPending}
            onClick={() => update.mutate({ id: make.id, archived: !make.archived })}
          >
            {make.archived ? 'Bring back' : 'Archive'}
          </Button>
        </div>
      </article>
    </li>
  );
}
