import { InputError } from '../errors';
import type { SensorInput, SensorKind } from '../inputs/budget-input';
import { SENSOR_KIND_NAMES, SENSOR_KINDS } from './registry';
import type { SuiteInput } from './sensor-kind';

const INPUT_WORDS: Record<SuiteInput, string> = { 'heading-rate': 'a heading-rate input', speed: 'a speed input' };

/**
 * Checks the suite against every kind's own rule (src/sensors/<kind>.ts,
 * `suite`): how many sensors of the kind it takes, and whether what a kind
 * needs is provided by some sensor of the suite. Sensors must already have
 * valid kinds.
 * @throws InputError at `sensors` naming the rule that is broken.
 */
export function checkSuite(list: readonly SensorInput[]): void {
  const count = new Map<SensorKind, number>();
  for (const s of list) count.set(s.kind, (count.get(s.kind) ?? 0) + 1);
  for (const kind of SENSOR_KIND_NAMES) {
    const { min = 0, max = Infinity } = SENSOR_KINDS[kind].suite;
    const n = count.get(kind) ?? 0;
    if (n >= min && n <= max) continue;
    const wanted = min === max ? `exactly ${words(min)}` : n < min ? `at least ${words(min)}` : `at most ${words(max)}`;
    throw new InputError('sensors', `the planar model needs ${wanted} ${kind} (found ${n})`);
  }
  const provided = new Set(list.flatMap((s) => SENSOR_KINDS[s.kind].suite.provides ?? []));
  for (const kind of count.keys()) {
    const needs = SENSOR_KINDS[kind].suite.needs;
    if (needs === undefined || provided.has(needs.input)) continue;
    const by = SENSOR_KIND_NAMES.filter((k) => SENSOR_KINDS[k].suite.provides?.includes(needs.input));
    throw new InputError('sensors', `a ${SENSOR_KINDS[kind].label} needs ${INPUT_WORDS[needs.input]} because ${needs.because} (add a ${by.join(' or a ')} sensor)`);
  }
}

function words(n: number): string {
  return ['no', 'one', 'two', 'three'][n] ?? String(n);
}
