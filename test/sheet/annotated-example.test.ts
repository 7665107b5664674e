import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseBudgetDocument, serializeBudgetDocument } from '../../src/document';
import { computeBudget } from '../../src/pipeline';
import { evaluateBudgetDocument } from '../../src/sheet';
import { expectRelative } from '../units/expect-relative';

const FILE = 'annotated-example.json';
const text = readFileSync(new URL(`../../budgets/${FILE}`, import.meta.url), 'utf8');

describe('budgets/annotated-example.json', () => {
  const { document, notes } = parseBudgetDocument(text, FILE);

  it('validates against the schema as a current-version file', () => {
    expect(notes).toEqual([]);
  });

  it('is canonical: writing it again gives the same bytes', () => {
    expect(serializeBudgetDocument(document)).toBe(text);
  });

  it('says that its scenario is invented', () => {
    expect(document.description).toMatch(/invented scenario/i);
  });

  it('uses named values and a formula with a unit conversion', () => {
    expect(Object.keys(document.values ?? {}).length).toBeGreaterThan(0);
    expect(text).toContain('=CONVERTUNIT(');
  });

  it('evaluates without a cell error or an omission', () => {
    const ev = evaluateBudgetDocument(document);
    expect(ev.cellErrors).toEqual([]);
    expect(ev.omitted).toEqual([]);
    expect(ev.blocked).toBeUndefined();
    // docs/checks.md §2 (computed): 1 °/s/√Hz = 60 °/√h, so 0.005 °/s/√Hz is 0.3 °/√h.
    expectRelative(ev.cellValues.get('sensors[0].sources[0].value')!, 0.3, 1e-15);
  });

  it('gives an input the engine accepts', () => {
    const { input } = evaluateBudgetDocument(document);
    expect(() => computeBudget(input!)).not.toThrow();
  });
});
