import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors';
import { dimension } from '../../src/units/dimension';
import { parseUnit, readUnit, type ParsedUnit } from '../../src/units/parse-unit';
import { expectRelative } from './expect-relative';

function parsed(text: string): ParsedUnit {
  const reading = readUnit(text);
  if (!reading.ok) throw new Error(`'${text}' did not parse: ${reading.problem}`);
  return reading.unit;
}

function problem(text: string): { kind: string; problem: string } {
  const reading = readUnit(text);
  if (reading.ok) throw new Error(`'${text}' parsed but should not`);
  return reading;
}

// Each spelling a datasheet may use, beside the canonical form it must equal.
const SPELLINGS: [string, string][] = [
  ['°/s/√Hz', 'deg/s/√Hz'],
  ['deg/s/sqrt(Hz)', 'deg/s/√Hz'],
  ['deg/s/sqrt Hz', 'deg/s/√Hz'],
  ['deg/s/rtHz', 'deg/s/√Hz'],
  ['deg/s/rt Hz', 'deg/s/√Hz'],
  ['deg/s/Hz^0.5', 'deg/s/√Hz'],
  ['deg/s/Hz^(1/2)', 'deg/s/√Hz'],
  ['deg/s/Hz^1/2', 'deg/s/√Hz'],
  ['deg·s⁻¹·Hz^(-1/2)', 'deg/s/√Hz'],
  ['deg/sqrt(h)', 'deg/√h'],
  ['°/√hr', 'deg/√h'],
  ['°/√(h)', 'deg/√h'],
  ['deg/sqrt h', 'deg/√h'],
  ['deg/rt h', 'deg/√h'],
  ['deg/rth', 'deg/√h'],
  ['dph/√Hz', 'deg/h/√Hz'],
  ['deg/h/√h', 'deg/h/√h'],
  ['°/hr/√hr', 'deg/h/√h'],
  ['(deg/h)/√h', 'deg/h/√h'],
  ['deg/h^1.5', 'deg/h/√h'],
  ['m/s/√h', 'm/s/√h'],
  ['m/s/sqrt(hr)', 'm/s/√h'],
  ['m s^-1 h^-0.5', 'm/s/√h'],
  ['µg/√Hz', 'µg/√Hz'],
  ['μg/√Hz', 'µg/√Hz'],
  ['ug/rtHz', 'µg/√Hz'],
  ['ug/sqrt(Hz)', 'µg/√Hz'],
  ['μg/√hz', 'µg/√Hz'],
  ['mg', 'mg'],
  ['m/s²', 'm/s^2'],
  ['m/s/s', 'm/s^2'],
  ['m*s^-2', 'm/s^2'],
  ['deg/h^2', 'deg/h²'],
  ['deg/h/h', 'deg/h²'],
  ['deg / h ^ 2', 'deg/h²'],
  ['deg/s', 'dps'],
  ['1/h', 'h^-1'],
  ['kt', 'kn'],
  ['nmi/h', 'kn'],
  ['km/h', 'km·h⁻¹'],
  ['µrad', 'urad'],
  ['°', 'deg'],
  ['″', 'arcsec'],
  ['′', 'arcmin'],
  ['sec', 's'],
  ['hz', 'Hz'],
  ['khz', 'kHz'],
  ['', '1'],
  ['  ', '1'],
  ['%/h^0', '%'],
];

describe('parseUnit', () => {
  it.each(SPELLINGS)("reads '%s' the same as '%s'", (spelling, canonical) => {
    const a = parsed(spelling);
    const b = parsed(canonical);
    expect(a.dimension).toEqual(b.dimension);
    expectRelative(a.factorToSI, b.factorToSI, 1e-15);
  });

  it('reads the empty text and 1 as a plain ratio', () => {
    for (const text of ['', '1']) {
      expect(parsed(text).factorToSI).toBe(1);
      expect(parsed(text).dimension).toEqual(dimension(0, 0, 0));
    }
  });

  it('computes half powers with a square root, so √h is exactly 60 √s', () => {
    // computed: pure arithmetic, √3600 = 60
    expect(parsed('√h').factorToSI).toBe(60);
    expect(parsed('1/√h').factorToSI).toBe(1 / 60);
    expect(parsed('√h').dimension).toEqual(dimension(0, 0, 0.5));
  });

  it('reads products and quotients left to right', () => {
    expect(parsed('m/s/s').dimension).toEqual(dimension(1, 0, -2));
    expect(parsed('m/s*s').dimension).toEqual(dimension(1, 0, 0));
  });

  it('lets a root cover the power after it, so √h² is h', () => {
    expect(parsed('√h²').factorToSI).toBe(3600);
    expect(parsed('(√h)^3').dimension).toEqual(dimension(0, 0, 1.5));
  });

  it('keeps a power after a slash as the power of one atom: h^2/s is h²/s', () => {
    expect(parsed('h^2/s').dimension).toEqual(dimension(0, 0, 1));
  });

  it('lists the table atoms used once each, in order of appearance', () => {
    expect(parsed('deg/h/√h').atoms.map((a) => a.symbol)).toEqual(['deg', 'h']);
    expect(parsed('µg/√Hz').atoms.map((a) => a.symbol)).toEqual(['µg', 'Hz']);
  });

  it('keeps the text as given', () => {
    expect(parsed(' deg/h ').text).toBe(' deg/h ');
  });

  it('reports an unknown symbol as unknown and names it', () => {
    expect(problem('dg/h')).toEqual({ ok: false, kind: 'unknown', problem: "no unit is called 'dg'" });
    expect(problem('gram').kind).toBe('unknown');
  });

  it('suggests the right letter case, since spellings are case-sensitive', () => {
    expect(problem('deg/HR').problem).toContain("did you mean 'hr'?");
    expect(problem('MG').problem).toContain("did you mean 'mg'?");
  });

  it.each([
    ['deg//h', "'/' at position 5"],
    ['deg/', 'the end of the text'],
    ['(deg/h', "expected ')'"],
    ['h^(1/2', "expected ')' after the power"],
    ['h^', 'expected a number for the power'],
    ['^2', "expected a unit but found '^'"],
    ['h^(1/3)', 'only whole and half powers'],
    ['h^0.25', 'only whole and half powers'],
    ['√√h', 'quarter power'],
    ['sqrt', 'the end of the text'],
    ['deg/h 2', "the number '2' at position 7 is not a unit"],
    ['h²^2', "unexpected '^'"],
    ['deg)', "unexpected ')'"],
    ['deg#h', "the character '#'"],
  ])("reports '%s' as malformed: %s", (text, fragment) => {
    const p = problem(text);
    expect(p.kind).toBe('syntax');
    expect(p.problem).toContain(fragment);
  });

  it('refuses powers whose factor to SI overflows or underflows', () => {
    expect(problem('h^999').problem).toContain('beyond the range of numbers');
    expect(problem('h^-999').problem).toContain('beyond the range of numbers');
  });

  it('refuses texts longer than 64 characters', () => {
    expect(problem('m'.repeat(65)).problem).toContain('at most 64 characters');
  });

  it('throws an InputError naming the path when the text cannot be read', () => {
    expect(() => parseUnit('dg/h', 'sensors[0].bias')).toThrow(InputError);
    expect(() => parseUnit('dg/h', 'sensors[0].bias')).toThrow("sensors[0].bias: unknown unit 'dg/h' (no unit is called 'dg')");
    expect(() => parseUnit('deg//h', 'x')).toThrow("x: cannot read the unit 'deg//h'");
  });
});
