import { describe, expect, it } from 'vitest';
import { getAtPath, joinSteps, setAtPath, splitPath } from '../../src/document/document-path';

describe('document paths', () => {
  it('split and join round trip', () => {
    expect(splitPath('sensors[2].sources[1].value')).toEqual(['sensors', 2, 'sources', 1, 'value']);
    expect(joinSteps(['sensors', 2, 'sources', 1, 'value'])).toBe('sensors[2].sources[1].value');
  });

  it('read and write values inside a document', () => {
    const doc = { sensors: [{ sources: [{ value: 1 }, { value: 2 }] }] };
    expect(getAtPath(doc, 'sensors[0].sources[1].value')).toBe(2);
    setAtPath(doc, 'sensors[0].sources[1].value', '=3*2');
    expect(doc.sensors[0].sources[1].value).toBe('=3*2');
    expect(getAtPath(doc, 'sensors[4].sources')).toBeUndefined();
  });

  it('refuse malformed paths and prototype keys', () => {
    expect(() => splitPath('sensors[x]')).toThrow(/document path/);
    expect(() => splitPath('a.__proto__.b')).toThrow(/__proto__/);
    expect(() => setAtPath({}, 'a.b.c', 1)).toThrow(/no parent/);
  });
});
