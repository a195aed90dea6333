/**
 * Body measurements in millimetres, by their ISO 8559-1 names: the server's profile keys
 * (geometry/fit/body.ts BODY_MEASUREMENT_NAMES). A copy, because features do not import each
 * other and a light page does not load the engine; tests/client/profiles-model.test.ts checks it
 * against geometry's list and the makes feature's copy.
 */
export const MEASUREMENT_NAMES = [
  'waistGirth',
  'hipGirth',
  'thighGirth',
  'kneeGirth',
  'calfGirth',
  'ankleGirth',
  'bodyRise',
  'totalCrotchLength',
  'insideLegLength',
  'outsideLegLength',
  'height',
] as const;
export type MeasurementName = (typeof MEASUREMENT_NAMES)[number];
export type Measurements = Partial<Record<MeasurementName, number>>;
