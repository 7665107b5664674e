/**
 * The commands of the command line on the example budgets: exit codes, the
 * JSON result's shape and sums, thinning, sizing, and usage errors.
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { hasStackTrace, runCli } from './run-cli';

const BUDGETS = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'budgets');
const HARBOUR = join(BUDGETS, 'harbour-launch.json');
const ORCHARD = join(BUDGETS, 'orchard-rover.json');
const TUG = join(BUDGETS, 'warehouse-tug.json');

/** Each quantity under `contributions` with the sigma series whose square its rows add up to. */
const SIGMA_SERIES: Record<string, string> = {
  heading: 'heading_sigma_deg', speed: 'speed_sigma_mps', north: 'north_sigma_m', east: 'east_sigma_m',
  drms: 'drms_m', along: 'along_sigma_m', cross: 'cross_sigma_m',
};

interface JsonResult {
  series: Record<string, number[]>;
  contributions: Record<string, Record<string, number[]>>;
  requirements: { id: string; verdict: string; margin: number; outages: { start_s: number; end_s: number; timeToExceed_s: number | null }[] }[];
  checkpoints: { id: string; t_s: number }[];
  mission: { record_every: number };
}

describe('run', () => {
  it('exits 0 on the harbour launch budget, whose requirements all hold', async () => {
    const r = await runCli(['run', HARBOUR]);
    expect(r.code).toBe(0);
    expect(r.out).toContain('REQUIREMENTS');
  });

  it('exits 1 on the orchard rover budget, one of whose requirements fails', async () => {
    const r = await runCli(['run', ORCHARD]);
    expect(r.code).toBe(1);
    expect(r.out).toContain('[FAIL]');
  });

  it('writes the summary to the file given with --output and nothing to stdout', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'sigma-ledger-output-'));
    try {
      const r = await runCli(['run', HARBOUR, '--output', join(dir, 'summary.txt')]);
      expect(r.code).toBe(0);
      expect(r.out).toBe('');
      expect(readFileSync(join(dir, 'summary.txt'), 'utf8')).toContain('REQUIREMENTS');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe('run --json', () => {
  let full: JsonResult;
  let thinned: JsonResult;

  beforeAll(async () => {
    const a = await runCli(['run', ORCHARD, '--json']);
    const b = await runCli(['run', ORCHARD, '--json', '--every', '10']);
    expect([a.code, b.code]).toEqual([1, 1]);
    full = JSON.parse(a.out);
    thinned = JSON.parse(b.out);
  }, 30_000);

  it('gives the time and every sigma series with one entry per step', () => {
    const n = full.series.t_s.length;
    expect(n).toBeGreaterThan(100);
    for (const key of Object.values(SIGMA_SERIES)) expect(full.series[key], key).toHaveLength(n);
  });

  it('gives contributions per source that add up to the square of the matching sigma', () => {
    for (const [quantity, key] of Object.entries(SIGMA_SERIES)) {
      const rows = Object.values(full.contributions[quantity] ?? {});
      expect(rows.length, quantity).toBeGreaterThan(0);
      full.series[key].forEach((sigma, k) => {
        const sum = rows.reduce((acc, row) => acc + row[k], 0);
        expect(Math.abs(sum - sigma * sigma), `${quantity} at step ${k}`).toBeLessThanOrEqual(1e-9 * sigma * sigma);
      });
      for (const row of rows) expect(row).toHaveLength(full.series.t_s.length);
    }
  });

  it('gives each requirement an id, a verdict, a margin and what happens in each outage', () => {
    // The orchard rover's cross-track requirement fails on purpose (README: it breaks 57 s into the 90 s
    // canopy outage); its heading requirement, 2 deg at 95 %, holds: the rover starts within 5 deg (1σ) but
    // the window opens at 60 s, after GNSS has observed the heading.
    expect(full.requirements.map((r) => [r.id, r.verdict])).toEqual([['alleyKeeping', 'fail'], ['heading', 'pass']]);
    for (const req of full.requirements) {
      expect(Math.sign(req.margin)).toBe(req.verdict === 'pass' ? 1 : -1);
      for (const o of req.outages) {
        expect(o.end_s).toBeGreaterThan(o.start_s);
        expect(o.timeToExceed_s === null || Number.isFinite(o.timeToExceed_s)).toBe(true);
      }
    }
    const times = full.requirements.flatMap((req) => req.outages.map((o) => o.timeToExceed_s));
    expect(times).toContain(null);
    expect(times.some((t) => typeof t === 'number')).toBe(true);
  });

  it('keeps every tenth step, the checkpoints and the last one with --every 10, with the same verdicts', () => {
    const t = full.series.t_s;
    const checkpointTimes = full.checkpoints.map((c) => c.t_s);
    const kept = t.filter((tS, k) => k % 10 === 0 || k === t.length - 1 || checkpointTimes.includes(tS));
    expect(checkpointTimes.some((tS) => t.indexOf(tS) % 10 !== 0)).toBe(true);
    expect(thinned.series.t_s).toEqual(kept);
    expect(thinned.mission.record_every).toBe(10);
    // Verdicts, margins and times-to-exceed are evaluated at every step, never on the thinned series.
    expect(thinned.requirements).toEqual(full.requirements);
    expect(thinned.checkpoints).toEqual(full.checkpoints);
    for (const key of Object.values(SIGMA_SERIES)) expect(thinned.series[key]).toHaveLength(kept.length);
    for (const rows of Object.values(thinned.contributions)) {
      for (const row of Object.values(rows)) expect(row).toHaveLength(kept.length);
    }
  });
});

describe('size', () => {
  it('prints the largest gyro bias instability that keeps the tug in its lane, and exits 0', async () => {
    const r = await runCli(['size', TUG, '--requirement', 'laneKeeping', '--vary', 'gyro.bi']);
    expect(r.code).toBe(0);
    const m = /largest gyro\.bi meeting laneKeeping: ([0-9.eE+-]+) deg\/h/.exec(r.out);
    expect(m, r.out).not.toBeNull();
    expect(Number(m![1])).toBeGreaterThan(0);
  }, 30_000);

  it('exits 2 naming the requirement when the budget has no such requirement', async () => {
    const r = await runCli(['size', TUG, '--requirement', 'noSuchRequirement', '--vary', 'gyro.bi']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('noSuchRequirement');
    expect(hasStackTrace(r.err)).toBe(false);
  });

  it('exits 2 naming the row when the budget has no such row', async () => {
    const r = await runCli(['size', TUG, '--requirement', 'laneKeeping', '--vary', 'gyro.noSuchRow']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('gyro.noSuchRow');
    expect(hasStackTrace(r.err)).toBe(false);
  });
});

describe('usage errors', () => {
  it.each([
    ['an unknown command', ['frobnicate', HARBOUR], 'unknown command "frobnicate"'],
    ['a command without its budget file', ['run'], '"run" needs a file'],
    ['size without --requirement and --vary', ['size', TUG], 'size needs --requirement ID and --vary SENSOR.ROW'],
    ['an unknown option', ['run', HARBOUR, '--bogus'], '--bogus'],
    ['an extra argument', ['check', HARBOUR, 'another.json'], 'unexpected argument "another.json"'],
  ])('exit 2 with a usage hint for %s', async (_what, argv, words) => {
    const r = await runCli(argv);
    expect(r.code).toBe(2);
    expect(r.err).toContain(words);
    expect(r.err).toContain('sigma-ledger help');
    expect(r.out).toBe('');
  });

  it('exits 2 naming the file when the budget file does not exist', async () => {
    const missing = join(BUDGETS, 'no-such-budget.json');
    const r = await runCli(['run', missing]);
    expect(r.code).toBe(2);
    expect(r.err).toContain(missing);
    expect(hasStackTrace(r.err)).toBe(false);
  });

  it('exits 2 naming the option when --every is not a positive number', async () => {
    const r = await runCli(['run', HARBOUR, '--every', '0']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('--every');
  });
});

describe('check and help', () => {
  const budgets = readdirSync(BUDGETS).filter((f) => f.endsWith('.json') && !f.endsWith('.schema.json'));

  it.each(budgets)('check finds budgets/%s valid and exits 0', async (file) => {
    const r = await runCli(['check', join(BUDGETS, file)]);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(r.out).toContain('valid');
  }, 30_000);

  it.each([['help'], ['--help']])('%s prints the usage and exits 0', async (arg) => {
    const r = await runCli([arg]);
    expect(r.code).toBe(0);
    expect(r.out).toContain('usage:');
  });
});
