import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import { cx } from '../../../lib/cx';
import { formErrorsOf } from '../../../lib/form-errors';
import { useProfiles } from '../api/get-profiles';
import { formatTakenOn } from '../model';

/** The sewist's profiles; choosing one opens it beside the list. */
export function ProfilesList({ selectedId, onSelect }: { selectedId: string | null; onSelect: (id: string) => void }) {
  const profiles = useProfiles();
  if (profiles.isPending) return <LoadingState label="Loading your profiles…" />;
  if (profiles.isError) return <FormAlert>{formErrorsOf({}, profiles.error).message}</FormAlert>;
  if (profiles.data.length === 0)
    return <p className="text-sm text-ink-700">No profiles yet. Start one for yourself, or for someone you sew for.</p>;
  return (
    <ul aria-label="Measurement profiles" className="flex flex-col gap-2">
      {profiles.data.map((profile) => {
        const selected = profile.id === selectedId;
        const count = Object.keys(profile.measurements).length + profile.girthsAtHeights.length;
        return (
          <li key={profile.id}>
            <button
              type="button"
              aria-current={selected ? 'true' : undefined}
              onClick={() => onSelect(profile.id)}
              className={cx(
                'w-full rounded-md border px-3 py-2 text-left transition-colors',
                selected ? 'border-denim-600 bg-denim-50' : 'border-calico-300 bg-calico-50 hover:border-denim-600',
              )}
            >
              <span className="block font-semibold text-ink-900">{profile.name}</span>
              <span className="block text-xs text-ink-500">
                {count === 1 ? '1 measurement' : `${count} measurements`}, taken {formatTakenOn(profile.takenOn)}
              </span>
            </button>
          </li>
        );
      })}
    </ul>
  );
}
