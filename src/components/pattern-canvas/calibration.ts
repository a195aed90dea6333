/**
 * True-scale calibration: how many CSS px make a millimetre on this screen. The user holds an
 * object of known width against the screen and adjusts an on-screen bar until it matches;
 * pxPerMm = bar width (CSS px) / known width (mm). Pure helpers; storage is passed in.
 */

/** ISO/IEC 7810 ID-1 (bank and identity cards): 85.60 mm × 53.98 mm. */
export const CARD_WIDTH_MM = 85.6;

/**
 * Without calibration: CSS Values and Units Level 3 §5.2 fixes 1in = 96px, i.e. 96 / 25.4 px
 * per mm. Browsers keep that ratio in CSS px, but a CSS px is not a fixed size on screen, so
 * this default is not true scale.
 */
export const DEFAULT_PX_PER_MM = 96 / 25.4;

/** localStorage key holding the calibrated CSS px per mm. */
export const PX_PER_MM_STORAGE_KEY = 'blockwright.pxPerMm';

/**
 * Plausible range (CSS px per mm): 1 ≈ 25 px per inch, 20 ≈ 500 px per inch. Anything outside
 * is a mistake (a bar matched to the wrong object), not a screen.
 */
export const MIN_PX_PER_MM = 1;
export const MAX_PX_PER_MM = 20;

/** The part of Web Storage used here (so tests can pass a map). */
export interface CalibrationStorage {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

export interface Calibration {
  pxPerMm: number;
  /** False when `pxPerMm` is the 96 px/in default: the view is then not true scale. */
  calibrated: boolean;
}

export function isPlausiblePxPerMm(value: number): boolean {
  return Number.isFinite(value) && value >= MIN_PX_PER_MM && value <= MAX_PX_PER_MM;
}

/** CSS px per mm from a bar `barPx` wide matched to an object `knownMm` wide. Throws RangeError for an implausible result. */
export function pxPerMmFromBar(barPx: number, knownMm: number): number {
  if (!(knownMm > 0) || !Number.isFinite(knownMm)) throw new RangeError('the known width must be a positive length');
  const value = barPx / knownMm;
  if (!isPlausiblePxPerMm(value))
    throw new RangeError(`a ${barPx.toFixed(1)} px bar for ${knownMm} mm gives ${value.toFixed(2)} px per mm, outside ${MIN_PX_PER_MM}–${MAX_PX_PER_MM}: check the bar and the object`);
  return value;
}

/** The bar width (CSS px) that shows `knownMm` at `pxPerMm`. */
export function barPxFor(knownMm: number, pxPerMm: number): number {
  return knownMm * pxPerMm;
}

/** Dots per inch equivalent of a px-per-mm value (for showing: 96 dpi ≈ 3.78 px/mm). */
export function pxPerInch(pxPerMm: number): number {
  return pxPerMm * 25.4;
}

/** The stored calibration, or the default when none is stored or the stored value is unreadable or implausible. */
export function readCalibration(storage: CalibrationStorage | undefined): Calibration {
  const uncalibrated = { pxPerMm: DEFAULT_PX_PER_MM, calibrated: false };
  let raw: string | null;
  try {
    raw = storage?.getItem(PX_PER_MM_STORAGE_KEY) ?? null;
  } catch {
    return uncalibrated; // storage blocked (privacy settings)
  }
  const value = raw === null || raw.trim() === '' ? NaN : Number(raw);
  return isPlausiblePxPerMm(value) ? { pxPerMm: value, calibrated: true } : uncalibrated;
}

/** Store a calibration. Throws RangeError for an implausible value (nothing is stored then). */
export function saveCalibration(storage: CalibrationStorage, pxPerMm: number): Calibration {
  if (!isPlausiblePxPerMm(pxPerMm)) throw new RangeError(`${pxPerMm} px per mm is outside ${MIN_PX_PER_MM}–${MAX_PX_PER_MM}`);
  storage.setItem(PX_PER_MM_STORAGE_KEY, String(pxPerMm));
  return { pxPerMm, calibrated: true };
}

export function clearCalibration(storage: CalibrationStorage): Calibration {
  storage.removeItem(PX_PER_MM_STORAGE_KEY);
  return { pxPerMm: DEFAULT_PX_PER_MM, calibrated: false };
}
