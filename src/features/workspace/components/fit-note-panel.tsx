import { useId, useState } from 'react';
import type { LengthUnit } from '../../../../geometry/index.ts';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { cx } from '../../../lib/cx';
import { useDeleteFitNote, useSaveFitNote } from '../api/fit-note';
import { useMakeFit } from '../api/make-fit';
import { type FitNoteDraft, type NoteLevel, type Verdict, LEVEL_LABELS, NEXT_TIME_MAX, NOTE_LEVELS, VERDICT_LABELS, draftFromNote, isGirthLevel, noteFromDraft, verdictsFor } from '../model/fit-note';

const inputClasses = (invalid: boolean) =>
  cx('rounded-md border bg-calico-50 px-2 py-1 text-sm text-ink-900 focus:border-denim-600 focus:outline-none focus:ring-2 focus:ring-tape-400', invalid ? 'border-madder-700' : 'border-calico-400');

function NoteForm({ makeId, unit, initial, hasNote }: { makeId: string; unit: LengthUnit; initial: FitNoteDraft; hasNote: boolean }) {
  const id = useId();
  const [draft, setDraft] = useState(initial);
  const [errors, setErrors] = useState<Partial<Record<NoteLevel | 'nextTime', string>>>({});
  const [saved, setSaved] = useState(false);
  const save = useSaveFitNote();
  const remove = useDeleteFitNote();
  const setLevel = (level: NoteLevel, change: Partial<FitNoteDraft['levels'][NoteLevel]>) => {
    setSaved(false);
    setDraft((d) => ({ ...d, levels: { ...d.levels, [level]: { ...d.levels[level], ...change } } }));
  };

  return (
    <form
      noValidate
      className="flex flex-col gap-3"
      onSubmit={(e) => {
        e.preventDefault();
        const read = noteFromDraft(draft, unit);
        if ('errors' in read) {
          setErrors(read.errors);
          return;
        }
        setErrors({});
        save.mutate({ makeId, note: read.note }, { onSuccess: () => setSaved(true) });
      }}
    >
      <table className="w-full text-sm">
        <thead>
          <tr className="text-left text-xs text-ink-500">
            <th scope="col" className="font-normal">
              Level
            </th>
            <th scope="col" className="font-normal">
              How it fitted
            </th>
            <th scope="col" className="font-normal">
              By how much
            </th>
          </tr>
        </thead>
        <tbody>
          {NOTE_LEVELS.map((level) => {
            const value = draft.levels[level];
            const error = errors[level];
            const name = LEVEL_LABELS[level];
            return (
              <tr key={level} className="align-top">
                <th scope="row" className="py-1 pr-2 pt-2.5 text-left font-semibold text-ink-900">
                  {name}
                </th>
                <td className="py-1 pr-2">
                  <select aria-label={`${name}: how it fitted`} className={inputClasses(false)} value={value.verdict} onChange={(e) => setLevel(level, { verdict: e.target.value as Verdict | '' })}>
                    <option value="">Not noted</option>
                    {verdictsFor(level).map((v) => (
                      <option key={v} value={v}>
                        {VERDICT_LABELS[v]}
                      </option>
                    ))}
                  </select>
                </td>
                <td className="py-1">
                  <input
                    aria-label={`${name}: by how much`}
                    aria-invalid={error ? true : undefined}
                    aria-describedby={error ? `${id}-${level}-error` : undefined}
                    disabled={value.verdict === 'right'}
                    className={cx(inputClasses(Boolean(error)), 'w-24')}
                    value={value.verdict === 'right' ? '' : value.amount}
                    onChange={(e) => setLevel(level, { amount: e.target.value })}
                  />
                  {error && (
                    <p id={`${id}-${level}-error`} className="mt-0.5 text-xs font-medium text-madder-700">
                      {error}
                    </p>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <p className="text-xs text-ink-500">
        Amounts in {unit === 'in' ? 'inches' : 'centimetres'} unless you add a unit. Girths ({NOTE_LEVELS.filter(isGirthLevel).map((l) => LEVEL_LABELS[l].toLowerCase()).join(', ')}) as the tape reads round the garment; rise and leg length along the seam.
      </p>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-next`} className="text-sm font-semibold text-ink-900">
          What to change next time
        </label>
        <textarea
          id={`${id}-next`}
          rows={3}
          maxLength={NEXT_TIME_MAX + 200}
          aria-invalid={errors.nextTime ? true : undefined}
          className={inputClasses(Boolean(errors.nextTime))}
          value={draft.nextTime}
          onChange={(e) => {
            setSaved(false);
            setDraft((d) => ({ ...d, nextTime: e.target.value }));
          }}
        />
        {errors.nextTime && <p className="text-xs font-medium text-madder-700">{errors.nextTime}</p>}
      </div>
      {Object.keys(errors).length > 0 && (
        <p role="alert" className="text-sm font-medium text-madder-700">
          The note was not saved: check the marked fields.
        </p>
      )}
      {save.isError && <FormAlert>{save.error.message}</FormAlert>}
      {saved && !save.isPending && (
        <p role="status" className="text-sm text-sage-700">
          Fit note saved. “Sew it again” will bring it into the next make’s plan.
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" pending={save.isPending} pendingLabel="Saving…">
          Save the fit note
        </Button>
        {hasNote && (
          <Button
            variant="quiet"
            pending={remove.isPending}
            onClick={() => {
              if (!window.confirm('Delete this make’s fit note?')) return;
              remove.mutate({ makeId }, { onSuccess: () => { setDraft(draftFromNote(null, unit)); setSaved(false); } });
            }}
          >
            Delete the note
          </Button>
        )}
      </div>
      {remove.isError && <FormAlert>{remove.error.message}</FormAlert>}
    </form>
  );
}

/** "How did it fit?": the sewist's verdict per level after wearing the make, and what to change next time. */
export function FitNotePanel({ makeId, unit }: { makeId: string; unit: LengthUnit }) {
  const make = useMakeFit(makeId);
  return (
    <section aria-labelledby="fit-note-heading" className="flex flex-col gap-2">
      <h2 id="fit-note-heading" className="font-display text-lg text-ink-900">
        How did it fit?
      </h2>
      <p className="text-xs text-ink-500">After wearing the make: where it was tight or loose, short or long, and by about how much.</p>
      {make.isPending ? (
        <p className="text-sm text-ink-500">Loading…</p>
      ) : make.isError ? (
        <FormAlert>{make.error.message}</FormAlert>
      ) : (
        <NoteForm key={makeId} makeId={makeId} unit={unit} initial={draftFromNote(make.data.fitNote, unit)} hasNote={make.data.fitNote !== null} />
      )}
    </section>
  );
}
