import { describe, expect, it } from 'vitest';
import { computeBudget } from '../../src/pipeline';
import { SigmaLedgerError } from '../../src/errors';
import type { BudgetInput } from '../../src/inputs/budget-input';
import { scenarioR1 } from '../fixtures/reference-scenarios';

type Mutation = (b: BudgetInput) => void;

/** [what is wrong, how to break R1, a pattern the message must contain (the field's path and what would be valid)]. */
const cases: [string, Mutation, RegExp][] = [
  ['a negative sigma', (b) => (b.sensors[0].sources[0].value.value = -0.2), /sensors\[0\]\.sources\[0\]\.value.*zero or more/],
  ['a zero correlation time', (b) => (b.sensors[0].sources[1].correlationTime!.value = 0), /sensors\[0\]\.sources\[1\]\.correlationTime.*greater than zero/],
  ['a missing correlation time', (b) => delete b.sensors[0].sources[1].correlationTime, /sensors\[0\]\.sources\[1\]\.correlationTime.*required/],
  ['NaN', (b) => (b.sensors[1].sources[0].value.value = NaN), /sensors\[1\]\.sources\[0\]\.value.*finite number/],
  ['Infinity', (b) => (b.sensors[2].sources[0].value.value = Infinity), /sensors\[2\]\.sources\[0\]\.value.*finite number/],
  ['an unknown unit', (b) => (b.sensors[0].sources[0].value.unit = 'dg/√h'), /sensors\[0\]\.sources\[0\]\.value.*dg/],
  ['a unit of the wrong dimension', (b) => (b.sensors[0].sources[1].value.unit = 'deg/√h'), /sensors\[0\]\.sources\[1\]\.value.*angular rate/],
  ['a rate random walk in deg/h', (b) => b.sensors[0].sources.push({ id: 'rrw', kind: 'rate-random-walk', value: { value: 1, unit: 'deg/h' } }), /sensors\[0\]\.sources\[4\]\.value.*rate random walk/],
  ['an outage outside the mission', (b) => (b.sensors[2].outages![0].end.value = 400), /sensors\[2\]\.outages\[0\].*within the mission/],
  ['an outage that ends before it starts', (b) => (b.sensors[2].outages![0].end.value = 100), /sensors\[2\]\.outages\[0\].*after start/],
  ['an empty mission', (b) => (b.mission.segments = []), /mission\.segments.*empty/],
  ['a zero-length segment', (b) => (b.mission.segments[0].duration.value = 0), /mission\.segments\[0\]\.duration.*greater than zero/],
  ['a negative speed', (b) => (b.mission.segments[1].speed.value = -1), /mission\.segments\[1\]\.speed.*zero or more/],
  ['no yaw gyro', (b) => b.sensors.shift(), /sensors.*exactly one yaw-gyro/],
  ['two sensors with one id', (b) => (b.sensors[1].id = 'gyro'), /sensors\[1\]\.id.*unique/],
  ['two rows with one id', (b) => (b.sensors[0].sources[1].id = 'arw'), /sensors\[0\]\.sources\[1\]\.id.*unique/],
  ['an unknown sensor kind', (b) => ((b.sensors[2] as { kind: string }).kind = 'lidar'), /sensors\[2\]\.kind.*must be one of/],
  ['a source kind the sensor lacks', (b) => (b.sensors[0].sources[0].kind = 'multipath'), /sensors\[0\]\.sources\[0\]\.kind.*no "multipath"/],
  ['a scale factor above 50 %', (b) => (b.sensors[1].sources[0].value.value = 60), /sensors\[1\]\.sources\[0\]\.value.*50 %/],
  ['a zero rate', (b) => (b.sensors[2].rate.value = 0), /sensors\[2\]\.rate.*greater than zero/],
  ['a step longer than the mission', (b) => (b.step.value = 1000), /step.*longer than the mission/],
  ['a zero step', (b) => (b.step.value = 0), /step.*greater than zero/],
  ['an unknown requirement quantity', (b) => (b.requirements = [{ id: 'r', quantity: 'altitude' as never, level: '1sigma', limit: { value: 1, unit: 'm' } }]), /requirements\[0\]\.quantity.*must be one of/],
  ['a requirement limit in the wrong unit', (b) => (b.requirements = [{ id: 'r', quantity: 'heading', level: '1sigma', limit: { value: 1, unit: 'm' } }]), /requirements\[0\]\.limit.*angle/],
  ['a checkpoint after the mission', (b) => (b.checkpoints = [{ id: 'late', time: { value: 900, unit: 's' } }]), /checkpoints\[0\]\.time.*within the mission/],
  ['a missing quantity object', (b) => delete (b.mission.start as Partial<BudgetInput['mission']['start']>).heading, /mission\.start\.heading.*missing/],
  ['a landmark on the vehicle path', (b) => b.sensors.push({
    id: 'radar', kind: 'range-bearing', rate: { value: 1, unit: 'Hz' },
    landmarks: [{ id: 'post', north: { value: 0, unit: 'm' }, east: { value: 0, unit: 'm' } }],
    sources: [{ id: 'range', kind: 'white-noise', value: { value: 0.1, unit: 'm' } }],
  }), /sensors\[3\]\.landmarks\[0\].*nominal path/],
  ['a field of view over 360 deg', (b) => b.sensors.push({
    id: 'radar', kind: 'range-bearing', rate: { value: 1, unit: 'Hz' }, fieldOfView: { value: 400, unit: 'deg' },
    landmarks: [{ id: 'post', north: { value: 50, unit: 'm' }, east: { value: 0, unit: 'm' } }], sources: [],
  }), /sensors\[3\]\.fieldOfView.*360/],
];

describe('invalid budgets', () => {
  it.each(cases)('%s is refused with a message naming the field', (_what, mutate, pattern) => {
    const b = scenarioR1();
    mutate(b);
    let caught: unknown;
    try {
      computeBudget(b);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(SigmaLedgerError);
    expect((caught as Error).message).toMatch(pattern);
  });
});
