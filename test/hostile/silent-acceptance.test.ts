/**
 * Hostile corpus, documents once accepted silently (or crashing the
 * parser): each is now refused at its own field, by the command line and
 * by the page's compute path, and the file is left as written.
 */
import { closeSync, ftruncateSync, openSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { hasStackTrace, runCli } from '../cli/run-cli';
import { baseDocument, expectCliRefusal, expectViewRefusal, patched, writeCase } from './hostile-documents';

function withRow(sensor: number, row: object): any {
  const doc = baseDocument();
  doc.sensors[sensor].sources.push(row);
  return doc;
}

const row0 = 'sensors[0].sources[0].value';
const CASES: { name: string; doc: () => any; field: string; detail: RegExp }[] = [
  { name: 'landmarks-on-gnss.json', doc: () => patched({ 'sensors[2].landmarks': [{ id: 'p', north: { value: 5, unit: 'm' }, east: { value: 5, unit: 'm' } }] }), field: 'sensors[2].landmarks', detail: /a gnss-position sensor does not use "landmarks"/ },
  { name: 'max-range-on-compass.json', doc: () => patched({ 'sensors[0].maxRange': { value: 5, unit: 'm' } }), field: 'sensors[0].maxRange', detail: /a yaw-gyro sensor does not use "maxRange"/ },
  {
    name: 'quantum-angle-on-wheel-speed.json',
    doc: () => withRow(1, { id: 'lsb', kind: 'quantisation', value: 0.01, unit: 'm/s', quantum: 'angle', provenance: 'hostile case', assumed: true }),
    field: 'sensors[1].sources[2].quantum', detail: /a "quantisation" row of a wheel-speed sensor does not use "quantum"/,
  },
  {
    name: 'quantum-contradicting-unit.json',
    doc: () => withRow(0, { id: 'lsb', kind: 'quantisation', value: 0.01, unit: 'deg/s', quantum: 'angle', provenance: 'hostile case', assumed: true }),
    field: 'sensors[0].sources[3].quantum', detail: /makes this a rate LSB; write "rate"/,
  },
  { name: 'bias-form-on-white-noise.json', doc: () => patched({ 'sensors[0].sources[0].biasForm': 'floor' }), field: 'sensors[0].sources[0].biasForm', detail: /a "white-noise" row of a yaw-gyro sensor does not use "biasForm"/ },
  { name: 'zero-gnss-noise.json', doc: () => patched({ 'sensors[2].sources[0].value': 0 }), field: 'sensors[2].sources[0].value', detail: /is 0, which tells the filter the gnss measurements are perfect \(R = 0/ },
  { name: 'array-literal.json', doc: () => patched({ [row0]: '={1,2}' }), field: row0, detail: /holds an array literal/ },
  { name: 'row-function.json', doc: () => patched({ [row0]: '=ROW()/10000' }), field: row0, detail: /uses ROW\(\), which depends on where the cell sits in the hidden sheet/ },
  { name: 'column-function.json', doc: () => patched({ [row0]: '=0.3*COLUMN()' }), field: row0, detail: /uses COLUMN\(\)/ },
  { name: 'rows-function.json', doc: () => patched({ [row0]: '=0.1*ROWS(cruise)' }), field: row0, detail: /uses ROWS\(\)/ },
  { name: 'sheets-function.json', doc: () => patched({ [row0]: '=0.3*sheets()' }), field: row0, detail: /uses SHEETS\(\)/ },
  { name: 'nested-150.json', doc: () => patched({ [row0]: `=${'('.repeat(150)}0.3${')'.repeat(150)}` }), field: row0, detail: /nests brackets 150 deep; at most 32 are allowed/ },
  {
    name: 'window-without-step.json', doc: () => patched({ 'requirements[0].window': { start: { value: 10.01, unit: 's' }, end: { value: 10.02, unit: 's' } } }),
    field: 'requirements[0].window', detail: /10\.01 s to 10\.02 s holds no step of the analysis \(a step every 0\.1 s; the nearest are 10 s and 10\.1 s\)/,
  },
];

describe('the silent-acceptance corpus', { timeout: 60_000 }, () => {
  it.each(CASES)('refuses $name at $field', async ({ name, doc, field, detail }) => {
    await expectCliRefusal(name, doc(), field, detail);
    expectViewRefusal(doc(), field);
  }, 60_000);

  it('keeps a formula mentioning ROW only inside a text literal', async () => {
    const file = writeCase('row-in-text.json', patched({ [row0]: '=0.3+0*LEN("ROW()")' }));
    const r = await runCli(['check', file]);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
  });

  it('refuses bytes that are not UTF-8 with the offset of the first one', async () => {
    const text = Buffer.from(JSON.stringify(baseDocument()), 'utf8');
    const at = text.indexOf('invented one-minute');
    const bytes = Buffer.concat([text.subarray(0, at), Buffer.from([0xc3, 0x28]), text.subarray(at)]);
    const file = writeCase('invalid-utf8.json', bytes);
    const r = await runCli(['run', file]);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`invalid-utf8.json: is not valid UTF-8 text: byte offset ${at} (0xc3)`);
    expect(hasStackTrace(r.err)).toBe(false);
  });

  it('accepts a real U+FFFD written in the text', async () => {
    const file = writeCase('replacement-char.json', patched({ description: 'a \uFFFD in the text' }));
    expect((await runCli(['check', file])).code).toBe(0);
  });

  it('refuses a 600 MB file as too large before reading it', async () => {
    const file = writeCase('huge.json', '');
    const fd = openSync(file, 'w');
    ftruncateSync(fd, 600e6);
    closeSync(fd);
    const r = await runCli(['run', file]);
    expect(r.code).toBe(2);
    expect(r.err).toContain('huge.json: is too large: 600000000 bytes');
  });
});
