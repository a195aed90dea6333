import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useId, useState, type FormEvent, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { FieldLabel } from '../../../components/ui/field-label';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../components/ui/use-form-errors';
import type { FieldErrors } from '../../../lib/form-errors';
import type { PaperId } from '../../../../geometry/print/paper';
import { formatLength, type LengthUnit } from '../../../../geometry/units';
import { useCreatePrint } from '../api/create-print';
import { usePrint } from '../api/get-print';
import type { PrintOptions } from '../api/schemas';
import {
  DEFAULT_MARGIN,
  LENGTH_LIMITS,
  lengthText,
  paperGroups,
  readPrintLength,
  type LengthInput,
} from '../print-options';
import { printKeys } from '../query-keys';
import { PrintHistory } from './print-history';
import { PrintStatus } from './print-status';

const BLENDED = '';

const selectClasses =
  'rounded-md border border-calico-400 bg-calico-50 px-3 py-2 text-base text-ink-900 focus:border-denim-600 focus:outline-none focus:ring-2 focus:ring-tape-400';

function SelectField({
  label,
  hint,
  value,
  onChange,
  name,
  children,
}: {
  label: string;
  hint?: string;
  value: string;
  onChange: (value: string) => void;
  name: string;
  children: ReactNode;
}) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <FieldLabel htmlFor={id} label={label} hint={hint} hintId={`${id}-hint`} />
      <select
        id={id}
        name={name}
        value={value}
        onChange={(event) => onChange(event.target.value)}
        aria-describedby={hint ? `${id}-hint` : undefined}
        className={selectClasses}
      >
        {children}
      </select>
    </div>
  );
}

/** The scale caution shown before every print: a wrongly scaled print ruins fabric. */
function PrintCaution() {
  return (
    <div
      role="note"
      aria-label="Before you print"
      className="flex items-start gap-3 rounded-md border border-tape-400 bg-tape-100 px-3.5 py-3 text-sm text-ink-900"
    >
      <svg viewBox="0 0 16 16" aria-hidden className="mt-0.5 size-5 shrink-0">
        <rect x="1.5" y="1.5" width="13" height="13" fill="none" stroke="#b1532e" strokeWidth="1.5" />
        <path d="M1.5 5.5h3M1.5 9.5h3M5.5 1.5v3M9.5 1.5v3" stroke="#b1532e" strokeWidth="1.2" />
      </svg>
      <p>
        <strong className="font-semibold">Print at 100 % (“actual size”),</strong> never “fit to
        page” or “shrink”. Then measure the test squares on the first page (1 in and 5 cm) with a
        ruler <strong className="font-semibold">before cutting or taping</strong>: if they are off,
        every piece is off, and cloth cut from them is lost.
      </p>
    </div>
  );
}

/**
 * Print a make's newest revision: the options (format, paper, orientation, margin and overlap in
 * the user's units, quarter turns, the size while pieces still carry several), the scale caution,
 * then the job's progress, its download link, page count and the empty pages left out; below,
 * the earlier prints of this make.
 */
