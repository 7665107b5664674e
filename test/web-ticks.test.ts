import { describe, expect, it } from 'vitest';
import { narrowLogTicks, yTickLabels } from '../web/charts/y-tick-labels';

describe('the page\'s y-axis tick labels', () => {
  it('use one number format per linear axis (no 0.001 beside 1e-4)', () => {
    expect(yTickLabels([0, 2e-4, 4e-4, 6e-4, 8e-4, 1e-3], false)).toEqual(['0', '2.0e-4', '4.0e-4', '6.0e-4', '8.0e-4', '1.0e-3']);
    expect(yTickLabels([0, 0.05, 0.1, 0.15], false)).toEqual(['0.00', '0.05', '0.10', '0.15']);
  });

  it('label a log axis over a narrow range inside one decade at every tick', () => {
    const labels = yTickLabels([0.0041, 0.0042, 0.0043, 0.0044], true);
    expect(labels.every((l) => l !== '')).toBe(true);
    expect(labels[0]).toBe('0.0041');
  });

  it('keep 1-2-5 labels on a log axis over decades, all in exponent notation when some need it', () => {
    const values = [1e-4, 2e-4, 3e-4, 5e-4, 1e-3, 2e-3, 3e-3, 5e-3, 1e-2];
    expect(yTickLabels(values, true).filter((l) => l !== '')).toEqual(['1e-4', '2e-4', '5e-4', '1e-3', '2e-3', '5e-3', '1e-2']);
  });

  it('give a log axis inside one decade round, evenly spaced ticks with distinct labels', () => {
    // The calibration chart's lengths: 1σ from 0.0158 m to 0.0196 m on a log scale.
    const values = narrowLogTicks(0.0158, 0.0196)!;
    expect(values.length).toBeGreaterThanOrEqual(2);
    expect(values.every((v) => v >= 0.0158 && v <= 0.0196)).toBe(true);
    const labels = yTickLabels(values, true);
    expect(new Set(labels).size).toBe(labels.length);
    expect(labels.map(Number)).toEqual(values);
    expect(narrowLogTicks(1, 100)).toBeUndefined();
    expect(narrowLogTicks(0, 1)).toBeUndefined();
  });
});
