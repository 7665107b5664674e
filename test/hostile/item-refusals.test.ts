/**
 * A bad cell drops only its own item (budgets/FORMAT.md), also when the
 * engine is the one refusing it; and a coarse LSB is computed but flagged.
 */
import { describe, expect, it } from 'vitest';
import { parseBudgetDocument } from '../../src/document';
import { computeView } from '../../src/report/view-result';
import { runCli } from '../cli/run-cli';
import { baseDocument, patched, writeCase } from './hostile-documents';

const view = (doc: object) => computeView(parseBudgetDocument(JSON.stringify(doc), 'case.json').document);

describe('an item the engine refuses', { timeout: 60_000 }, () => {
  const wrongUnit = () => patched({ 'sensors[0].sources[0].unit': 'm' });

  it('is left out with its error in place, and the rest computes, marked partial (page)', () => {
    const v = view(wrongUnit());
    expect(v.blocked).toBeUndefined();
    expect(v.result).toBeDefined();
    const error = v.cellErrors.find((e) => e.location.path === 'sensors[0].sources[0].unit');
    expect(error?.location).toMatchObject({ sensorId: 'gyro', rowId: 'arw', field: 'value' });
    expect(error?.message).toMatch(/^'m' is a length; expected an angle random walk/);
    expect(v.omitted).toContainEqual({ path: 'sensors[0].sources[0]', what: 'row gyro.arw' });
    // The refused row is not among the sources computed.
    expect(v.result!.mission.sources).not.toContain('gyro.arw');
  });

  it('is left out with its error in place, and the rest computes, marked partial (command line, exit 2)', async () => {
    const r = await runCli(['run', writeCase('wrong-unit-row.json', wrongUnit())]);
    expect(r.code).toBe(2);
    expect(r.err).toContain("sensors[0].sources[0].unit: 'm' is a length");
    expect(r.err).toContain('sensors[0].sources[0]: left out of the analysis (row gyro.arw)');
    expect(r.out).toContain('(PARTIAL: cells with errors were left out)');
    expect(r.out).toMatch(/REQUIREMENTS: \d of 2 hold/);
  });

  it('drops each refused item in turn: two bad rows in two sensors', () => {
    const doc = patched({ 'sensors[0].sources[0].unit': 'm', 'sensors[2].sources[1].value': 1e9 });
    const v = view(doc);
    expect(v.result).toBeDefined();
    expect(v.omitted.map((o) => o.path)).toEqual(['sensors[0].sources[0]', 'sensors[2].sources[1]']);
  });

  it('still stops the analysis for a problem outside any item (the step)', () => {
    const v = view(patched({ 'settings.step.value': 1e-9 }));
    expect(v.blocked?.path).toBe('settings.step.value');
  });
});

describe('a quantisation LSB coarser than the motion', { timeout: 60_000 }, () => {
  function withLsb(value: number): any {
    const doc = baseDocument();
    doc.sensors[0].sources.push({ id: 'lsb', kind: 'quantisation', value, unit: 'deg/s', provenance: 'hostile case', assumed: true });
    return doc;
  }

  it('is computed and flagged in the status when it exceeds the fastest turn (9 deg/s in the corner: 90 deg in 10 s)', () => {
    const v = view(withLsb(12));
    expect(v.result!.status.warnings).toHaveLength(1);
    expect(v.result!.status.warnings[0].source).toBe('gyro.lsb');
    expect(v.result!.status.warnings[0].message).toMatch(/the LSB 12 deg\/s is larger than the fastest turn of the mission, 9 deg\/s: .* q\/2 = 6 deg\/s/);
  });

  it('is not flagged when it is finer than the fastest turn', () => {
    expect(view(withLsb(8.9)).result!.status.warnings).toEqual([]);
  });

  it('appears in the text summary', async () => {
    const r = await runCli(['run', writeCase('coarse-lsb.json', withLsb(12))]);
    expect(r.out).toMatch(/WARNING gyro\.lsb: the LSB 12 deg\/s is larger than the fastest turn/);
  });
});
