import { useState, type FormEvent, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { useFormErrors } from '../../../components/ui/use-form-errors';
import type { LengthUnit } from '../../../../geometry/units';
import { ApiError, isApiError } from '../../../lib/api-client';
import { fieldsForRows, readDraft, type DatedSetInput, type DraftOrigin, type FieldErrors, type MeasurementsDraft } from '../model';
import { MeasurementFields } from './measurement-fields';

/** The server's error with its girth rows renamed to the rows of the form. */
function onFormRows(error: unknown, rowOfSent: readonly number[]): unknown {
  if (!isApiError(error)) return error;
  return new ApiError(error.status, error.code, error.message, fieldsForRows(error.fields, rowOfSent));
}

/**
 * A form around one dated set: `before` adds fields above the measurements (a profile's name),
 * `check` their own problems; `save` gets the set read in millimetres.
 */
export function MeasurementsForm({
  unit,
  initialDraft,
  origin,
  before,
  check,
  save,
  pending,
  serverError,
  submitLabel,
  onCancel,
}: {
  unit: LengthUnit;
  initialDraft: MeasurementsDraft;
  /** The set the draft was filled from: unchanged text keeps its exact millimetres. */
  origin: DraftOrigin | null;
  before?: (fieldErrors: FieldErrors) => ReactNode;
  check?: () => FieldErrors;
  save: (set: DatedSetInput, callbacks: { onError: (error: unknown) => void }) => void;
  pending: boolean;
  serverError: unknown;
  submitLabel: string;
  onCancel?: () => void;
}) {
  const [draft, setDraft] = useState(initialDraft);
  const [rowOfSent, setRowOfSent] = useState<number[]>([]);
  const { formRef, errors, accept, onError } = useFormErrors(onFormRows(serverError, rowOfSent));

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const own = check?.() ?? {};
    const read = readDraft(draft, unit, origin);
    if (!accept({ ...own, ...('errors' in read ? read.errors : {}) }) || !('value' in read)) return;
    setRowOfSent(read.rowOfSent);
    save(read.value, { onError });
  }

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="flex flex-col gap-5">
      <FormAlert>{errors.message}</FormAlert>
      {before?.(errors.fields)}
      <MeasurementFields draft={draft} onChange={setDraft} unit={unit} errors={errors.fields} />
      <div className="flex gap-2">
        <Button type="submit" pending={pending} pendingLabel="Saving…">
          {submitLabel}
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
