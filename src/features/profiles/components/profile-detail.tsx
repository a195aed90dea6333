import { useId, useState, type FormEvent, type KeyboardEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import { TextField } from '../../../components/ui/text-field';
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

function RenameForm({ profile, onDone }: { profile: Profile; onDone: () => void }) {
  const [name, setName] = useState(profile.name);
  const [problem, setProblem] = useState<string | null>(null);
  const update = useUpdateProfile();
  const errors = formErrorsOf(problem ? { name: problem } : {}, update.error);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const trimmed = name.trim();
    if (trimmed === '') return setProblem('Enter a name for the profile.');
    if (trimmed.length > 80) return setProblem('Keep the name to 80 characters.');
    setProblem(null);
    if (trimmed === profile.name) return onDone();
    update.mutate({ id: profile.id, name: trimmed }, { onSuccess: onDone });
  }

  return (
    <form
      noValidate
      onSubmit={handleSubmit}
      onKeyDown={(event: KeyboardEvent<HTMLFormElement>) => event.key === 'Escape' && onDone()}
      className="flex flex-col gap-2"
    >
      <TextField
        label={`New name for “${profile.name}”`}
        name="name"
        value={name}
        autoFocus
        onChange={(event) => setName(event.target.value)}
        error={errors.fields.name}
      />
      {!errors.fields.name && <FormAlert>{errors.message}</FormAlert>}
      <div className="flex gap-2">
        <Button type="submit" className="px-3 py-1.5" pending={update.isPending} pendingLabel="Saving…">
          Save name
        </Button>
        <Button variant="quiet" className="px-3 py-1.5" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

function DeleteConfirm({ profile, onDeleted, onCancel }: { profile: Profile; onDeleted: () => void; onCancel: () => void }) {
  const remove = useDeleteProfile({ onSuccess: onDeleted });
  const sets = profile.history.length;
  return (
    <div role="alertdialog" aria-labelledby="delete-profile-title" className="rounded-md border border-madder-700/40 bg-madder-50 p-4">
      <p id="delete-profile-title" className="font-semibold text-madder-700">
        Delete “{profile.name}” and its {sets === 1 ? 'one dated set' : `${sets} dated sets`}?
      </p>
      <p className="mt-1 text-sm text-ink-700">
        This cannot be undone. Makes that use this profile keep their alterations and go on without a profile.
      </p>
      <FormAlert className="mt-2 empty:hidden">{remove.error ? formErrorsOf({}, remove.error).message : null}</FormAlert>
      <div className="mt-3 flex gap-2">
        <Button
          className="bg-madder-700 px-3 py-1.5 hover:bg-madder-700/90"
          pending={remove.isPending}
          pendingLabel="Deleting…"
          onClick={() => remove.mutate(profile.id)}
        >
          Delete for good
        </Button>
        <Button variant="secondary" className="px-3 py-1.5" autoFocus onClick={onCancel}>
          Keep it
        </Button>
      </div>
    </div>
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
          <RenameForm profile={data} onDone={() => setMode('view')} />
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

      {mode === 'delete' && <DeleteConfirm profile={data} onDeleted={onDeleted} onCancel={() => setMode('view')} />}

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
