/**
 * `npm run bench`: speed of the engine. Speed targets live here, never in a
 * timed test; the machines are noisy, so it prints medians and ratios.
 *
 * Target (issue: covariance engine): a full recompute, contributions
 * included, of the reference mission R2 (10 min at 0.1 s, 11 states, 14
 * sources) under 100 ms, growing linearly with mission length and with the
 * number of sources.
 */
import { computeBudget } from '../../src/pipeline';
import type { BudgetInput } from '../../src/inputs/budget-input';
import { scenarioR2 } from '../fixtures/reference-scenarios';
import { growthExponent } from './growth-exponent';
import { medianMs } from './median-time';
import { importBaseline } from './baseline-src';

function scaledMission(factor: number): BudgetInput {
  const b = scenarioR2();
  for (const seg of b.mission.segments) seg.duration.value *= factor;
  for (const s of b.sensors) for (const o of s.outages ?? []) { o.start.value *= factor; o.end.value *= factor; }
  return b;
}

function withExtraSources(extra: number): BudgetInput {
  const b = scenarioR2();
  const gyro = b.sensors.find((s) => s.kind === 'yaw-gyro')!;
  for (let i = 0; i < extra; i++) {
    gyro.sources.push({ id: `extra${i}`, kind: 'white-noise', value: { value: 0.01 * (i + 1), unit: 'deg/√h' } });
  }
  return b;
}

const r2 = scenarioR2();
// The code before the performance work (baseline-src.ts), timed beside this one in alternation in this process.
const oldPipeline = await importBaseline<typeof import('../../src/pipeline')>('pipeline.ts');
const newTimes: number[] = [], oldTimes: number[] = [];
for (let i = 0; i < 23; i++) {
  newTimes.push(medianMs(() => computeBudget(r2), 1, i === 0 ? 2 : 0));
  if (oldPipeline) oldTimes.push(medianMs(() => oldPipeline.computeBudget(r2), 1, i === 0 ? 2 : 0));
}
const median = (a: number[]) => [...a].sort((x, y) => x - y)[Math.floor(a.length / 2)];
const base = median(newTimes);
const vsOld = oldPipeline ? `; old code ${median(oldTimes).toFixed(1)} ms, new/old ${(base / median(oldTimes)).toFixed(2)}` : '';
console.log(`R2 full recompute (6,000 steps, 11 states, 14 sources, contributions): median ${base.toFixed(1)} ms (target < 30 ms)${vsOld}`);

const lengthPoints: [number, number][] = [0.5, 1, 2, 4].map((f) => {
  const b = scaledMission(f);
  const ms = medianMs(() => computeBudget(b), 7, 1);
  console.log(`  mission x${f} (${(600 * f).toFixed(0)} s): median ${ms.toFixed(1)} ms`);
  return [f, ms];
});
console.log(`growth with mission length: exponent ${growthExponent(lengthPoints).toFixed(2)} (target 1)`);

const sourcePoints: [number, number][] = [0, 6, 14, 30].map((extra) => {
  const b = withExtraSources(extra);
  const ms = medianMs(() => computeBudget(b), 7, 1);
  console.log(`  ${14 + extra} sources: median ${ms.toFixed(1)} ms`);
  return [14 + extra, ms];
});
console.log(`growth with number of sources: exponent ${growthExponent(sourcePoints).toFixed(2)} (target 1)`);
