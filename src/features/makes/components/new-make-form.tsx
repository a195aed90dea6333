import { useId, useMemo, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FieldError } from '../../../components/ui/field-error';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../components/ui/use-form-errors';
import { ApiError, isApiError } from '../../../lib/api-client';
import { cx } from '../../../lib/cx';
import type { FieldErrors } from '../../../lib/form-errors';
import { formatLength, type LengthUnit } from '../../../../geometry/units';
import { useCreateMake } from '../api/create-make';
import { useCreateProfile } from '../api/create-profile';
import { usePatternChoices, type PatternChoice } from '../api/get-pattern-choices';
import { useProfiles, type Measurements } from '../api/get-profiles';
import type { MakeDetail } from '../api/schemas';
import { readLength } from '../../../lib/read-length';
import { measurementLabels, quickMeasurements } from './measurement-labels';

const NEW_PROFILE = '__new__';
const NO_PROFILE = '';

const selectClasses = (invalid: boolean) =>
  cx(
    'rounded-md border bg-calico-50 px-3 py-2 text-base text-ink-900 focus:border-denim-600 focus:outline-none focus:ring-2 focus:ring-tape-400',
    invalid ? 'border-madder-700' : 'border-calico-400',
  );

function patternLabel(pattern: PatternChoice): string {
  const sizes = pattern.sizes.length > 0 ? `sizes ${pattern.sizes.join(', ')}` : 'no sizes named';
  return `${pattern.name} — ${pattern.owner.displayName}, ${sizes}`;
}

/** A profile error, its fields moved under `profile.` so they land beside the profile's fields. */
function asProfileError(error: unknown): unknown {
  if (!isApiError(error)) return error;
  const fields = Object.fromEntries(
    Object.entries(error.fields).map(([key, message]) => [`profile.${key}`, message]),
  );
  return new ApiError(error.status, error.code, `The new profile was not saved: ${error.message}`, fields);
}

/**
 * Start a make: its name, the pattern (yours or from the shared library), a measurement profile
 * (one you have or a new one with a few measurements in your units) and a note on the fabric.
 */
