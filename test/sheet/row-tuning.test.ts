import { describe, expect, it } from 'vitest';
import { parseBudgetDocument, type BudgetDocument } from '../../src/document';
import { evaluateBudgetDocument } from '../../src/sheet';
import { minimalDocument } from '../document/minimal-document';

/** The minimal document with a filter design on gyro.bi, evaluated. */
function tuned(tuning: BudgetDocument['sensors'][0]['sources'][0]['tuning']) {
  const doc = minimalDocument();
  doc.sensors[0].sources[1].tuning = tuning;
  return { doc, evaluation: evaluateBudgetDocument(doc) };
}

describe('a row\'s filter design (tuning)', () => {
  it('evaluates its formulas and passes every field into the engine input', () => {
    const { evaluation } = tuned({ value: { value: '=gyro.bi*2', unit: 'deg/h' }, correlationTime: { value: '=gyro.bi.correlationTime/3', unit: 's' }, inflation: 1.5, model: 'gauss-markov' });
    expect(evaluation.cellErrors).toEqual([]);
    expect(evaluation.input!.sensors[0].sources[1].tuning).toEqual({
      value: { value: 10, unit: 'deg/h' }, correlationTime: { value: 50, unit: 's' }, inflation: 1.5, model: 'gauss-markov',
    });
  });

  it('gives its cells formula names other cells can use', () => {
    const doc = minimalDocument();
    doc.sensors[0].sources[1].tuning = { value: { value: 7, unit: 'deg/h' } };
    doc.sensors[0].sources[0].value = '=gyro.bi.tuning.value/70';
    expect(evaluateBudgetDocument(doc).input!.sensors[0].sources[0].value.value).toBeCloseTo(0.1, 15);
  });

  it('reports a bad tuned cell at its path and leaves the row out, truth and filter alike', () => {
    const { evaluation } = tuned({ value: { value: '=nosuchname', unit: 'deg/h' } });
    expect(evaluation.cellErrors[0].location.path).toBe('sensors[0].sources[1].tuning.value.value');
    expect(evaluation.omitted.map((o) => o.path)).toContain('sensors[0].sources[1]');
  });

  it('is refused by the schema with an unknown key or a non-positive inflation, naming the field', () => {
    const doc = minimalDocument();
    (doc.sensors[0].sources[1] as { tuning: unknown }).tuning = { inflation: 0 };
    expect(() => parseBudgetDocument(JSON.stringify(doc), 'b.json')).toThrow(/sensors\[0\]\.sources\[1\]\.tuning\.inflation/);
    (doc.sensors[0].sources[1] as { tuning: unknown }).tuning = { scale: 2 };
    expect(() => parseBudgetDocument(JSON.stringify(doc), 'b.json')).toThrow(/tuning/);
  });

  it('leaves a document without tuning exactly as before (no tuning key in the input)', () => {
    expect('tuning' in evaluateBudgetDocument(minimalDocument()).input!.sensors[0].sources[1]).toBe(false);
  });
});
