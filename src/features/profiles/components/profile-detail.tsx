import { useId, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import { ConfirmDelete } from '../../../components/ui/confirm-delete';
import { RenameForm } from '../../../components/ui/rename-form';
import type { LengthUnit } from '../../../../geometry/units';
import { formErrorsOf } from '../../../lib/form-errors';
import { useDeleteProfile } from '../api/delete-profile';
import { useProfile } from '../api/get-profile';
import type { ProfileDetail as Profile } from '../api/schemas';
import { useUpdateProfile } from '../api/update-profile';
import type { Measurements } from '../../../types/measurement-names';
import { draftFrom, formatTakenOn, type DraftOrigin } from '../model';
import { HistoryTable } from './history-table';
import { MeasurementsForm } from './measurements-form';



function ProfileRename({ profile, onDone }: { profile: Profile; onDone: () => void }) {
  const update = useUpdateProfile();
  return (
    <RenameForm
      current={profile.name}
      what="profile"
      maxLength={80}
      pending={update.isPending}
      error={update.error}
      onRename={(name) => update.mutate({ id: profile.id, name }, { onSuccess: onDone })}
      onDone={onDone}
    />
  );
}

function ProfileDelete({ profile, onDeleted, onCancel }: { profile: Profile; onDeleted: () => void; onCancel: () => void }) {
  const remove = useDeleteProfile({ onSuccess: onDeleted });
  const sets = profile.history.length;
  return (
    <ConfirmDelete
      question={`Delete “${profile.name}” and its ${sets === 1 ? 'one dated set' : `${sets} dated sets`}?`}
      pending={remove.isPending}
      error={remove.error}
      onConfirm={() => remove.mutate(profile.id)}
      onCancel={onCancel}
    >
      This cannot be undone. Makes that use this profile keep their alterations and go on without a profile.
    </ConfirmDelete>
  );
}

type Mode = 'view' | 'rename' | 'delete' | 'measure';

/** One profile: its name, its current set, new measurements as a new dated set, and the history. */
export function ProfileDetail({ id, unit, onDeleted }: { id: string; unit: LengthUnit; onDeleted: () => void }) {
  const headingId = useId();
  const profile = useProfile(id);
  const [mode, setMode] = useState<Mode>('view');
  const [saved, setSaved] = useState<string | null>(null);
  const update = useUpdateProfile();

  if (profile.isPending) return <LoadingState label="Loading the profile…" />;
  if (profile.isError) return <FormAlert>{formErrorsOf({}, profile.error).message}</FormAlert>;
  const data = profile.data;
  const origin: DraftOrigin = { measurements: data.measurements as Measurements, girthsAtHeights: data.girthsAtHeights };

  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-5">
      <div>
        {mode === 'rename' ? (
          <ProfileRename profile={data} onDone={() => setMode('view')} />
        ) : (
          <h2 id={headingId} className="font-display text-2xl font-semibold text-ink-900">
            {data.name}
          </h2>
        )}
        <p className="mt-1 text-sm text-ink-500">
          Current measurements taken on <time dateTime={data.takenOn}>{formatTakenOn(data.takenOn)}</time>
          {' · '}
          {data.history.length === 1 ? 'one dated set' : `${data.history.length} dated sets`}
        </p>
      </div>

      <FormAlert tone="success" className="empty:hidden">
        {saved}
      </FormAlert>

      {mode !== 'measure' && mode !== 'delete' && (
        <div role="group" aria-label={`Actions for ${data.name}`} className="flex flex-wrap gap-2">
          <Button className="px-3 py-1.5" onClick={() => (setSaved(null), setMode('measure'))}>
            Take new measurements
          </Button>
          {mode !== 'rename' && (
            <Button variant="secondary" className="px-3 py-1.5" aria-label={`Rename ${data.name}`} onClick={() => setMode('rename')}>
              Rename
            </Button>
          )}
          <Button variant="quiet" className="px-3 py-1.5" aria-label={`Delete ${data.name}`} onClick={() => setMode('delete')}>
            Delete
          </Button>
        </div>
      )}

      {mode === 'delete' && <ProfileDelete profile={data} onDeleted={onDeleted} onCancel={() => setMode('view')} />}

      {mode === 'measure' && (
        <div className="rounded-lg border border-dashed border-calico-400 p-4">
          <h3 className="mb-1 font-display text-xl font-semibold">New measurements</h3>
          <p className="mb-4 text-sm text-ink-700">
            Filled in with the current set; change what you measured differently. Saving adds a new dated set
            — earlier sets stay as they were.
          </p>
          <MeasurementsForm
            key={data.history[0]?.id ?? data.takenOn}
            unit={unit}
            initialDraft={draftFrom(origin, unit)}
            origin={origin}
            save={(set, { onError }) =>
              update.mutate(
                { id: data.id, ...set },
                {
                  onError,
                  onSuccess: () => {
                    setSaved(`Measurements of ${formatTakenOn(set.takenOn)} saved.`);
                    setMode('view');
                  },
                },
              )
            }
            pending={update.isPending}
            serverError={update.error}
            submitLabel="Save as a new dated set"
            onCancel={() => {
              update.reset();
              setMode('view');
            }}
          />
        </div>
      )}

      <div>
        <h3 className="mb-2 font-display text-xl font-semibold">History</h3>
        <HistoryTable history={data.history} unit={unit} />
      </div>
    </section>
  );
}
