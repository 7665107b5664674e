/**
 * `npm run bench` (part): the state-count sweep. R2 grown from 11 to 45
 * states (test/fixtures scenarioWithStates), per state count: the Φ X Φᵀ
 * kernel's time per call and per multiply-add, and the whole engine's time
 * per step (contributions included) on a 60 s mission. Targets (issue "Long
 * missions and large suites"): growth with the state count no faster than
 * n^3.2, and no step to a larger model more than 1.5 times slower per
 * multiply-add. With BASELINE_SRC=<older checkout>/src the old kernel (one
 * unrolled function) runs beside the new one in the same process.
 *
 * Run with `node --no-concurrent-recompilation` (npm run bench does): V8
 * optimises a large generated function on a background thread, which on a
 * shared, loaded machine can lag by seconds and would time the interpreter.
 */
import { pathToFileURL } from 'node:url';
import { resolve } from 'node:path';
import { compile, genericKernel, type PropagationKernel } from '../../src/covariance/compiled-propagation';
import { discretiseStep } from '../../src/covariance/discretise-step';
import { buildErrorModel } from '../../src/sensors/build-error-model';
import { resolveMission } from '../../src/mission/resolve-mission';
import { computeBudget } from '../../src/pipeline';
import type { SparseRows } from '../../src/covariance/sparse-rows';
import { scenarioWithStates } from '../fixtures/reference-scenarios';
import { growthExponent } from './growth-exponent';
import { medianMs } from './median-time';

const baseline = process.env.BASELINE_SRC;
const oldKernel: ((phi: SparseRows) => PropagationKernel) | undefined = baseline
  ? (await import(pathToFileURL(resolve(baseline, 'covariance/compiled-propagation.ts')).href)).propagationKernel
  : undefined;
const oldPipeline = baseline ? await import(pathToFileURL(resolve(baseline, 'pipeline.ts')).href) : undefined;

/** Multiply-adds of one Φ X Φᵀ: n per non-zero of Φ for Φ X, and the upper triangle of (Φ X) Φᵀ. */
function multiplyAdds(phi: SparseRows): number {
  let terms = phi.col.length * phi.n;
  for (let k = 0; k < phi.n; k++) terms += (phi.rowStart[k + 1] - phi.rowStart[k]) * (k + 1);
  return terms;
}

/**
 * Median of 9 rounds of 500 calls, µs per call, after 0.4 s of calls: V8
 * optimises a large generated function on a background thread, which on a
 * loaded machine takes a while; the steady state is what a long run sees.
 */
function kernelMicros(kernel: PropagationKernel, phi: SparseRows): number {
  const n = phi.n, x = new Float64Array(n * n), scratch = new Float64Array(n * n);
  const reset = () => { x.fill(0); for (let i = 0; i < n; i++) x[i * n + i] = 1; };
  const calls = 500;
  const round = () => { reset(); for (let c = 0; c < calls; c++) kernel(x, 0, phi.val, scratch); };
  for (const until = performance.now() + 400; performance.now() < until;) round();
  return (medianMs(round, 9) / calls) * 1000;
}

function shortMission(states: number) {
  const b = scenarioWithStates(states);
  for (const seg of b.mission.segments) seg.duration.value *= 0.1;
  for (const s of b.sensors) for (const o of s.outages ?? []) { o.start.value *= 0.1; o.end.value *= 0.1; }
  return b;
}

console.log('state-count sweep (R2 grown with GNSS multipath states; kernel µs per call and ns per multiply-add; engine ms per step, 60 s mission):');
const kernelPoints: [number, number][] = [], enginePoints: [number, number][] = [];
let worstPerFlopStep = 0;
let previousNs = 0;
for (const states of [11, 15, 19, 23, 27, 31, 35, 39, 45]) {
  const b = scenarioWithStates(states);
  const model = buildErrorModel(b.sensors, resolveMission(b.mission), b.mission.initialSigmaNotes);
  const phi = discretiseStep(model, 3, 0.1, 0.1).phi;
  const terms = multiplyAdds(phi);
  const newUs = kernelMicros(compile(phi)!, phi);
  const genericUs = kernelMicros(genericKernel(phi), phi);
  const oldUs = oldKernel ? kernelMicros(oldKernel(phi), phi) : NaN;
  const ns = (newUs * 1000) / terms;
  if (previousNs > 0) worstPerFlopStep = Math.max(worstPerFlopStep, ns / previousNs);
  previousNs = ns;
  const mission = shortMission(states);
  const stepsCount = 601;
  const engineMs = medianMs(() => computeBudget(mission), 3, 1) / stepsCount;
  const oldEngineMs = oldPipeline ? medianMs(() => oldPipeline.computeBudget(mission), 3, 1) / stepsCount : NaN;
  kernelPoints.push([states, newUs]);
  enginePoints.push([states, engineMs]);
  const old = oldKernel ? `old ${oldUs.toFixed(2)} µs (new/old ${(newUs / oldUs).toFixed(2)}), ` : '';
  const oldEngine = oldPipeline ? `, old ${oldEngineMs.toFixed(3)} ms (new/old ${(engineMs / oldEngineMs).toFixed(2)})` : '';
  console.log(`  ${states} states, ${terms} multiply-adds: kernel new ${newUs.toFixed(2)} µs (${ns.toFixed(2)} ns each), ${old}generic ${genericUs.toFixed(2)} µs; engine ${engineMs.toFixed(3)} ms per step${oldEngine}`);
}
console.log(`kernel growth exponent with the state count: ${growthExponent(kernelPoints).toFixed(2)}; engine: ${growthExponent(enginePoints).toFixed(2)} (target <= 3.2)`);
console.log(`largest step in time per multiply-add to the next larger model: x${worstPerFlopStep.toFixed(2)} (target <= 1.5)`);
