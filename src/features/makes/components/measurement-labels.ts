import type { MeasurementName } from '../api/get-profiles';

/** How the ISO 8559-1 body measurements are named on screen. */
export const measurementLabels: Record<MeasurementName, string> = {
  waistGirth: 'Waist girth',
  hipGirth: 'Hip girth',
  thighGirth: 'Thigh girth',
  kneeGirth: 'Knee girth',
  calfGirth: 'Calf girth',
  ankleGirth: 'Ankle girth',
  bodyRise: 'Body rise',
  totalCrotchLength: 'Total crotch length',
  insideLegLength: 'Inside leg length',
  outsideLegLength: 'Outside leg length',
  height: 'Height',
};

/** The few a new profile asks for here; the fit planner will take the rest. */
export const quickMeasurements: readonly MeasurementName[] = [
  'waistGirth',
  'hipGirth',
  'thighGirth',
  'bodyRise',
  'insideLegLength',
];
