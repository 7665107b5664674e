/**
 * Hostile corpus, work limits: documents whose run could not finish or
 * would exhaust memory are refused before anything is allocated, naming the
 * field to change (limits in src/covariance/work-estimate.ts, common
 * practice, no source). Each case once took minutes, gigabytes or crashed.
 */
import { describe, expect, it } from 'vitest';
import { parseBudgetDocument } from '../../src/document';
import { computeView } from '../../src/report/view-result';
import { WORK_LIMITS } from '../../src/covariance/work-estimate';
import { baseDocument, expectCliRefusal, expectViewRefusal, patched } from './hostile-documents';

/** The base with its last leg lengthened to an hour: 3660 s in all. */
function hourLong(changes: Record<string, unknown> = {}): any {
  return patched({ 'mission.segments[2].duration.value': 3620, ...changes });
}

/** The base with `count` GNSS receivers, each with `rows` multipath rows (two states each). */
function manyReceivers(count: number, rows: number): any {
  const doc = baseDocument();
  const gnss = doc.sensors[2];
  const extra = Array.from({ length: count }, (_, i) => ({
    ...gnss, id: `gnss${i}`, outages: [],
    sources: [gnss.sources[0], ...Array.from({ length: rows }, (_, j) => ({ ...gnss.sources[1], id: `mp${j}` }))],
  }));
  doc.sensors.splice(2, 1, ...extra);
  return doc;
}

/** The base's range-bearing sensor with `count` landmarks in a line north of the path. */
function manyLandmarks(count: number, rateHz: number): any {
  const doc = patched({ 'sensors[3].rate.value': rateHz });
  doc.sensors[3].landmarks = Array.from({ length: count }, (_, i) => ({
    id: `post${i}`, north: { value: 10 + (i % 20), unit: 'm' }, east: { value: i, unit: 'm' },
  }));
  return doc;
}

const CASES: { name: string; doc: () => any; field: string; detail: RegExp }[] = [
  { name: 'gnss-10khz.json', doc: () => hourLong({ 'sensors[2].rate.value': 10_000 }), field: 'sensors[2].rate', detail: /10000 Hz gives 7\.3e7 scalar measurements over the mission.*the limit is 5e6/ },
  { name: 'gnss-20khz.json', doc: () => hourLong({ 'sensors[2].rate.value': 20_000 }), field: 'sensors[2].rate', detail: /20000 Hz gives 1\.5e8 scalar measurements/ },
  { name: 'gnss-1e9hz.json', doc: () => patched({ 'sensors[2].rate.value': 1e9 }), field: 'sensors[2].rate.value', detail: /1000000000 Hz is more than 100000 Hz/ },
  { name: 'landmarks-500-at-100hz.json', doc: () => manyLandmarks(500, 100), field: 'sensors[3].rate', detail: /100 Hz with 1000 scalar measurements per update/ },
  { name: 'gnss-29x64-multipath.json', doc: () => manyReceivers(29, 63), field: 'sensors[2].sources', detail: /3660 states .* would need .* GB of memory; the limit is 2 GB/ },
  { name: 'step-too-fine.json', doc: () => hourLong({ 'settings.step.value': 0.001 }), field: 'settings.step.value', detail: /3660000 steps is more than 720000/ },
];

describe('the work-limit corpus', { timeout: 60_000 }, () => {
  it.each(CASES)('refuses $name at $field before running', async ({ name, doc, field, detail }) => {
    // The message quotes the estimate (steps, measurements, states or memory), which only the
    // check before the run writes; how fast the refusal comes is not a test's business (npm run bench).
    await expectCliRefusal(name, doc(), field, detail);
    expectViewRefusal(doc(), field);
  }, 60_000);

  it('lets ordinary rates through: two landmarks at 1, 10 and 100 Hz compute', () => {
    for (const rate of [1, 10, 100]) {
      const view = computeView(parseBudgetDocument(JSON.stringify(manyLandmarks(2, rate)), 'x.json').document);
      expect(view.blocked).toBeUndefined();
      expect(view.result).toBeDefined();
    }
  });

  it('documents limits that allow a 2-hour mission at 0.01 s', () => {
    expect(WORK_LIMITS.steps).toBe(720_000);
  });
});

