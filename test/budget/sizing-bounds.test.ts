import { describe, expect, it } from 'vitest';
import { requirementsWith, sizeSource } from '../../src/budget/sizing';
import { sweepRow, sweepValues } from '../../src/budget/row-sweep';
import { formatToTolerance } from '../../src/report/tolerance-text';
import { budget, gyro, q, straightMission, wheel } from '../fixtures/small-budgets';
import { runCli } from '../cli/run-cli';

// A gyro with white noise, bias instability and a turn-on bias under a heading limit
// (invented numbers); heading σ grows with each (docs/planar-model.md §9: the covariance
// never decreases when a noise magnitude grows, so each row has one largest passing value).
function suite() {
  return budget(straightMission(300, 1), [gyro([
    { id: 'arw', kind: 'white-noise', value: q(0.1, 'deg/√h') },
    { id: 'bi', kind: 'bias-instability', value: q(3, 'deg/h'), correlationTime: q(100, 's') },
    { id: 'bias', kind: 'turn-on-bias', value: q(2, 'deg/h') },
  ]), wheel()], 1, {
    requirements: [
      { id: 'tight', quantity: 'heading', level: '1sigma', limit: q(0.45, 'deg') },
      { id: 'loose', quantity: 'heading', level: '95%', limit: q(1, 'deg') },
    ],
  });
}

const verdictOf = (input: ReturnType<typeof suite>, row: string, value: number, req: string) =>
  requirementsWith(input, row, value).find((r) => r.id === req)!.verdict;

describe('each sized value', () => {
  for (const row of ['gyro.arw', 'gyro.bi', 'gyro.bias']) {
    for (const req of ['tight', 'loose']) {
      it(`holds at the largest passing ${row} for ${req} and fails just above it (within the tolerance)`, () => {
        const input = suite();
        const r = sizeSource(input, req, row, { relativeTolerance: 1e-3 });
        expect(r.outcome).toBe('bounded');
        expect(verdictOf(input, row, r.largestPassing, req)).toBe('pass');
        expect(verdictOf(input, row, r.largestPassing + 2 * r.tolerance, req)).toBe('fail');
        expect(2 * r.tolerance).toBeLessThanOrEqual(1e-3 * r.smallestFailing!);
      });
    }
  }
});

describe('the sweep of a row', () => {
  it('gives the worst value of each requirement at each value, never decreasing as the magnitude grows', () => {
    const input = suite();
    const values = sweepValues(0, 6, 7);
    const sweep = sweepRow(input, 'gyro.bi', values);
    expect(sweep.requirements.map((r) => r.id)).toEqual(['tight', 'loose']);
    expect(sweep.unit).toBe('deg/h');
    sweep.points.forEach((p, k) => {
      const direct = requirementsWith(input, 'gyro.bi', values[k]);
      expect(p.worst).toEqual(direct.map((r) => r.worstValue));
      if (k > 0) p.worst.forEach((w, i) => expect(w).toBeGreaterThanOrEqual(sweep.points[k - 1].worst[i]));
    });
  });

  it('changes verdict where sizing puts the largest passing value', () => {
    const input = suite();
    const sized = sizeSource(input, 'tight', 'gyro.bi');
    const sweep = sweepRow(input, 'gyro.bi', sweepValues(0, 2 * sized.largestPassing, 9), ['tight']);
    for (const p of sweep.points) expect(p.verdicts[0]).toBe(p.value <= sized.largestPassing ? 'pass' : 'fail');
  });

  it('refuses a bad range, naming the sweep', () => {
    expect(() => sweepValues(2, 1, 5)).toThrow(/sweep: needs 0 <= FROM < TO/);
    expect(() => sweepValues(0, 1, 1)).toThrow(/sweep: needs a whole number/);
  });
});

describe('sigma-ledger size on the command line', () => {
  it('prints the sized value to the tolerance\'s precision', async () => {
    const r = await runCli(['size', 'budgets/harbour-launch.json', '--requirement', 'bridgeHeading', '--vary', 'gyro.bi', '--tolerance', '0.001']);
    const json = JSON.parse((await runCli(['size', 'budgets/harbour-launch.json', '--requirement', 'bridgeHeading', '--vary', 'gyro.bi', '--json'])).out);
    const shown = formatToTolerance(json.largestPassing, json.tolerance);
    expect(r.out).toContain(`largest gyro.bi meeting bridgeHeading: ${shown.value} deg/h (± ${shown.tolerance} deg/h`);
    expect(Math.abs(Number(shown.value) - json.largestPassing)).toBeLessThanOrEqual(json.tolerance);
  }, 120_000);

  it('lists the rows that can be varied when --vary names none', async () => {
    const r = await runCli(['size', 'budgets/orchard-rover.json', '--requirement', 'heading', '--vary', 'gyro.nope']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('--vary: no row "gyro.nope"; give it as sensorId.rowId, one of: gyro.arw, gyro.bi, gyro.bias, gyro.sf, gyro.lsb, wheel.sf');
  });

  it('prints a sweep as CSV with units in the header, one line per value', async () => {
    const r = await runCli(['size', 'budgets/orchard-rover.json', '--vary', 'gyro.bi', '--requirement', 'heading', '--sweep', '0:8:3']);
    expect(r.code).toBe(0);
    const lines = r.out.trim().split('\n');
    expect(lines[0]).toBe('gyro.bi (deg/h),heading worst (deg),heading limit (deg),heading verdict');
    expect(lines.slice(1).map((l) => l.split(',')[0])).toEqual(['0', '4', '8']);
    expect(lines[2].split(',')[3]).toBe('pass'); // the file's own 4 deg/h passes (see its summary)
  }, 120_000);

  it('refuses a sweep that is not FROM:TO:N', async () => {
    const r = await runCli(['size', 'budgets/orchard-rover.json', '--vary', 'gyro.bi', '--sweep', '1:2']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('--sweep: must be FROM:TO:N');
  });
});

describe('printing to a tolerance', () => {
  it('shows the tolerance\'s first digit as the last digit', () => {
    expect(formatToTolerance(81.6751, 0.0375)).toEqual({ value: '81.68', tolerance: '0.04' });
    expect(formatToTolerance(42.6, 0.02)).toEqual({ value: '42.60', tolerance: '0.02' });
    expect(formatToTolerance(2345678, 1200)).toEqual({ value: '2.346e6', tolerance: '1000' });
  });
});