export function NewMakeForm({
  units,
  initialPatternId,
  onCreated,
  onCancel,
}: {
  units: LengthUnit;
  /** Chosen when the form opens (the library's "start a make" link passes it). */
  initialPatternId?: string;
  onCreated: (make: MakeDetail) => void;
  onCancel?: () => void;
}) {
  const id = useId();
  const mine = usePatternChoices('mine');
  const library = usePatternChoices('library');
  const profiles = useProfiles();
  const createProfile = useCreateProfile();
  const create = useCreateMake({ onSuccess: onCreated });

  const [name, setName] = useState('');
  const [patternId, setPatternId] = useState(initialPatternId ?? '');
  const [profileChoice, setProfileChoice] = useState(NO_PROFILE);
  const [profileName, setProfileName] = useState('');
  const [measurementText, setMeasurementText] = useState<Partial<Record<string, string>>>({});
  const [fabricNote, setFabricNote] = useState('');

  const serverError = create.error ?? (createProfile.error ? asProfileError(createProfile.error) : null);
  const { formRef, errors, accept, onError } = useFormErrors(serverError);

  // The library lists shared patterns, yours among them when you published one: show each once.
  const libraryOnly = useMemo(() => {
    const own = new Set((mine.data ?? []).map((p) => p.id));
    return (library.data ?? []).filter((p) => !own.has(p.id));
  }, [mine.data, library.data]);
  const patternsLoading = mine.isPending || library.isPending;
  const knownPattern =
    patternId === '' || patternsLoading || [...(mine.data ?? []), ...libraryOnly].some((p) => p.id === patternId);

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const problems: FieldErrors = {};
    const trimmedName = name.trim();
    if (trimmedName === '') problems.name = 'Enter a name for the make.';
    else if (trimmedName.length > 120) problems.name = 'Keep the name to 120 characters.';
    if (patternId === '' || !knownPattern) problems.patternId = 'Choose a pattern.';
    if (fabricNote.length > 2000) problems.fabricNote = 'Keep the fabric note to 2000 characters.';
    const measurements: Measurements = {};
    if (profileChoice === NEW_PROFILE) {
      if (profileName.trim() === '') problems['profile.name'] = 'Enter a name for the profile.';
      for (const key of quickMeasurements) {
        const read = readLength(measurementText[key] ?? '', units);
        if ('error' in read) problems[`profile.measurements.${key}`] = read.error;
        else if (read.mm !== undefined) measurements[key] = read.mm;
      }
    }
    if (!accept(problems)) return;

    let profileId: string | null = profileChoice === NO_PROFILE ? null : profileChoice;
    if (profileChoice === NEW_PROFILE) {
      try {
        const profile = await createProfile.mutateAsync({ name: profileName.trim(), measurements });
        profileId = profile.id;
        setProfileChoice(profile.id);
      } catch (error) {
        onError(error);
        return;
      }
    }
    create.mutate(
      { name: trimmedName, patternId, profileId, fabricNote: fabricNote.trim() },
      { onError },
    );
  }

  const patternError = errors.fields.patternId;
  const profileSelectId = `${id}-profile`;
  const patternHelp = `${id}-pattern-help`;

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="flex flex-col gap-4">
      <FormAlert>{errors.message}</FormAlert>
      <TextField
        label="Name of the make"
        hint="For example the garment and the cloth: “Winter wool trousers”."
        name="name"
        value={name}
        onChange={(event) => setName(event.target.value)}
        error={errors.fields.name}
      />

      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-pattern`} className="text-sm font-semibold text-ink-900">
          Pattern
        </label>
        <p id={patternHelp} className="text-xs text-ink-500">
          Yours, or one shared in the library. The make keeps the pattern as it is and stacks your
          alterations on top.
        </p>
        <select
          id={`${id}-pattern`}
          name="patternId"
          value={knownPattern ? patternId : ''}
          onChange={(event) => setPatternId(event.target.value)}
          aria-invalid={patternError ? true : undefined}
          aria-describedby={[patternHelp, patternError ? `${id}-pattern-error` : ''].filter(Boolean).join(' ')}
          className={selectClasses(Boolean(patternError))}
        >
          <option value="">{patternsLoading ? 'Loading patterns…' : 'Choose a pattern'}</option>
          {(mine.data ?? []).length > 0 && (
            <optgroup label="Your patterns">
              {mine.data!.map((pattern) => (
                <option key={pattern.id} value={pattern.id}>
                  {patternLabel(pattern)}
                </option>
              ))}
            </optgroup>
          )}
          {libraryOnly.length > 0 && (
            <optgroup label="Shared library">
              {libraryOnly.map((pattern) => (
                <option key={pattern.id} value={pattern.id}>
                  {patternLabel(pattern)}
                </option>
              ))}
            </optgroup>
          )}
        </select>
        {!knownPattern && (
          <p className="text-sm text-ink-700">
            The pattern in the link is not one you can use (it may have been removed or unshared);
            choose another.
          </p>
        )}
        {(mine.isError || library.isError) && (
          <p className="text-sm text-madder-700">Some patterns could not be loaded; reload the page to try again.</p>
        )}
        <FieldError id={`${id}-pattern-error`}>{patternError}</FieldError>
      </div>

      <fieldset className="flex flex-col gap-3 rounded-md border border-dashed border-calico-400 p-4">
        <legend className="px-1 text-sm font-semibold text-ink-900">Measurements</legend>
        <div className="flex flex-col gap-1">
          <label htmlFor={profileSelectId} className="text-sm font-semibold text-ink-900">
            Profile
          </label>
          <select
            id={profileSelectId}
            name="profileId"
            value={profileChoice}
            onChange={(event) => setProfileChoice(event.target.value)}
            className={selectClasses(false)}
          >
            <option value={NO_PROFILE}>None for now</option>
            {(profiles.data ?? []).map((profile) => (
              <option key={profile.id} value={profile.id}>
                {profile.name}
              </option>
            ))}
            <option value={NEW_PROFILE}>New profile…</option>
          </select>
        </div>
        {profileChoice === NEW_PROFILE && (
          <div className="grid gap-3 sm:grid-cols-2">
            <TextField
              className="sm:col-span-2"
              label="Profile name"
              hint="Whose body these are, or when you measured: “Me, spring”."
              name="profile.name"
              value={profileName}
              onChange={(event) => setProfileName(event.target.value)}
              error={errors.fields['profile.name']}
            />
            {quickMeasurements.map((key) => (
              <TextField
                key={key}
                label={measurementLabels[key]}
                hint={`Optional; in ${units === 'in' ? 'inches' : 'centimetres'} unless you add a unit (for example ${formatLength(units === 'in' ? 812.8 : 820, units)}).`}
                name={`profile.measurements.${key}`}
                inputMode="decimal"
                value={measurementText[key] ?? ''}
                onChange={(event) => setMeasurementText((all) => ({ ...all, [key]: event.target.value }))}
                error={errors.fields[`profile.measurements.${key}`]}
              />
            ))}
            <p className="text-xs text-ink-500 sm:col-span-2">
              Measure over light clothing with a tape held snug, not tight. The fit planner will ask
              for more and compare them with the pattern; sizing advice is guidance, not a promise of fit.
            </p>
          </div>
        )}
      </fieldset>

      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-fabric`} className="text-sm font-semibold text-ink-900">
          Fabric note
        </label>
        <p id={`${id}-fabric-hint`} className="text-xs text-ink-500">
          Optional: the cloth, its width, stretch and whether it is washed yet.
        </p>
        <textarea
          id={`${id}-fabric`}
          name="fabricNote"
          rows={3}
          value={fabricNote}
          onChange={(event) => setFabricNote(event.target.value)}
          aria-invalid={errors.fields.fabricNote ? true : undefined}
          aria-describedby={`${id}-fabric-hint${errors.fields.fabricNote ? ` ${id}-fabric-error` : ''}`}
          className={selectClasses(Boolean(errors.fields.fabricNote))}
        />
        <FieldError id={`${id}-fabric-error`}>{errors.fields.fabricNote}</FieldError>
      </div>

      <div className="flex gap-2">
        <Button
          type="submit"
          pending={create.isPending || createProfile.isPending}
          pendingLabel="Starting the make…"
        >
          Start the make
        </Button>
        {onCancel && (
          <Button variant="quiet" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
