import { useId, useRef, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { useErrorFocus } from '../../../components/ui/use-error-focus';
import type { LengthUnit } from '../../../../geometry/units';
import { isApiError } from '../../../lib/api-client';
import { cx } from '../../../lib/cx';
import {
  convertedWeight,
  fabricFieldErrors,
  readFabricDraft,
  shrinkageAdvice,
  shrinkageFromDraft,
  stretchFromDraft,
  type FabricDraft,
  type FabricFieldSlot,
  type FabricProperties,
  type FieldErrors,
  type ShrinkageDraft,
  type StretchDraft,
} from '../model';
import { FieldError } from '../../../components/ui/field-error';
import { FieldLabel } from '../../../components/ui/field-label';
import { LengthInput } from '../../../components/ui/length-input';

const controlClasses = (invalid: boolean) =>
  cx(
    'rounded-md border bg-calico-50 px-3 py-1.5 text-base tabular-nums text-ink-900 focus:border-denim-600 focus:outline-none focus:ring-2 focus:ring-tape-400',
    invalid ? 'border-madder-700' : 'border-calico-400',
  );

const percentText = (n: number | undefined) => (n === undefined || !Number.isFinite(n) ? null : `${Math.round(n * 10) / 10}`.replace('-', '−'));

type SlotErrors = Partial<Record<FabricFieldSlot | '_', string>>;

/** A number typed with a unit after it (percent, weight), with its error beside it. */
function NumberInput({
  label,
  hint,
  value,
  onChange,
  suffix,
  error,
  name,
}: {
  label: string;
  hint?: string;
  value: string;
  onChange: (text: string) => void;
  suffix: string;
  error?: string;
  name: string;
}) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <FieldLabel htmlFor={id} label={label} hint={hint} hintId={`${id}-hint`} />
      <div className="flex items-center gap-2">
        <input
          id={id}
          name={name}
          inputMode="decimal"
          autoComplete="off"
          value={value}
          onChange={(event) => onChange(event.target.value)}
          aria-invalid={error ? true : undefined}
          aria-describedby={[hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean).join(' ') || undefined}
          className={cx(controlClasses(Boolean(error)), 'w-28')}
        />
        <span className="text-sm text-ink-700">{suffix}</span>
      </div>
      <FieldError id={`${id}-error`}>{error}</FieldError>
    </div>
  );
}

/** "Hand test" or "percent", as two radio buttons. */
function HowChoice<T extends string>({
  legend,
  value,
  options,
  onChange,
}: {
  legend: string;
  value: T;
  options: { value: T; label: string }[];
  onChange: (value: T) => void;
}) {
  const name = useId();
  return (
    <div role="radiogroup" aria-label={legend} className="flex flex-wrap gap-4 text-sm">
      {options.map((option) => (
        <label key={option.value} className="flex items-center gap-1.5">
          <input
            type="radio"
            name={name}
            value={option.value}
            checked={value === option.value}
            onChange={() => onChange(option.value)}
            className="size-4 accent-denim-600"
          />
          {option.label}
        </label>
      ))}
    </div>
  );
}

/** A pair of lengths from a test (hand stretch or wash), or the percent typed straight in. */
type TestDraft<A extends string, B extends string> = { how: 'percent' | 'test'; percent: string } & Record<A | B, string>;

/**
 * One property given either as a percent or as a test's two lengths (stretch: relaxed and
 * stretched; shrinkage: before and after washing), with the percent the test gives shown live.
 */
function TestOrPercentFields<A extends string, B extends string>({
  fieldKey,
  title,
  hint,
  testName,
  first,
  second,
  percentHint,
  draft,
  onChange,
  unit,
  errors,
  result,
}: {
  fieldKey: FabricFieldSlot;
  title: string;
  hint?: string;
  testName: string;
  first: { key: A; label: string };
  second: { key: B; label: string };
  percentHint?: string;
  draft: TestDraft<A, B>;
  onChange: (draft: TestDraft<A, B>) => void;
  unit: LengthUnit;
  errors: SlotErrors;
  /** What the test gives, in words, or null while it does not read. */
  result: string | null;
}) {
  const lengthInput = ({ key, label }: { key: A | B; label: string }) => (
    <LengthInput
      name={`${fieldKey}.${key}`}
      label={`${title}: ${label}`}
      value={draft[key]}
      unit={unit}
      onChange={(value) => onChange({ ...draft, [key]: value })}
      error={errors[`${fieldKey}.${key}` as FabricFieldSlot]}
    />
  );
  return (
    <fieldset className="flex min-w-0 flex-col gap-3 rounded-md border border-calico-300 p-4">
      <legend className="px-1 font-semibold text-ink-900">{title}</legend>
      {hint && <p className="text-xs text-ink-500">{hint}</p>}
      <HowChoice
        legend={`${title}: how it is given`}
        value={draft.how}
        options={[
          { value: 'test', label: testName },
          { value: 'percent', label: 'Percent' },
        ]}
        onChange={(how) => onChange({ ...draft, how })}
      />
      {draft.how === 'test' ? (
        <div className="grid gap-3 sm:grid-cols-2">
          {lengthInput(first)}
          {lengthInput(second)}
        </div>
      ) : (
        <NumberInput
          name={fieldKey}
          label={`${title} (%)`}
          {...(percentHint ? { hint: percentHint } : {})}
          value={draft.percent}
          onChange={(percent) => onChange({ ...draft, percent })}
          suffix="%"
          error={errors[fieldKey]}
        />
      )}
      {draft.how === 'test' && <FieldError>{errors[fieldKey]}</FieldError>}
      {draft.how === 'test' && result !== null && (
        <p role="status" className="text-sm font-semibold text-denim-700">
          {title}: {result}
        </p>
      )}
    </fieldset>
  );
}

