/** Shared numeric assertion for the units tests. */
import { expect } from 'vitest';

/**
 * Expects |actual - expected| <= relTol · |expected| (absolute when expected is 0),
 * printing both numbers in full on failure.
 */
export function expectRelative(actual: number, expected: number, relTol: number): void {
  const error = Math.abs(actual - expected);
  const allowed = relTol * Math.abs(expected);
  expect(error, `${actual} vs ${expected} (relative tolerance ${relTol})`).toBeLessThanOrEqual(expected === 0 ? relTol : allowed);
}