export function PrintPanel({
  makeId,
  makeName,
  units,
  sizes = [],
  blended = false,
  showHistory = true,
}: {
  makeId: string;
  /** Printed on every page's label. */
  makeName: string;
  units: LengthUnit;
  /** The pattern's size names; with more than one, the panel asks which to print. */
  sizes?: readonly string[];
  /** True when the make's alterations blend sizes, so each piece has one outline left. */
  blended?: boolean;
  /** Show the earlier prints of this make under the panel. */
  showHistory?: boolean;
}) {
  const queryClient = useQueryClient();
  const [format, setFormat] = useState<PrintOptions['format']>('pdf');
  const [paper, setPaper] = useState<PaperId>(units === 'cm' ? 'a4' : 'letter');
  const [orientation, setOrientation] = useState<PrintOptions['orientation']>('auto');
  const [margin, setMargin] = useState<LengthInput>({ mm: DEFAULT_MARGIN });
  const [overlap, setOverlap] = useState<LengthInput>({ mm: 0 });
  const [allowRotate90, setAllowRotate90] = useState(false);
  const askSize = sizes.length > 1;
  const [size, setSize] = useState<string>(() => (blended || !askSize ? BLENDED : (sizes[0] ?? BLENDED)));
  const [jobId, setJobId] = useState<string | null>(null);


  const create = useCreatePrint({ onSuccess: (print) => setJobId(print.id) });
  const job = usePrint(jobId);
  const { formRef, errors, accept, onError } = useFormErrors(create.error);

  // A finished job changes the list of earlier prints.
  const finished = job.data?.status === 'done' || job.data?.status === 'failed';
  useEffect(() => {
    if (finished) void queryClient.invalidateQueries({ queryKey: printKeys.lists() });
  }, [finished, queryClient]);

  const tiled = paperGroups[0]!.papers.some((each) => each.id === paper);
  const unitWord = units === 'in' ? 'inches' : 'centimetres';

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const problems: FieldErrors = {};
    const marginMm = readPrintLength(margin, units, LENGTH_LIMITS.margin);
    const overlapMm = readPrintLength(overlap, units, LENGTH_LIMITS.overlap);
    if ('error' in marginMm) problems.margin = marginMm.error;
    if ('error' in overlapMm) problems.overlap = overlapMm.error;
    if (!accept(problems) || 'error' in marginMm || 'error' in overlapMm) return;
    const options: PrintOptions = {
      format,
      paper,
      orientation,
      margin: marginMm.mm,
      overlap: overlapMm.mm,
      allowRotate90,
      title: makeName.trim().slice(0, 80) || undefined,
      ...(size !== BLENDED ? { size } : {}),
    };
    setJobId(null);
    create.mutate({ makeId, options }, { onError });
  }

  const working = create.isPending || job.data?.status === 'queued' || job.data?.status === 'running';

  return (
    <div className="flex flex-col gap-6">
      <form ref={formRef} noValidate onSubmit={handleSubmit} className="flex flex-col gap-4" aria-label={`Print ${makeName}`}>
        <FormAlert>{errors.message}</FormAlert>
        <div className="grid gap-4 sm:grid-cols-2">
          <SelectField
            label="File"
            name="format"
            value={format}
            onChange={(value) => setFormat(value as PrintOptions['format'])}
            hint="PDF for printers; SVG is one true-scale drawing for programs that read it."
          >
            <option value="pdf">PDF</option>
            <option value="svg">SVG (one sheet)</option>
          </SelectField>
          <SelectField label="Paper" name="paper" value={paper} onChange={(value) => setPaper(value as PaperId)}>
            {paperGroups.map((group) => (
              <optgroup key={group.label} label={group.label}>
                {group.papers.map((each) => (
                  <option key={each.id} value={each.id}>
                    {each.label}
                  </option>
                ))}
              </optgroup>
            ))}
          </SelectField>
          <SelectField
            label="Orientation"
            name="orientation"
            value={orientation}
            onChange={(value) => setOrientation(value as PrintOptions['orientation'])}
          >
            <option value="auto">Whichever needs fewer pages</option>
            <option value="portrait">Portrait (upright)</option>
            <option value="landscape">Landscape (sideways)</option>
          </SelectField>
          {askSize && (
            <SelectField
              label="Size to print"
              name="size"
              value={size}
              onChange={setSize}
              hint={
                blended
                  ? 'Your alterations blend sizes, so each piece has one outline: print that.'
                  : 'The pieces still carry every size line; choose one, or blend sizes in the workspace first.'
              }
            >
              {blended && <option value={BLENDED}>The blended outline</option>}
              {sizes.map((each) => (
                <option key={each} value={each}>
                  Size {each}
                </option>
              ))}
            </SelectField>
          )}
          <TextField
            label="Margin"
            name="margin"
            inputMode="decimal"
            hint={`The edge strip your printer leaves blank, in ${unitWord} unless you add a unit; ${formatLength(DEFAULT_MARGIN, units)} suits most home printers.`}
            value={lengthText(margin, units)}
            onChange={(event) => setMargin({ text: event.target.value })}
            error={errors.fields.margin}
          />
          <TextField
            label="Overlap"
            name="overlap"
            inputMode="decimal"
            hint={
              tiled
                ? `Paper that neighbouring pages share, for gluing; 0 to butt them edge to edge (${unitWord}).`
                : 'Only used when pages are taped together.'
            }
            value={lengthText(overlap, units)}
            onChange={(event) => setOverlap({ text: event.target.value })}
            error={errors.fields.overlap}
          />
        </div>
        <label className="flex items-start gap-2 text-sm text-ink-900">
          <input
            type="checkbox"
            name="allowRotate90"
            checked={allowRotate90}
            onChange={(event) => setAllowRotate90(event.target.checked)}
            className="mt-0.5 size-4 accent-denim-600"
          />
          <span>
            <span className="font-semibold">Allow quarter turns</span>
            <span className="block text-ink-500">
              Pieces may be turned 90° to fit fewer pages; the grainline turns with them.
            </span>
          </span>
        </label>
        <PrintCaution />
        <div>
          <Button type="submit" pending={working} pendingLabel="Making the print…">
            Make the print
          </Button>
        </div>
      </form>
      {job.data && <PrintStatus job={job.data} />}
      {job.isError && <FormAlert>The progress of the print could not be read; it may still finish. See the list below.</FormAlert>}
      {showHistory && <PrintHistory makeId={makeId} />}
    </div>
  );
}

