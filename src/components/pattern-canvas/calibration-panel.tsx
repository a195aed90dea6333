import { useId, useRef, useState, type PointerEvent } from 'react';
import { formatLengthParts, LengthParseError, parseLength, type LengthUnit } from '../../../geometry/index.ts';
import { Button } from '../ui/button';
import { FormAlert } from '../ui/form-alert';
import {
  barPxFor,
  CARD_WIDTH_MM,
  clearCalibration,
  MAX_PX_PER_MM,
  MIN_PX_PER_MM,
  pxPerMmFromBar,
  readCalibration,
  saveCalibration,
  type Calibration,
  type CalibrationStorage,
} from './calibration.ts';

/** Web storage when the browser allows it (it may throw in private modes). */
function browserStorage(): CalibrationStorage | undefined {
  try {
    return window.localStorage;
  } catch {
    return undefined;
  }
}

/** The calibration stored in this browser (the 96 px per inch default when there is none). */
export function useCalibration(): [Calibration, (c: Calibration) => void] {
  const [calibration, setCalibration] = useState(() => readCalibration(browserStorage()));
  return [calibration, setCalibration];
}

type Reference = 'card' | 'ruler';

/**
 * True-scale set-up: hold a bank card (85.60 mm wide, ISO/IEC 7810 ID-1) or a ruler against the
 * screen and widen or narrow the bar until its ends meet the object's. Saves CSS px per mm in
 * localStorage (`blockwright.pxPerMm`).
 */
