/** Tolerance assertions for geometry tests: never exact equality on floats. */
import { expect } from 'vitest';
import type { Point } from '../../geometry/index.ts';

export function expectNear(actual: number, expected: number, tolerance: number, label = ''): void {
  const diff = Math.abs(actual - expected);
  if (!(diff <= tolerance)) {
    expect.fail(`${label ? label + ': ' : ''}expected ${expected} ± ${tolerance}, got ${actual} (off by ${diff})`);
  }
}

export function expectPointNear(actual: Point, expected: Point, tolerance: number, label = ''): void {
  const d = Math.hypot(actual.x - expected.x, actual.y - expected.y);
  if (!(d <= tolerance)) {
    expect.fail(
      `${label ? label + ': ' : ''}expected (${expected.x}, ${expected.y}) ± ${tolerance}, got (${actual.x}, ${actual.y}) (off by ${d})`,
    );
  }
}

export function expectRelNear(actual: number, expected: number, relative: number, label = ''): void {
  expectNear(actual, expected, Math.abs(expected) * relative, label);
}
