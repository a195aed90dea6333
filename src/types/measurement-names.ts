/**
 * Body measurements in millimetres, by their ISO 8559-1 names: the server's profile keys
 * (geometry/fit/body.ts BODY_MEASUREMENT_NAMES). A copy shared by the makes and profiles
 * features, so light pages do not load the engine; tests/geometry/fit-body.test.ts checks it
 * against geometry's list.
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