export function CalibrationPanel({
  unit,
  onChange,
}: {
  /** The unit for the ruler length and what is shown. */
  unit: LengthUnit;
  /** Called with the saved (or cleared) calibration. */
  onChange?: (calibration: Calibration) => void;
}) {
  const id = useId();
  const [stored, setStored] = useState(() => readCalibration(browserStorage()));
  const [reference, setReference] = useState<Reference>('card');
  const [rulerText, setRulerText] = useState(unit === 'in' ? '4 in' : '10 cm');
  const [barPx, setBarPx] = useState(() => barPxFor(CARD_WIDTH_MM, stored.pxPerMm));
  const [error, setError] = useState<string | null>(null);
  const drag = useRef<{ pointerId: number; startX: number; startWidth: number } | null>(null);

  let knownMm: number | null = CARD_WIDTH_MM;
  let rulerError: string | undefined;
  if (reference === 'ruler') {
    try {
      knownMm = parseLength(rulerText, unit);
      if (knownMm <= 0) throw new LengthParseError('the length must be more than zero', rulerText);
    } catch (e) {
      knownMm = null;
      rulerError = e instanceof LengthParseError ? e.message : 'not a length';
    }
  }
  const minBar = knownMm ? knownMm * MIN_PX_PER_MM : 20;
  const maxBar = knownMm ? knownMm * MAX_PX_PER_MM : 2000;
  const shownBar = Math.min(maxBar, Math.max(minBar, barPx));

  const pickReference = (r: Reference, mm: number | null) => {
    setReference(r);
    // keep the current scale: the bar takes the new object's width at the same px per mm
    if (mm && knownMm) setBarPx((shownBar / knownMm) * mm);
  };

  const save = () => {
    setError(null);
    if (!knownMm) return;
    try {
      const c = saveCalibration(browserStorage() ?? failStorage(), pxPerMmFromBar(shownBar, knownMm));
      setStored(c);
      onChange?.(c);
    } catch (e) {
      setError(e instanceof Error ? e.message : 'The calibration could not be saved.');
    }
  };

  const reset = () => {
    setError(null);
    const storage = browserStorage();
    const c = storage ? clearCalibration(storage) : readCalibration(undefined);
    setStored(c);
    if (knownMm) setBarPx(barPxFor(knownMm, c.pxPerMm));
    onChange?.(c);
  };

  const onBarDown = (e: PointerEvent<HTMLDivElement>) => {
    drag.current = { pointerId: e.pointerId, startX: e.clientX, startWidth: shownBar };
    e.currentTarget.setPointerCapture(e.pointerId);
  };
  const onBarMove = (e: PointerEvent<HTMLDivElement>) => {
    const d = drag.current;
    if (d && d.pointerId === e.pointerId) setBarPx(d.startWidth + e.clientX - d.startX);
  };

  return (
    <div className="flex flex-col gap-4">
      <fieldset className="flex flex-wrap gap-x-6 gap-y-2">
        <legend className="mb-1 text-sm font-semibold text-ink-900">Hold against the screen</legend>
        <label className="flex items-center gap-2 text-sm">
          <input type="radio" name={`${id}-ref`} checked={reference === 'card'} onChange={() => pickReference('card', CARD_WIDTH_MM)} />
          A bank card, long side (85.60 mm)
        </label>
        <label className="flex items-center gap-2 text-sm">
          <input
            type="radio"
            name={`${id}-ref`}
            checked={reference === 'ruler'}
            onChange={() => pickReference('ruler', tryParseLength(rulerText, unit))}
          />
          A ruler
        </label>
      </fieldset>
      {reference === 'ruler' && (
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-len`} className="text-sm font-semibold text-ink-900">
            Length on the ruler
          </label>
          <input
            id={`${id}-len`}
            value={rulerText}
            onChange={(e) => setRulerText(e.target.value)}
            aria-invalid={rulerError ? true : undefined}
            aria-describedby={rulerError ? `${id}-len-error` : undefined}
            className="w-40 rounded-md border border-calico-400 bg-calico-50 px-3 py-2 text-base focus:border-denim-600 focus:ring-2 focus:ring-tape-400 focus:outline-none"
          />
          {rulerError && (
            <p id={`${id}-len-error`} className="text-sm font-medium text-madder-700">
              {rulerError}
            </p>
          )}
        </div>
      )}
      <div className="overflow-x-auto py-2">
        <div
          role="presentation"
          onPointerDown={onBarDown}
          onPointerMove={onBarMove}
          onPointerUp={() => (drag.current = null)}
          onPointerCancel={() => (drag.current = null)}
          className="relative h-10 cursor-ew-resize touch-none border-x-2 border-ink-900 bg-denim-100"
          style={{ width: `${shownBar}px` }}
        >
          <span className="absolute inset-y-0 right-0 w-3 bg-denim-600" aria-hidden />
        </div>
      </div>
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-bar`} className="text-sm font-semibold text-ink-900">
            Bar width (screen px)
          </label>
          <input
            id={`${id}-bar`}
            type="range"
            min={minBar}
            max={maxBar}
            step={0.25}
            value={shownBar}
            disabled={!knownMm}
            onChange={(e) => setBarPx(Number(e.target.value))}
            className="w-64 accent-denim-600"
          />
        </div>
        <Button variant="secondary" disabled={!knownMm} onClick={() => setBarPx(shownBar - 0.25)}>
          Narrower
        </Button>
        <Button variant="secondary" disabled={!knownMm} onClick={() => setBarPx(shownBar + 0.25)}>
          Wider
        </Button>
      </div>
      <p className="text-sm text-ink-700" aria-live="polite">
        {knownMm
          ? `The bar is ${shownBar.toFixed(2)} px for ${knownText(knownMm, unit)}: ${(shownBar / knownMm).toFixed(3)} px per mm.`
          : 'Enter the length on the ruler to size the bar.'}
      </p>
      <div className="flex flex-wrap gap-3">
        <Button onClick={save} disabled={!knownMm}>
          Save calibration
        </Button>
        <Button variant="quiet" onClick={reset}>
          Forget calibration
        </Button>
      </div>
      <FormAlert>{error}</FormAlert>
      {stored.calibrated ? (
        <p className="text-sm text-sage-700">
          Calibrated on this browser: {stored.pxPerMm.toFixed(3)} px per mm. Calibrate again after changing the screen, its resolution or the browser zoom.
        </p>
      ) : (
        <p className="text-sm font-medium text-chalk-700">
          Not calibrated: the view assumes 96 px per inch (the CSS reference), which few screens show at
          that size. Views are true scale only after calibration; check a measurement with a ruler before
          relying on it.
        </p>
      )}
    </div>
  );
}

/** The known width as typed units, with its millimetres when the rounding hides some. */
function knownText(mm: number, unit: LengthUnit): string {
  const shown = formatLengthParts(mm, unit);
  return shown.exact ? shown.text : `${Number(mm.toFixed(2))} mm (about ${shown.text})`;
}

function tryParseLength(text: string, unit: LengthUnit): number | null {
  try {
    return parseLength(text, unit);
  } catch {
    return null;
  }
}

function failStorage(): CalibrationStorage {
  const fail = () => {
    throw new Error('This browser does not let Blockwright keep the calibration (storage is blocked).');
  };
  return { getItem: () => null, setItem: fail, removeItem: fail };
}
