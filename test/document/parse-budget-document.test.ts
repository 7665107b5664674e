import { describe, expect, it } from 'vitest';
import {
  BudgetFileError,
  MAX_DEPTH,
  MAX_TEXT_CHARS,
  MIGRATIONS,
  parseBudgetDocument,
  serializeBudgetDocument,
  type BudgetDocument,
} from '../../src/document';
import { InputError } from '../../src/errors';
import { minimalDocument } from './minimal-document';

const FILE = 'test.budget.json';

/** The text of the minimal document after `change`. */
function textWith(change: (doc: Record<string, any>) => void): string {
  const doc = minimalDocument() as unknown as Record<string, any>;
  change(doc);
  return JSON.stringify(doc, null, 2);
}

/** The error parsing `text` throws. */
function errorOf(text: string): BudgetFileError {
  try {
    parseBudgetDocument(text, FILE);
  } catch (e) {
    expect(e).toBeInstanceOf(BudgetFileError);
    return e as BudgetFileError;
  }
  throw new Error('expected parseBudgetDocument to throw');
}

describe('parseBudgetDocument accepts valid files', () => {
  it('returns the document with no notes for a current file', () => {
    const { document, notes } = parseBudgetDocument(JSON.stringify(minimalDocument()), FILE);
    expect(document).toEqual(minimalDocument());
    expect(notes).toEqual([]);
  });

  it('round-trips a canonical file byte for byte', () => {
    const canonical = serializeBudgetDocument(minimalDocument());
    expect(serializeBudgetDocument(parseBudgetDocument(canonical, FILE).document)).toBe(canonical);
  });

  it('accepts a leading byte-order mark', () => {
    expect(() => parseBudgetDocument(`\uFEFF${JSON.stringify(minimalDocument())}`, FILE)).not.toThrow();
  });
});

describe('parseBudgetDocument refuses structural errors with the path of the first problem', () => {
  it('names the file and is an InputError', () => {
    const e = errorOf('{');
    expect(e).toBeInstanceOf(InputError);
    expect(e.fileName).toBe(FILE);
    expect(e.message.startsWith(`${FILE}: `)).toBe(true);
  });

  it('gives a line and column for invalid JSON when the parser reports a position', () => {
    const e = errorOf('{\n  "format": "sigma-ledger-budget",\n}');
    expect(e.message).toMatch(/is not valid JSON near line 3, column 1/);
  });

  it('reports a cell that is neither a number nor a formula at the cell', () => {
    const e = errorOf(textWith((d) => { d.sensors[1].sources[0].value = 'one'; }));
    expect(e.path).toBe('sensors[1].sources[0].value');
    expect(e.message).toContain("must be a number or a formula starting with '='");
  });

  it('reports a cell of the wrong type (true) at the cell', () => {
    const e = errorOf(textWith((d) => { d.mission.segments[0].duration.value = true; }));
    expect(e.path).toBe('mission.segments[0].duration.value');
    expect(e.message).toContain("must be a number or a formula starting with '='");
  });

  it('reports a missing key at the key, with what it is for', () => {
    const e = errorOf(textWith((d) => { delete d.sensors[0].sources[1].provenance; }));
    expect(e.path).toBe('sensors[0].sources[1].provenance');
    expect(e.message).toContain('is missing; add it (where the number came from)');
  });

  it('reports an unknown kind with the kinds allowed', () => {
    const e = errorOf(textWith((d) => { d.sensors[0].sources[0].kind = 'white'; }));
    expect(e.path).toBe('sensors[0].sources[0].kind');
    expect(e.message).toContain('"white-noise"');
  });

  it('reports a bad id with the rule for ids', () => {
    const e = errorOf(textWith((d) => { d.sensors[0].id = 'my gyro'; }));
    expect(e.path).toBe('sensors[0].id');
    expect(e.message).toContain('must be an id: a letter, then letters, digits');
  });

  it('reports a unit that is not a text', () => {
    const e = errorOf(textWith((d) => { d.settings.step.unit = 1; }));
    expect(e.path).toBe('settings.step.unit');
    expect(e.message).toContain('must be a text');
  });

  it('refuses an unknown key with its path and the keys allowed', () => {
    const e = errorOf(textWith((d) => { d.sensors[0].sources[1].colour = 'red'; }));
    expect(e.path).toBe('sensors[0].sources[1].colour');
    expect(e.message).toContain('"colour" is not a key this format knows');
    expect(e.message).toContain('correlationTime');
  });

  it('refuses a named value whose name is not usable', () => {
    const e = errorOf(textWith((d) => { d.values['cruise speed'] = { value: 1, unit: 'm' }; }));
    expect(e.path).toBe('values.cruise speed');
  });

  it('refuses too many sensors', () => {
    const e = errorOf(textWith((d) => { d.sensors = Array.from({ length: 33 }, () => d.sensors[0]); }));
    expect(e.path).toBe('sensors');
    expect(e.message).toContain('at most 32');
  });

  it('refuses a file that is not a budget', () => {
    expect(errorOf('[1, 2]').path).toBe('');
    expect(errorOf('{"format": "something-else", "formatVersion": 1}').path).toBe('format');
  });
});

