import { describe, expect, it } from 'vitest';
import { writeRows } from '../../src/edits/row-writer';
import { minimalDocument } from '../document/minimal-document';

// Common practice, no source: a log measures the sensor (the truth); the filter's design is the user's choice.
describe('writing a row from a log', () => {
  it('keeps the row\'s filter design (tuning) while replacing its truth value', () => {
    const doc = minimalDocument();
    doc.sensors[0].sources[0].tuning = { inflation: 2, note: 'kept' };
    writeRows(doc, 0, [{ kind: 'white-noise', idStem: 'arw', label: 'angle random walk', fields: { value: 0.3, unit: 'deg/√h', provenance: 'fitted from log.csv', assumed: false } }]);
    const row = doc.sensors[0].sources.find((r) => r.kind === 'white-noise')!;
    expect(row.value).toBe(0.3);
    expect(row.tuning).toEqual({ inflation: 2, note: 'kept' });
  });
});