function StretchFields({
  side,
  title,
  hint,
  draft,
  onChange,
  unit,
  errors,
}: {
  side: 'stretchAcross' | 'stretchAlong';
  title: string;
  hint: string;
  draft: StretchDraft;
  onChange: (draft: StretchDraft) => void;
  unit: LengthUnit;
  errors: SlotErrors;
}) {
  const result = percentText(stretchFromDraft(draft, unit));
  return (
    <TestOrPercentFields
      fieldKey={`properties.${side}`}
      title={title}
      hint={hint}
      testName="Hand test"
      first={{ key: 'relaxed', label: 'relaxed length' }}
      second={{ key: 'stretched', label: 'stretched length' }}
      draft={draft}
      onChange={onChange}
      unit={unit}
      errors={errors}
      result={result === null ? null : `${result} %`}
    />
  );
}

function ShrinkageFields({
  grain,
  title,
  draft,
  onChange,
  unit,
  errors,
}: {
  grain: 'warp' | 'weft';
  title: string;
  draft: ShrinkageDraft;
  onChange: (draft: ShrinkageDraft) => void;
  unit: LengthUnit;
  errors: SlotErrors;
}) {
  const result = percentText(shrinkageFromDraft(draft, unit));
  return (
    <TestOrPercentFields
      fieldKey={`properties.shrinkage.${grain}`}
      title={title}
      testName="Wash test"
      first={{ key: 'before', label: 'before washing' }}
      second={{ key: 'after', label: 'after washing' }}
      percentHint="+ shrinks, − grows."
      draft={draft}
      onChange={onChange}
      unit={unit}
      errors={errors}
      result={result === null ? null : `${result} % ${Number(result.replace('−', '-')) < 0 ? '(grew)' : ''}`}
    />
  );
}

/**
 * A fabric's record: name, stretch each way (percent or a hand test), recovery, weight in one
 * unit with the other shown converted, width, shrinkage each way (percent or a wash test) and
 * whether it is washed already, with what a fit plan will do about the shrinkage.
 */
