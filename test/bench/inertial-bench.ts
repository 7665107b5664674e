/**
 * `npm run bench`, 3-D part: the benchmark case of docs/inertial-model.md §10,
 * a 10-minute flight at a 0.1 s step with 21 states and 15 sources,
 * contributions included (the drone reference mission without the aiding
 * biases and IMU scale factors). Target: median under 250 ms; growth
 * exponents in mission length and in source count at most 1.1. The machines
 * are shared: quote medians and ratios from one run.
 */
import { runInertialBudget } from '../../src/inertial/run-inertial';
import type { InertialBudgetInput } from '../../src/inertial/inertial-input';
import { droneScenario } from '../fixtures/inertial-scenarios';
import { growthExponent } from './growth-exponent';
import { medianMs } from './median-time';
import { alternatingMedians, importBaseline, versusOld } from './baseline-src';

function benchCase(): InertialBudgetInput {
  const b = droneScenario();
  b.imu.rows = b.imu.rows.filter((r) => r.kind !== 'scale-factor' && r.axis === undefined);
  for (const s of b.aiding) s.rows = s.rows.filter((r) => r.kind !== 'turn-on-bias');
  return b;
}

function scaled(factor: number): InertialBudgetInput {
  const b = benchCase();
  for (const seg of b.mission.segments) seg.duration.value *= factor;
  for (const s of b.aiding) for (const o of s.outages ?? []) { o.start.value *= factor; o.end.value *= factor; }
  return b;
}

function withExtraSources(extra: number): InertialBudgetInput {
  const b = benchCase();
  for (let i = 0; i < extra; i++) {
    b.aiding.push({ id: `baro${i}`, kind: 'barometer', rate: { value: 1, unit: 'Hz' },
      rows: [{ id: 'white', kind: 'white-noise', value: { value: 0.5 * (i + 1), unit: 'm' } }] });
  }
  return b;
}

const base = benchCase();
const probe = runInertialBudget(base);
const n = probe.model.states.length, sources = probe.model.sources.length;
const old = await importBaseline<typeof import('../../src/inertial/run-inertial')>('inertial/run-inertial.ts');
const { newMs: ms, oldMs } = alternatingMedians(() => runInertialBudget(base), old && (() => old.runInertialBudget(base)), 5, 1);
console.log(`3-D flight (${probe.run.steps - 1} steps, ${n} states, ${sources} sources, contributions): median ${ms.toFixed(0)} ms`
  + ` (target < 250 ms)${versusOld(ms, oldMs)}`);

const lengthPoints: [number, number][] = [0.5, 1, 2].map((f) => {
  const b = scaled(f);
  const t = medianMs(() => runInertialBudget(b), 3, 1);
  console.log(`  mission x${f} (${(600 * f).toFixed(0)} s): median ${t.toFixed(0)} ms`);
  return [f, t];
});
console.log(`growth with mission length: exponent ${growthExponent(lengthPoints).toFixed(2)} (target ≤ 1.1)`);

const sourcePoints: [number, number][] = [0, 8, 24].map((extra) => {
  const b = withExtraSources(extra);
  const t = medianMs(() => runInertialBudget(b), 3, 1);
  console.log(`  ${sources + extra} sources: median ${t.toFixed(0)} ms`);
  return [sources + extra, t];
});
console.log(`growth with number of sources: exponent ${growthExponent(sourcePoints).toFixed(2)} (target ≤ 1.1)`);
