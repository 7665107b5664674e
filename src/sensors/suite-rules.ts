import { InputError } from '../errors';
import type { SensorInput, SensorKind } from '../inputs/budget-input';
import { SENSOR_KINDS } from './registry';
import type { SensorKindSpec, SuiteInput } from './sensor-kind';

/** What the suite check reads of each kind (any builder: the planar and the 3-D models share it). */
export type SuiteKinds = Readonly<Partial<Record<SensorKind, Pick<SensorKindSpec<SensorKind, unknown>, 'label' | 'suite'>>>>;

const INPUT_WORDS: Record<SuiteInput, string> = { 'heading-rate': 'a heading-rate input', speed: 'a speed input' };

/**
 * Checks the suite against every kind's own rule (src/sensors/<kind>.ts,
 * `suite`): how many sensors of the kind it takes, and whether what a kind
 * needs is provided by some sensor of the suite. Sensors must already have
 * valid kinds. `kinds` is the model's registry and `model` its name in messages.
 * @throws InputError at `sensors` naming the rule that is broken.
 */
export function checkSuite(list: readonly SensorInput[], kinds: SuiteKinds = SENSOR_KINDS, model = 'the planar model'): void {
  const count = new Map<SensorKind, number>();
  for (const s of list) count.set(s.kind, (count.get(s.kind) ?? 0) + 1);
  const names = Object.keys(kinds) as SensorKind[];
  for (const kind of names) {
    const { min = 0, max = Infinity } = kinds[kind]!.suite;
    const n = count.get(kind) ?? 0;
    if (n >= min && n <= max) continue;
    const wanted = min === max ? `exactly ${words(min)}` : n < min ? `at least ${words(min)}` : `at most ${words(max)}`;
    throw new InputError('sensors', `${model} needs ${wanted} ${kind} (found ${n})`);
  }
  const provided = new Set(list.flatMap((s) => kinds[s.kind]?.suite.provides ?? []));
  for (const kind of count.keys()) {
    const needs = kinds[kind]?.suite.needs;
    if (needs === undefined || provided.has(needs.input)) continue;
    const by = names.filter((k) => kinds[k]!.suite.provides?.includes(needs.input));
    throw new InputError('sensors', `a ${kinds[kind]!.label} needs ${INPUT_WORDS[needs.input]} because ${needs.because} (add a ${by.join(' or a ')} sensor)`);
  }
}

function words(n: number): string {
  return ['no', 'one', 'two', 'three'][n] ?? String(n);
}
