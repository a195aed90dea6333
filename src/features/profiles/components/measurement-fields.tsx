import { useId } from 'react';
import { Button } from '../../../components/ui/button';
import type { LengthUnit } from '../../../../geometry/units';
import { cx } from '../../../lib/cx';
import { girthAtHeightHowTo, girthsAtHeightsWhy, measurementHelp, measuringCaution } from '../measurement-help';
import { MEASUREMENT_NAMES, type MeasurementName } from '../../../types/measurement-names';
import { MAX_NOTE_LENGTH, todayIso, type FieldErrors, type GirthRowDraft, type MeasurementsDraft } from '../model';
import { FieldError } from '../../../components/ui/field-error';
import { LengthInput } from '../../../components/ui/length-input';

const controlClasses = (invalid: boolean) =>
  cx(
    'rounded-md border bg-calico-50 px-3 py-1.5 text-base text-ink-900 focus:border-denim-600 focus:outline-none focus:ring-2 focus:ring-tape-400',
    invalid ? 'border-madder-700' : 'border-calico-400',
  );

const girths = MEASUREMENT_NAMES.filter((name) => measurementHelp[name].kind === 'girth');
const lengths = MEASUREMENT_NAMES.filter((name) => measurementHelp[name].kind === 'length');

/**
 * The fields of one dated set: the ISO 8559-1 measurements with how to take each, girths at
 * heights above and below the waist, the date they were taken and a note. Errors are keyed as
 * the API names its fields (`measurements.waistGirth`, `girthsAtHeights.0.offset`, `takenOn`).
 */
export function MeasurementFields({
  draft,
  onChange,
  unit,
  errors,
}: {
  draft: MeasurementsDraft;
  onChange: (draft: MeasurementsDraft) => void;
  unit: LengthUnit;
  errors: FieldErrors;
}) {
  const id = useId();
  const setMeasurement = (name: MeasurementName, text: string) =>
    onChange({ ...draft, measurements: { ...draft.measurements, [name]: text } });
  const setRow = (index: number, row: GirthRowDraft) =>
    onChange({ ...draft, girthRows: draft.girthRows.map((each, i) => (i === index ? row : each)) });
  const unitName = unit === 'in' ? 'inches' : 'centimetres';

  const group = (title: string, names: readonly MeasurementName[]) => (
    <fieldset className="flex min-w-0 flex-col gap-3">
      <legend className="mb-2 font-display text-lg font-semibold text-ink-900">{title}</legend>
      <div className="grid gap-4 sm:grid-cols-2">
        {names.map((name) => (
          <LengthInput
            key={name}
            name={`measurements.${name}`}
            label={measurementHelp[name].label}
            hint={measurementHelp[name].howTo}
            value={draft.measurements[name] ?? ''}
            unit={unit}
            onChange={(text) => setMeasurement(name, text)}
            error={errors[`measurements.${name}`]}
          />
        ))}
      </div>
    </fieldset>
  );

  return (
    <div className="flex flex-col gap-6">
      <p className="text-sm text-ink-700">
        Lengths in {unitName} unless you type a unit: <span className="tabular-nums">2 1/2</span>, 2.5 in, 6.35 cm
        and 63.5 mm are all read. Leave a measurement blank if you have not taken it. {measuringCaution}
      </p>
      {group('Girths', girths)}
      {group('Lengths', lengths)}

      <fieldset className="flex min-w-0 flex-col gap-3">
        <legend className="mb-1 font-display text-lg font-semibold text-ink-900">Girths at other heights</legend>
        <p className="text-sm text-ink-700">{girthsAtHeightsWhy}</p>
        <p className="text-xs text-ink-500">{girthAtHeightHowTo}</p>
        {draft.girthRows.length > 0 && (
          <ul className="flex flex-col gap-3">
            {draft.girthRows.map((row, index) => {
              const rowLabel = `Height ${index + 1}`;
              return (
                <li
                  key={index}
                  aria-label={rowLabel}
                  className="grid items-start gap-3 rounded-md border border-calico-300 p-3 sm:grid-cols-[minmax(0,1fr)_auto_minmax(0,1fr)_auto]"
                >
                  <LengthInput
                    name={`girthsAtHeights.${index}.offset`}
                    label={`${rowLabel}: distance from the waist`}
                    value={row.distance}
                    unit={unit}
                    onChange={(text) => setRow(index, { ...row, distance: text })}
                    error={errors[`girthsAtHeights.${index}.offset`]}
                  />
                  <div className="flex flex-col gap-1">
                    <label htmlFor={`${id}-side-${index}`} className="text-sm font-semibold text-ink-900">
                      {rowLabel}: where
                    </label>
                    <select
                      id={`${id}-side-${index}`}
                      value={row.side}
                      onChange={(event) => setRow(index, { ...row, side: event.target.value === 'below' ? 'below' : 'above' })}
                      className={controlClasses(false)}
                    >
                      <option value="above">above the waist</option>
                      <option value="below">below the waist</option>
                    </select>
                  </div>
                  <LengthInput
                    name={`girthsAtHeights.${index}.girth`}
                    label={`${rowLabel}: girth there`}
                    value={row.girth}
                    unit={unit}
                    onChange={(text) => setRow(index, { ...row, girth: text })}
                    error={errors[`girthsAtHeights.${index}.girth`]}
                  />
                  <Button
                    variant="quiet"
                    className="self-end px-3 py-1.5"
                    aria-label={`Remove ${rowLabel.toLowerCase()}`}
                    onClick={() => onChange({ ...draft, girthRows: draft.girthRows.filter((_, i) => i !== index) })}
                  >
                    Remove
                  </Button>
                </li>
              );
            })}
          </ul>
        )}
        <FieldError>{errors.girthsAtHeights}</FieldError>
        <div>
          <Button
            variant="secondary"
            className="px-3 py-1.5"
            onClick={() => onChange({ ...draft, girthRows: [...draft.girthRows, { side: 'below', distance: '', girth: '' }] })}
          >
            Add a height
          </Button>
        </div>
      </fieldset>

      <div className="grid gap-4 sm:grid-cols-[auto_1fr]">
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-taken`} className="text-sm font-semibold text-ink-900">
            Taken on
          </label>
          <input
            id={`${id}-taken`}
            name="takenOn"
            type="date"
            max={todayIso()}
            value={draft.takenOn}
            onChange={(event) => onChange({ ...draft, takenOn: event.target.value })}
            aria-invalid={errors.takenOn ? true : undefined}
            aria-describedby={errors.takenOn ? `${id}-taken-error` : undefined}
            className={controlClasses(Boolean(errors.takenOn))}
          />
          <FieldError id={`${id}-taken-error`}>{errors.takenOn}</FieldError>
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-note`} className="text-sm font-semibold text-ink-900">
            Note (optional)
          </label>
          <input
            id={`${id}-note`}
            name="note"
            maxLength={MAX_NOTE_LENGTH}
            placeholder="For example: after the holidays, measured by a friend"
            value={draft.note}
            onChange={(event) => onChange({ ...draft, note: event.target.value })}
            aria-invalid={errors.note ? true : undefined}
            aria-describedby={errors.note ? `${id}-note-error` : undefined}
            className={controlClasses(Boolean(errors.note))}
          />
          <FieldError id={`${id}-note-error`}>{errors.note}</FieldError>
        </div>
      </div>
    </div>
  );
}
