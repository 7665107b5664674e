/**
 * Command-line conventions: --version, `-` for standard input, per-command
 * options (refused with the command's own list, "did you mean" for a near
 * miss), per-command help, --significant, and a reader that closes the pipe
 * early (`| head`) ending the command quietly.
 */
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { hasStackTrace, runCli } from './run-cli';

const ORCHARD = 'budgets/orchard-rover.json';
const TUG = 'budgets/warehouse-tug.json';
const VERSION = JSON.parse(readFileSync('package.json', 'utf8')).version as string;

/** Runs the CLI from source in a shell (tsx), so that pipes and standard input are real. */
function shell(command: string): { status: number | null; stdout: string; stderr: string } {
  const cli = `"${process.execPath}" --import tsx src/cli/sigma-ledger.ts`;
  return spawnSync('bash', ['-o', 'pipefail', '-c', command.replaceAll('CLI', cli)], { encoding: 'utf8' });
}

describe('command-line conventions', () => {
  it('--version prints the package version and exits 0', async () => {
    const r = await runCli(['--version']);
    expect(r).toEqual({ code: 0, out: `sigma-ledger ${VERSION}\n`, err: '' });
  });

  it('refuses an option of another command, listing the options run takes', async () => {
    const r = await runCli(['run', ORCHARD, '--column', 'x']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('run has no option --column');
    expect(r.err).toContain('run takes: --json, --every N, --significant N, --output OUT');
    expect(r.out).toBe('');
  });

  it('suggests the option meant for a typo', async () => {
    const r = await runCli(['run', ORCHARD, '--evry', '10']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('did you mean --every?');
  });

  it('suggests the command meant for a typo', async () => {
    const r = await runCli(['sise', ORCHARD]);
    expect(r.code).toBe(2);
    expect(r.err).toContain('did you mean "size"?');
  });

  it('prints one command\'s usage and options with COMMAND --help and help COMMAND', async () => {
    const a = await runCli(['size', '--help']);
    const b = await runCli(['help', 'size']);
    expect(a.code).toBe(0);
    expect(a.out).toContain('usage: sigma-ledger size FILE --requirement ID --vary SENSOR.ROW');
    expect(a.out).toContain('--tolerance REL');
    expect(b.out).toBe(a.out);
  });

  it('lists the rows --vary can name when it names none', async () => {
    const r = await runCli(['size', TUG, '--requirement', 'laneKeeping', '--vary', 'gyro.nope']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('no row "gyro.nope"');
    const doc = JSON.parse(readFileSync(TUG, 'utf8')) as { sensors: { id: string; sources: { id: string }[] }[] };
    for (const s of doc.sensors) for (const row of s.sources) expect(r.err).toMatch(new RegExp(`[ ,]${s.id}\\.${row.id}(,|$)`, "m"));
  }, 60_000);

  it('rounds --json numbers to --significant digits', async () => {
    const full = JSON.parse((await runCli(['run', ORCHARD, '--json', '--every', '500'])).out);
    const short = JSON.parse((await runCli(['run', ORCHARD, '--json', '--every', '500', '--significant', '3'])).out);
    const x = full.series.cross_sigma_m as number[];
    expect(short.series.cross_sigma_m).toEqual(x.map((v) => Number(v.toPrecision(3))));
    expect((await runCli(['run', ORCHARD, '--json', '--significant', '0'])).err).toContain('--significant');
  }, 60_000);

  it('reads the budget from standard input with "-"', () => {
    const r = shell(`CLI run - < ${ORCHARD}`);
    // Exit 1: the orchard rover's cross-track requirement fails on purpose (README).
    expect(r.status).toBe(1);
    expect(r.stdout).toContain('Sigma Ledger budget: Orchard rover between tree rows');
    expect(r.stdout).toContain('file: stdin');
  }, 60_000);

  it('ends quietly when the reader closes the pipe early', () => {
    const r = shell(`CLI run ${ORCHARD} --json | head -c 100 > /dev/null`);
    expect(r.status).toBe(0);
    expect(r.stderr).toBe('');
    expect(hasStackTrace(r.stderr)).toBe(false);
  }, 60_000);
});
