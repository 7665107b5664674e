/**
 * Hostile corpus, values finite in their own unit but infinite, zero or
 * absurd in SI: each is refused at its own field (once they surfaced as
 * `requirements[0].limit: ... got ±Infinity` or at `heading`). Bounds and
 * their reasons: src/inputs/plausible-range.ts.
 */
import { describe, it } from 'vitest';
import { baseDocument, expectCliRefusal, expectViewRefusal, patched } from './hostile-documents';

/** The base with a turn-on bias row added to the gyro. */
function withTurnOnBias(value: number, unit: string): any {
  const doc = baseDocument();
  doc.sensors[0].sources.push({ id: 'tob', kind: 'turn-on-bias', value, unit, provenance: 'hostile case', assumed: true });
  return doc;
}

const CASES: { name: string; doc: () => any; field: string; detail: RegExp }[] = [
  { name: 'turn-on-bias-1e200.json', doc: () => withTurnOnBias(1e200, 'deg/s'), field: 'sensors[0].sources[3].value', detail: /1e\+200 deg\/s is more than 278 deg\/s, no gyro bias or noise is this large/ },
  { name: 'arw-1e300.json', doc: () => patched({ 'sensors[0].sources[0].value': 1e300 }), field: 'sensors[0].sources[0].value', detail: /1e\+300 deg\/√h is more than 1000 deg\/√h/ },
  { name: 'bias-2e6-deg-h.json', doc: () => patched({ 'sensors[0].sources[1].value': 2e6 }), field: 'sensors[0].sources[1].value', detail: /2000000 deg\/h is more than 1e6 deg\/h/ },
  { name: 'speed-1e308.json', doc: () => patched({ 'mission.segments[0].speed.value': 1e308 }), field: 'mission.segments[0].speed.value', detail: /1e\+308 m\/s is more than 343 m\/s, the speed of sound/ },
  { name: 'speed-supersonic.json', doc: () => patched({ 'mission.segments[1].speed.value': 1300, 'mission.segments[1].speed.unit': 'km/h' }), field: 'mission.segments[1].speed.value', detail: /1300 km\/h is more than 1230 km\/h/ },
  { name: 'turn-rate-1e308.json', doc: () => patched({ 'mission.segments[0].turnRate.value': 1e308 }), field: 'mission.segments[0].turnRate.value', detail: /1e\+308 deg\/s is more than 278 deg\/s/ },
  { name: 'correlation-time-1e-300.json', doc: () => patched({ 'sensors[0].sources[1].correlationTime.value': 1e-300 }), field: 'sensors[0].sources[1].correlationTime.value', detail: /1e-300 s is below 1e-6 s, one microsecond/ },
  { name: 'gyro-rate-5e-324.json', doc: () => patched({ 'sensors[0].rate.value': 5e-324 }), field: 'sensors[0].rate.value', detail: /5e-324 Hz is below 1e-6 Hz/ },
  { name: 'initial-position-1e308-km.json', doc: () => patched({ 'mission.initialPosition.value': 1e308, 'mission.initialPosition.unit': 'km' }), field: 'mission.initialPosition.value', detail: /1e\+308 km is infinite once converted to SI/ },
  { name: 'segment-1e308-s.json', doc: () => patched({ 'mission.segments[2].duration.value': 1e308, 'settings.step.value': 1e303 }), field: 'mission.segments[2].duration.value', detail: /1e\+308 s is more than 1e8 s, about three years/ },
  { name: 'limit-beyond-earth.json', doc: () => patched({ 'requirements[0].limit.value': 1e9 }), field: 'requirements[0].limit.value', detail: /circumference/ },
];

describe('the SI-overflow corpus', { timeout: 60_000 }, () => {
  it.each(CASES)('refuses $name at $field', async ({ name, doc, field, detail }) => {
    await expectCliRefusal(name, doc(), field, detail);
    expectViewRefusal(doc(), field);
  }, 60_000);
});
