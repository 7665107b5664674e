/**
 * One long run in its own process, so its peak memory can be read
 * (long-mission-bench.ts starts it). argv: source directory (this checkout's
 * src, or an older checkout's for the comparison), mission scale factor,
 * `every` (0 = the code's default), and optionally a landmark count: a
 * range-bearing sensor at 10 Hz seeing that many landmarks (all visible).
 * Prints one JSON line.
 */
import { pathToFileURL } from 'node:url';
import { resolve } from 'node:path';
import { scenarioR2 } from '../fixtures/reference-scenarios';

const [srcDir, factorText, everyText, landmarkText] = process.argv.slice(2);
const factor = Number(factorText), every = Number(everyText), landmarks = Number(landmarkText ?? 0);
const pipeline = await import(pathToFileURL(resolve(srcDir, 'pipeline.ts')).href);
const json = await import(pathToFileURL(resolve(srcDir, 'report/json-result.ts')).href);

const b = scenarioR2();
for (const seg of b.mission.segments) seg.duration.value *= factor;
for (const s of b.sensors) for (const o of s.outages ?? []) { o.start.value *= factor; o.end.value *= factor; }
if (landmarks > 0) {
  b.sensors.push({
    id: 'radar', kind: 'range-bearing', rate: { value: 10, unit: 'Hz' },
    landmarks: Array.from({ length: landmarks }, (_, i) => ({
      id: `post${i}`, north: { value: 900 * Math.cos((2 * Math.PI * i) / landmarks), unit: 'm' }, east: { value: 900 * Math.sin((2 * Math.PI * i) / landmarks), unit: 'm' },
    })),
    sources: [{ id: 'range', kind: 'white-noise', value: { value: 0.3, unit: 'm' } }, { id: 'bearing', kind: 'white-noise', value: { value: 0.5, unit: 'deg' } }],
  });
}
b.requirements = [{ id: 'pos95', quantity: 'horizontal', level: '95%', limit: { value: 1.8, unit: 'm' } }];

const t0 = performance.now();
const result = every > 0 ? pipeline.computeBudget(b, { every }) : pipeline.computeBudget(b);
const engineMs = performance.now() - t0;
let jsonChars: number;
try {
  jsonChars = JSON.stringify(json.buildJsonResult(result, 'long', 1)).length;
} catch {
  jsonChars = -1; // a string over V8's limit
}
const totalMs = performance.now() - t0;
const verdict = result.requirements.map((r: { verdict: string; outages: { timeToExceedS: number | null }[] }) => [r.verdict, r.outages.map((o) => o.timeToExceedS)]);
console.log(JSON.stringify({ engineMs, totalMs, peakMB: process.resourceUsage().maxRSS / 1024, jsonChars, verdict }));
