import { describe, expect, it } from 'vitest';
import { parseBudgetDocument, serializeBudgetDocument, type BudgetDocument } from '../../src/document';
import { minimalDocument } from './minimal-document';

/** The minimal document with its top-level keys, and a row's keys, in reverse order. */
function shuffled(): BudgetDocument {
  const doc = minimalDocument();
  const reversed = (o: object) => Object.fromEntries(Object.entries(o).reverse());
  doc.sensors[0].sources[1] = reversed(doc.sensors[0].sources[1]) as never;
  return reversed(doc) as BudgetDocument;
}

describe('serializeBudgetDocument', () => {
  it('writes keys in the schema order whatever order they were given in', () => {
    expect(serializeBudgetDocument(shuffled())).toBe(serializeBudgetDocument(minimalDocument()));
  });

  it('starts with the format header and ends with one newline', () => {
    const text = serializeBudgetDocument(minimalDocument());
    expect(text.startsWith('{\n  "format": "sigma-ledger-budget",\n  "formatVersion": 2,\n  "title"')).toBe(true);
    expect(text.endsWith('}\n')).toBe(true);
    expect(text.endsWith('}\n\n')).toBe(false);
  });

  it('puts each value with its unit on one line, so a one-cell edit is a one-line diff', () => {
    const text = serializeBudgetDocument(minimalDocument());
    expect(text).toContain('\n          "correlationTime": { "value": 150, "unit": "s" },\n');
    const edited = minimalDocument();
    edited.sensors[0].sources[1].correlationTime!.value = 200;
    const changed = serializeBudgetDocument(edited).split('\n').filter((line, i) => line !== text.split('\n')[i]);
    expect(changed).toEqual(['          "correlationTime": { "value": 200, "unit": "s" },']);
  });

  it('keeps named values in the order the user gave them', () => {
    const doc = minimalDocument();
    doc.values = { zeta: { value: 1, unit: 'm' }, alpha: { value: 2, unit: 'm' } };
    const text = serializeBudgetDocument(doc);
    expect(text.indexOf('"zeta"')).toBeLessThan(text.indexOf('"alpha"'));
  });

  it('keeps full double precision and non-ASCII unit text as written', () => {
    const doc = minimalDocument();
    doc.sensors[0].sources[0].value = 0.1 + 0.2;
    const back = parseBudgetDocument(serializeBudgetDocument(doc), 'x.json').document;
    expect(back.sensors[0].sources[0].value).toBe(0.30000000000000004);
    expect(serializeBudgetDocument(doc)).toContain('"unit": "deg/√h"');
  });

  it('leaves out keys whose value is undefined', () => {
    const doc = minimalDocument();
    doc.description = undefined;
    expect(serializeBudgetDocument(doc)).not.toContain('description');
  });
});
