/**
 * One long run in its own process, so its peak memory can be read
 * (long-mission-bench.ts starts it). argv: source directory (this checkout's
 * src, or an older checkout's for the comparison), mission scale factor,
 * `every` (0 = the code's default). Prints one JSON line.
 */
import { pathToFileURL } from 'node:url';
import { resolve } from 'node:path';
import { scenarioR2 } from '../fixtures/reference-scenarios';

const [srcDir, factorText, everyText] = process.argv.slice(2);
const factor = Number(factorText), every = Number(everyText);
const pipeline = await import(pathToFileURL(resolve(srcDir, 'pipeline.ts')).href);
const json = await import(pathToFileURL(resolve(srcDir, 'report/json-result.ts')).href);

const b = scenarioR2();
for (const seg of b.mission.segments) seg.duration.value *= factor;
for (const s of b.sensors) for (const o of s.outages ?? []) { o.start.value *= factor; o.end.value *= factor; }
b.requirements = [{ id: 'pos95', quantity: 'horizontal', level: '95%', limit: { value: 1.8, unit: 'm' } }];

const t0 = performance.now();
const result = every > 0 ? pipeline.computeBudget(b, { every }) : pipeline.computeBudget(b);
const engineMs = performance.now() - t0;
let jsonChars = -1;
try {
  jsonChars = JSON.stringify(json.buildJsonResult(result, 'long', 1)).length;
} catch {
  jsonChars = -1; // a string over V8's limit
}
const totalMs = performance.now() - t0;
const verdict = result.requirements.map((r: { verdict: string; outages: { timeToExceedS: number | null }[] }) => [r.verdict, r.outages.map((o) => o.timeToExceedS)]);
console.log(JSON.stringify({ engineMs, totalMs, peakMB: process.resourceUsage().maxRSS / 1024, jsonChars, verdict }));
