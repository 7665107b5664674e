// Not part of `npm test` (the name does not end in .test.ts): run on demand with
//   npx web-test-runner test/web/logs/measure-1m.bench.ts
// It imports logs of 1 and 10 million samples through the page and prints the
// parse and compute times the page shows, and the longest stall of the page's
// own thread meanwhile (a timer that should fire every 10 ms).
import { expect } from '@open-wc/testing';
import { chooseFile, deepQuery, logImport, normal, settle, waitFor } from './helpers';

/** A "time,gyro_z" log of `n` white-noise samples at 100 Hz, built in parts of 100 000 lines. */
function bigLog(n: number): File {
  const next = normal(1);
  const parts: string[] = ['time,gyro_z\n'];
  for (let start = 0; start < n; start += 100_000) {
    const lines: string[] = [];
    for (let i = start; i < Math.min(n, start + 100_000); i++) lines.push(`${(i / 100).toFixed(2)},${(0.05 * next()).toFixed(6)}`);
    parts.push(lines.join('\n') + '\n');
  }
  return new File(parts, `white-${n}.csv`, { type: 'text/csv' });
}

async function measure(n: number): Promise<void> {
  const file = bigLog(n);
  const { el } = await logImport();
  await chooseFile(el, file);
  let last = performance.now(), worst = 0;
  const timer = setInterval(() => {
    const now = performance.now();
    worst = Math.max(worst, now - last);
    last = now;
  }, 10);
  const started = performance.now();
  deepQuery<HTMLButtonElement>(el, 'button#run').click();
  await waitFor(() => el.jobs.status !== 'pending', 600_000, 'the Allan job');
  const wall = performance.now() - started;
  clearInterval(timer);
  await settle(el);
  expect(el.jobs.status).to.equal('complete');
  const o = el.allan!;
  console.log(`${n} samples (${(file.size / 1e6).toFixed(1)} MB): parse ${(o.parseMs / 1000).toFixed(2)} s, compute ${(o.computeMs / 1000).toFixed(2)} s, ` +
    `wall ${(wall / 1000).toFixed(2)} s; longest page stall ${worst.toFixed(0)} ms; shown: "${deepQuery(el, '#times').textContent!.replace(/\s+/g, ' ').trim()}"`);
}

describe('sensor-log import timings', () => {
  it('measures a log of one million samples', async () => {
    await measure(1_000_000);
  });

  it('measures a log of ten million samples', async () => {
    await measure(10_000_000);
  });
});
