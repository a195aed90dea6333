import type { MeasurementName } from '../../types/measurement-names';

/**
 * How each body measurement is named on screen and how to take it, in our own words. The
 * definitions follow ISO 8559-1 as the trade reference (§2.2) paraphrases it: the waist level,
 * hip level, right-side leg girths and seated body rise; where the reference has the definition
 * only from memory, the help says what sewists commonly do.
 */
export type MeasurementHelp = {
  label: string;
  /** One or two sentences: where the tape goes and how the person stands or sits. */
  howTo: string;
  kind: 'girth' | 'length';
};

export const measurementHelp: Record<MeasurementName, MeasurementHelp> = {
  waistGirth: {
    label: 'Waist girth',
    kind: 'girth',
    howTo:
      'Tape level all round at your natural waist: at the side, halfway between the lowest rib and the top of the hip bone, usually the narrowest part. Stand relaxed and breathe out normally; do not pull in.',
  },
  hipGirth: {
    label: 'Hip girth',
    kind: 'girth',
    howTo:
      'Tape level all round the fullest part of the seat, found by looking from the side. Feet together; check in a mirror that the tape has not dipped at the back.',
  },
  thighGirth: {
    label: 'Thigh girth',
    kind: 'girth',
    howTo:
      'Right leg, tape level round the widest part of the thigh, just below the fold under the seat. Stand with weight on both feet.',
  },
  kneeGirth: {
    label: 'Knee girth',
    kind: 'girth',
    howTo: 'Right leg, standing straight: tape level round the middle of the kneecap.',
  },
  calfGirth: {
    label: 'Calf girth',
    kind: 'girth',
    howTo: 'Right leg, standing: tape level round the fullest part of the calf; slide it up and down to find the largest reading.',
  },
  ankleGirth: {
    label: 'Ankle girth',
    kind: 'girth',
    howTo: 'Tape level round the narrowest part of the leg, just above the ankle bones.',
  },
  bodyRise: {
    label: 'Body rise',
    kind: 'length',
    howTo:
      'Sit upright on a hard, flat chair. At the side, measure straight down from your waist level to the chair seat (a ruler standing on the seat helps).',
  },
  totalCrotchLength: {
    label: 'Total crotch length',
    kind: 'length',
    howTo:
      'From the waist at the centre front, down between the legs and up to the waist at the centre back, tape following the body closely but not pressed in.',
  },
  insideLegLength: {
    label: 'Inside leg length',
    kind: 'length',
    howTo: 'Standing, feet a little apart, barefoot: from the crotch straight down the inside of the leg to the floor.',
  },
  outsideLegLength: {
    label: 'Outside leg length',
    kind: 'length',
    howTo: 'Standing, barefoot: from the waist level at the side, over the curve of the hip, straight down to the floor.',
  },
  height: {
    label: 'Height',
    kind: 'length',
    howTo: 'Barefoot, back to a wall, looking straight ahead: from the floor to the top of the head.',
  },
};

/** Why girths at other heights are asked for, in one line. */
export const girthsAtHeightsWhy =
  'A waistband rarely sits exactly at the natural waist: measure the body where a raised or lowered waistband will sit, so its girth is known rather than guessed.';

/** How to take a girth at a height. */
export const girthAtHeightHowTo =
  'Mark your natural waist at the side; measure up (above) or down (below) from it along the side, then take the girth there with the tape level all round.';

/** The standing caution next to measurements (product brief: guidance, not a guarantee). */
export const measuringCaution =
  'Measure over light clothing or none, with the tape snug but not tight, ideally with a helper. Sizes and fit suggestions made from these numbers are guidance, not a promise of fit.';