export function FabricForm({
  unit,
  initialDraft,
  origin,
  save,
  pending,
  serverError,
  submitLabel,
  onCancel,
}: {
  unit: LengthUnit;
  initialDraft: FabricDraft;
  /** The fabric's properties as they were: unchanged lengths keep their exact millimetres. */
  origin?: FabricProperties;
  save: (value: { name: string; properties: FabricProperties }, callbacks: { onError: (error: unknown) => void }) => void;
  pending: boolean;
  serverError: unknown;
  submitLabel: string;
  onCancel?: () => void;
}) {
  const [draft, setDraft] = useState(initialDraft);
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const [failure, setFailure] = useState<unknown>(null);
  const formRef = useRef<HTMLFormElement>(null);
  useErrorFocus(formRef, failure);

  const fields: FieldErrors =
    Object.keys(clientErrors).length > 0 ? clientErrors : isApiError(serverError) ? serverError.fields : {};
  const errors = fabricFieldErrors(fields);
  const alert =
    Object.keys(clientErrors).length > 0
      ? 'Some fields need another look; see the notes beside them.'
      : serverError
        ? [isApiError(serverError) ? serverError.message : 'Something went wrong. Please try again.', errors._].filter(Boolean).join(' ')
        : null;

  const set = <K extends keyof FabricDraft>(key: K, value: FabricDraft[K]) => setDraft((d) => ({ ...d, [key]: value }));
  const advice = shrinkageAdvice(shrinkageFromDraft(draft.warp, unit), shrinkageFromDraft(draft.weft, unit), draft.prewashed);
  const converted = convertedWeight(draft);
  const weightId = useId();

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const read = readFabricDraft(draft, unit, origin);
    if ('errors' in read) {
      setClientErrors(read.errors);
      setFailure({});
      return;
    }
    setClientErrors({});
    save(read.value, { onError: setFailure });
  }

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="flex flex-col gap-5">
      <FormAlert>{alert}</FormAlert>
      <TextField
        label="Fabric name"
        hint="What you call it: “Indigo stretch denim, 12 oz”."
        name="name"
        value={draft.name}
        onChange={(event) => set('name', event.target.value)}
        error={errors.name}
      />

      <div className="flex flex-col gap-2">
        <h3 className="font-display text-lg font-semibold">Stretch</h3>
        <p className="text-sm text-ink-700">
          Hand test: fold the cloth, hold a length between your hands (10 cm or 4 in is handy), pull until it resists
          firmly, and read the new length. Stretch = (stretched − relaxed) / relaxed.
        </p>
        <div className="grid gap-4 lg:grid-cols-2">
          <StretchFields
            side="stretchAcross"
            title="Stretch across"
            hint="Across the grain (weft), selvage to selvage: what girths can borrow."
            draft={draft.stretchAcross}
            onChange={(d) => set('stretchAcross', d)}
            unit={unit}
            errors={errors}
          />
          <StretchFields
            side="stretchAlong"
            title="Stretch along"
            hint="Along the grain (warp), parallel to the selvage."
            draft={draft.stretchAlong}
            onChange={(d) => set('stretchAlong', d)}
            unit={unit}
            errors={errors}
          />
        </div>
        <NumberInput
          name="properties.recovery"
          label="Recovery"
          hint="How far it springs back after stretching: 100 % = all the way. Leave blank if you do not know."
          value={draft.recovery}
          onChange={(text) => set('recovery', text)}
          suffix="%"
          error={errors['properties.recovery']}
        />
      </div>

      <div className="grid gap-4 sm:grid-cols-2">
        <div className="flex flex-col gap-1">
          <label htmlFor={weightId} className="text-sm font-semibold text-ink-900">
            Weight
          </label>
          <p className="text-xs text-ink-500">Mass per area. Type it in either unit; the other is worked out.</p>
          <div className="flex items-center gap-2">
            <input
              id={weightId}
              name="properties.weight"
              inputMode="decimal"
              autoComplete="off"
              value={draft.weight}
              onChange={(event) => set('weight', event.target.value)}
              aria-invalid={errors['properties.weight'] ? true : undefined}
              className={cx(controlClasses(Boolean(errors['properties.weight'])), 'w-28')}
            />
            <select
              aria-label="Weight unit"
              value={draft.weightUnit}
              onChange={(event) => set('weightUnit', event.target.value === 'oz' ? 'oz' : 'gsm')}
              className={controlClasses(false)}
            >
              <option value="gsm">g/m²</option>
              <option value="oz">oz/yd²</option>
            </select>
          </div>
          {converted && (
            <p role="status" className="text-sm font-semibold text-denim-700">
              = {converted}
            </p>
          )}
          <FieldError>{errors['properties.weight']}</FieldError>
        </div>
        <LengthInput
          name="properties.width"
          label="Width"
          hint="The usable width, selvage to selvage."
          value={draft.width}
          unit={unit}
          onChange={(text) => set('width', text)}
          error={errors['properties.width']}
        />
      </div>

      <div className="flex flex-col gap-2">
        <h3 className="font-display text-lg font-semibold">Shrinkage</h3>
        <p className="text-sm text-ink-700">
          Wash test: mark two points on a large swatch (at least 35 cm or 14 in apart, well away from the edges), wash and
          dry it the way the garment will be washed, and measure again. Shrinkage = (before − after) / before.
        </p>
        <div className="grid gap-4 lg:grid-cols-2">
          <ShrinkageFields grain="warp" title="Along the warp" draft={draft.warp} onChange={(d) => set('warp', d)} unit={unit} errors={errors} />
          <ShrinkageFields grain="weft" title="Across the weft" draft={draft.weft} onChange={(d) => set('weft', d)} unit={unit} errors={errors} />
        </div>
        <FieldError>{errors['properties.shrinkage']}</FieldError>
        <label className="flex items-start gap-2 text-sm">
          <input
            type="checkbox"
            name="properties.prewashed"
            checked={draft.prewashed}
            onChange={(event) => set('prewashed', event.target.checked)}
            className="mt-0.5 size-4 accent-denim-600"
          />
          <span>
            <span className="font-semibold text-ink-900">Washed already</span>
            <span className="block text-ink-500">The cloth has been washed the way the garment will be.</span>
          </span>
        </label>
        <FieldError>{errors['properties.prewashed']}</FieldError>
        <p
          aria-label="What a plan does about shrinkage"
          className={cx(
            'rounded-md border px-3.5 py-2.5 text-sm',
            advice.kind === 'prewash' ? 'border-chalk-600/50 bg-chalk-100 text-ink-900' : 'border-tape-400 bg-tape-100 text-ink-900',
          )}
        >
          {advice.text}
        </p>
      </div>

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

