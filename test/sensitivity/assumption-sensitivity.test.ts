import { describe, expect, it } from 'vitest';
import { assumptionSensitivity } from '../../src/sensitivity/assumption-sensitivity';
import { budget, gyro, q, straightMission } from '../fixtures/small-budgets';

// A gyro alone, no aiding: heading variance = N² t (angle random walk, IEEE Std 952 / docs/checks.md §4)
// plus (b t)² for a turn-on bias b, so scaling a row's magnitude by s scales its part of the heading sigma by s.
describe('sensitivity of the assumptions', () => {
  const input = budget(straightMission(100, 0), [
    gyro([
      { id: 'arw', kind: 'white-noise', value: q(0.6, 'deg/√h'), assumed: true },
      { id: 'bias', kind: 'turn-on-bias', value: q(10, 'deg/h'), assumed: true },
      { id: 'sure', kind: 'white-noise', value: q(0.1, 'deg/√h') },
    ]),
  ], 1, { requirements: [{ id: 'head', quantity: 'heading', level: '1sigma', limit: q(5, 'deg') }] });
  const table = assumptionSensitivity(input);
  const heading = (arwDegRtH: number, biasDegH: number) => Math.sqrt((arwDegRtH / 60) ** 2 * 100 + (0.1 / 60) ** 2 * 100 + ((biasDegH / 3600) * 100) ** 2);

  it('varies the assumed rows only, and ranks them by the change they cause, largest first', () => {
    expect(table.map((e) => e.target)).toEqual(['gyro.bias', 'gyro.arw']);
  });

  it('gives the worst heading at ×0.5 and ×2 as the closed form does (1e-9 relative)', () => {
    const arw = table.find((e) => e.target === 'gyro.arw')!;
    expect(Math.abs(arw.baseWorst / heading(0.6, 10) - 1)).toBeLessThan(1e-9);
    for (const { scale, worst } of arw.byScale) expect(Math.abs(worst / heading(0.6 * scale, 10) - 1)).toBeLessThan(1e-9);
    expect(arw.change).toBeCloseTo(heading(1.2, 10) - heading(0.6, 10), 9);
  });

  it('takes extra rows and a range from the user, and names an unknown row', () => {
    const picked = assumptionSensitivity(input, { rows: ['gyro.sure'], range: [0.9, 1.1] });
    expect(picked.map((e) => e.target).sort()).toEqual(['gyro.arw', 'gyro.bias', 'gyro.sure']);
    expect(Math.min(...picked[0].byScale.map((s) => s.scale))).toBe(0.9);
    expect(() => assumptionSensitivity(input, { rows: ['gyro.nope'] })).toThrow(/--rows: no row "gyro.nope"/);
  });
});
