/** Shared numeric assertions for the Allan and calibration tests. Not a test file itself. */
import { expect } from 'vitest';

/** Expects |actual − expected| ≤ relTol·|expected|, printing both numbers on failure. */
export function expectRelative(actual: number, expected: number, relTol: number): void {
  expect(Math.abs(actual - expected), `${actual} vs ${expected} (relative tolerance ${relTol})`).toBeLessThanOrEqual(relTol * Math.abs(expected));
}

/** Expects |actual − expected| ≤ absTol, printing both numbers on failure. */
export function expectAbsolute(actual: number, expected: number, absTol: number): void {
  expect(Math.abs(actual - expected), `${actual} vs ${expected} (absolute tolerance ${absTol})`).toBeLessThanOrEqual(absTol);
}
