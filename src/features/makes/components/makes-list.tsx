import { useId, useRef, type KeyboardEvent } from 'react';
import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import { cx } from '../../../lib/cx';
import { formErrorsOf } from '../../../lib/form-errors';
import { useMakes } from '../api/get-makes';
import type { MakeDetail, MakeSummary } from '../api/schemas';
import { MakeCard } from './make-card';

export type MakesView = 'active' | 'archived';

const views: { id: MakesView; label: string }[] = [
  { id: 'active', label: 'Active' },
  { id: 'archived', label: 'Archived' },
];

const emptyText: Record<MakesView, string> = {
  active: 'No makes in progress. Start one from a pattern of yours or from the shared library.',
  archived: 'Nothing archived. Archived makes wait here, with all their revisions, until you bring them back.',
};

/**
 * The signed-in user's makes, active or archived, as tabs. Each make links to its workspace and
 * can be renamed in place, sewn again (a new make from its newest alterations), printed (when
 * `onPrint` is given) or archived and brought back.
 */
export function MakesList({
  view,
  onViewChange,
  onPrint,
  onSewnAgain,
}: {
  view: MakesView;
  onViewChange: (view: MakesView) => void;
  onPrint?: (make: MakeSummary) => void;
  /** After "sew it again" created the new make (the page usually opens it). */
  onSewnAgain: (make: MakeDetail) => void;
}) {
  const id = useId();
  const tabRefs = useRef<Partial<Record<MakesView, HTMLButtonElement | null>>>({});
  const makes = useMakes({ archived: view === 'archived' });

  function handleKeyDown(event: KeyboardEvent<HTMLDivElement>) {
    if (event.key !== 'ArrowLeft' && event.key !== 'ArrowRight') return;
    event.preventDefault();
    const next: MakesView = view === 'active' ? 'archived' : 'active';
    onViewChange(next);
    tabRefs.current[next]?.focus();
  }

  return (
    <div>
      <div
        role="tablist"
        aria-label="Which makes"
        onKeyDown={handleKeyDown}
        className="mb-5 inline-flex gap-1 rounded-lg border border-calico-300 bg-calico-100 p-1"
      >
        {views.map((each) => {
          const selected = each.id === view;
          return (
            <button
              key={each.id}
              ref={(node) => {
                tabRefs.current[each.id] = node;
              }}
              type="button"
              role="tab"
              id={`${id}-tab-${each.id}`}
              aria-selected={selected}
              aria-controls={`${id}-panel`}
              tabIndex={selected ? 0 : -1}
              onClick={() => onViewChange(each.id)}
              className={cx(
                'rounded-md px-4 py-1.5 text-sm font-semibold transition-colors',
                selected ? 'bg-calico-50 text-denim-700 shadow-sm' : 'text-ink-700 hover:text-ink-900',
              )}
            >
              {each.label}
            </button>
          );
        })}
      </div>
      <div role="tabpanel" id={`${id}-panel`} aria-labelledby={`${id}-tab-${view}`}>
        {makes.isPending ? (
          <LoadingState label="Loading your makes…" />
        ) : makes.isError ? (
          <FormAlert>{formErrorsOf({}, makes.error).message}</FormAlert>
        ) : makes.data.length === 0 ? (
          <p className="text-ink-700">{emptyText[view]}</p>
        ) : (
          <ul className="grid gap-4 md:grid-cols-2">
            {makes.data.map((make) => (
              <MakeCard key={make.id} make={make} onPrint={onPrint} onSewnAgain={onSewnAgain} />
            ))}
          </ul>
        )}
      </div>
    </div>
  );
}
