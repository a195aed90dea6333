import { useRevisions } from '../api/get-revisions';

/** The make's revisions, newest first: look at any of them, or restore one (which saves a new revision). */
export function RevisionHistory({
  makeId,
  current,
  viewing,
  onView,
}: {
  makeId: string;
  /** The revision being edited (newest saved). */
  current: number;
  viewing: number | null;
  onView: (number: number | null) => void;
}) {
  const revisions = useRevisions(makeId);
  if (revisions.isPending) return <p className="text-sm text-ink-700">Loading the history…</p>;
  if (revisions.isError) return <p role="alert" className="text-sm text-madder-700">{revisions.error.message}</p>;
  return (
    <ol aria-label="Revisions" className="flex max-h-96 flex-col gap-1 overflow-y-auto">
      {revisions.data.map((r) => (
        <li key={r.number} className="rounded-md border border-calico-300 bg-calico-50 p-2 text-sm">
          <div className="flex items-baseline justify-between gap-2">
            <span className="font-semibold text-ink-900">Revision {r.number}</span>
            <time className="text-xs text-ink-500" dateTime={r.createdAt}>
              {new Date(r.createdAt).toLocaleString()}
            </time>
          </div>
          <p className="text-ink-700">{r.summary}</p>
          <p className="text-xs text-ink-500">
            {r.author?.displayName ?? 'someone'} · {r.alterationCount} alteration{r.alterationCount === 1 ? '' : 's'}
            {r.restoredFrom !== null ? ` · restored revision ${r.restoredFrom}` : ''}
          </p>
          {r.number !== current && (
            <button type="button" className="mt-1 text-sm font-semibold text-denim-700 hover:underline" aria-pressed={viewing === r.number} onClick={() => onView(viewing === r.number ? null : r.number)}>
              {viewing === r.number ? 'Back to the current revision' : `Look at revision ${r.number}`}
            </button>
          )}
        </li>
      ))}
    </ol>
  );
}
