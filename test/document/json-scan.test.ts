import { describe, expect, it } from 'vitest';
import { scanJsonStructure } from '../../src/document/json-scan';

describe('scanJsonStructure', () => {
  it('finds nothing wrong in ordinary JSON, brackets inside strings included', () => {
    expect(scanJsonStructure('{"a": "[[[{{{\\"", "b": [1, {"c": 2}]}', 3)).toBeUndefined();
  });

  it('reports the path where nesting passes the limit', () => {
    expect(scanJsonStructure('{"a": [1, [[2]]]}', 3)).toEqual({ kind: 'too-deep', path: 'a[1][0]' });
  });

  it('reports a repeated key with its path, escaped spellings included', () => {
    expect(scanJsonStructure('{"s": [{"id": 1}, {"id": 2, "i\\u0064": 3}]}', 10)).toEqual({ kind: 'duplicate-key', path: 's[1].id', key: 'id' });
  });

  it('does not confuse the same key in sibling objects with a repeat', () => {
    expect(scanJsonStructure('[{"id": 1}, {"id": 2}]', 10)).toBeUndefined();
  });
});