describe('parseBudgetDocument is safe to open', () => {
  it.each(['__proto__', 'constructor', 'prototype'])('rejects the key %s anywhere', (key) => {
    const text = textWith((d) => { d.sensors[1].sources[0].note = 'x'; }).replace('"note": "x"', `"${key}": {}`);
    const e = errorOf(text);
    expect(e.path).toBe(`sensors[1].sources[0].${key}`);
    expect(e.message).toContain(`the key "${key}" is not allowed`);
  });

  it('rejects __proto__ as a named value, which JSON.parse makes an own property', () => {
    const text = JSON.stringify(minimalDocument()).replace('"cruiseSpeed"', '"__proto__"');
    expect(errorOf(text).path).toBe('values.__proto__');
  });

  it('refuses text over the size limit before parsing it', () => {
    const e = errorOf(' '.repeat(MAX_TEXT_CHARS + 1));
    expect(e.message).toContain(`limited to ${MAX_TEXT_CHARS}`);
  });

  it('refuses nesting deeper than the limit, at the path where it happens', () => {
    const deep = `${'['.repeat(MAX_DEPTH)}${']'.repeat(MAX_DEPTH)}`;
    const e = errorOf(`{"format": "sigma-ledger-budget", "values": ${deep}}`);
    // The root and the first MAX_DEPTH - 1 lists are open; the next list starts inside the last of them.
    expect(e.path).toBe(`values${'[0]'.repeat(MAX_DEPTH - 1)}`);
    expect(e.message).toContain(`deeper than ${MAX_DEPTH}`);
  });

  it('refuses a key written twice in one object', () => {
    const text = textWith(() => {}).replace('"kind": "wheel-speed",', '"kind": "wheel-speed", "kind": "compass",');
    const e = errorOf(text);
    expect(e.path).toBe('sensors[1].kind');
    expect(e.message).toContain('written twice');
  });
});

describe('parseBudgetDocument checks ids and names', () => {
  it('refuses two sensors whose ids differ only in case, because formula names ignore case', () => {
    const e = errorOf(textWith((d) => { d.sensors[1].id = 'Gyro'; }));
    expect(e.path).toBe('sensors[1].id');
    expect(e.message).toContain('sensors[0].id as "gyro"');
  });

  it('refuses two rows of one sensor with the same id', () => {
    expect(errorOf(textWith((d) => { d.sensors[0].sources[1].id = 'arw'; })).path).toBe('sensors[0].sources[1].id');
  });

  it('refuses the reserved sensor id "mission"', () => {
    expect(errorOf(textWith((d) => { d.sensors[1].id = 'mission'; })).message).toContain('reserved');
  });

  it('refuses a named value that looks like a cell reference, with our own message', () => {
    const e = errorOf(textWith((d) => { d.values.ARW1 = { value: 1, unit: 'deg/√h' }; }));
    expect(e.path).toBe('values.ARW1');
    expect(e.message).toContain('looks like a cell reference (column ARW, row 1)');
    expect(e.message).toContain('"ARW_1"');
  });

  it('refuses duplicate requirement ids', () => {
    expect(errorOf(textWith((d) => { d.requirements.push({ ...d.requirements[0] }); })).path).toBe('requirements[1].id');
  });
});

describe('parseBudgetDocument and format versions', () => {
  it('refuses a newer version with the versions in the message', () => {
    const e = errorOf(textWith((d) => { d.formatVersion = 7; }));
    expect(e.path).toBe('formatVersion');
    expect(e.message).toContain('this file is format version 7; this tool reads up to version 2 — update Sigma Ledger');
  });

  it('refuses an older version that has no migration', () => {
    expect(errorOf(textWith((d) => { d.formatVersion = 0; })).message).toContain('no migration to version 1');
  });

  it('refuses a missing version', () => {
    expect(errorOf(textWith((d) => { delete d.formatVersion; })).path).toBe('formatVersion');
  });

  it('migrates an older version through the registry and returns a note', () => {
    // A made-up version 0 that called the step "timeStep" at the top level.
    const v0 = textWith((d) => { d.formatVersion = 0; d.timeStep = d.settings.step; delete d.settings; });
    const migrations = new Map([...MIGRATIONS, [0, {
      from: 0,
      note: 'timeStep moved into settings.step',
      migrate: ({ timeStep, ...rest }: Record<string, unknown>) => ({ ...rest, settings: { step: timeStep } }),
    }]]);
    const { document, notes } = parseBudgetDocument(v0, FILE, { migrations });
    expect(document.formatVersion).toBe(2);
    expect(document.model).toBe('planar');
    expect(document.settings.step).toEqual({ value: 1, unit: 's' });
    expect(notes).toEqual([
      'Migrated from format version 0 to 1: timeStep moved into settings.step',
      'Migrated from format version 1 to 2: the budget now names its error model ("model": "planar"); nothing else changed',
    ]);
  });

  it('validates the migrated document against the current schema', () => {
    const v0 = textWith((d) => { d.formatVersion = 0; });
    const migrations = new Map([...MIGRATIONS, [0, { from: 0, note: 'adds junk', migrate: (raw: Record<string, unknown>) => ({ ...raw, junk: 1 }) }]]);
    expect(() => parseBudgetDocument(v0, FILE, { migrations })).toThrow(/junk/);
  });
});

describe('the document type', () => {
  it('matches what the parser returns for the minimal document', () => {
    const doc: BudgetDocument = parseBudgetDocument(JSON.stringify(minimalDocument()), FILE).document;
    expect(doc.sensors.map((s) => s.id)).toEqual(['gyro', 'odo']);
  });
});
