import { describe, expect, it } from 'vitest';
import { findAtom, spellingInOtherCase, UNIT_ATOMS } from '../../src/units/unit-atoms';
import { expectRelative } from './expect-relative';

describe('unit atoms', () => {
  it('has no spelling that names two atoms', () => {
    const spellings = UNIT_ATOMS.flatMap((a) => a.spellings);
    expect(new Set(spellings).size).toBe(spellings.length);
  });

  it('finds every atom by each of its spellings, canonical symbol first', () => {
    for (const atom of UNIT_ATOMS) {
      expect(atom.spellings[0]).toBe(atom.symbol);
      for (const s of atom.spellings) expect(findAtom(s)).toBe(atom);
    }
  });

  it('gives every atom a positive finite factor and a definition unless it is m, rad or s', () => {
    for (const atom of UNIT_ATOMS) {
      expect(atom.factorToSI > 0 && Number.isFinite(atom.factorToSI)).toBe(true);
      expect(atom.definition === undefined).toBe(['m', 'rad', 's'].includes(atom.symbol));
    }
  });

  it('reads g as standard gravity, not gram', () => {
    // 3rd CGPM 1901: g0 = 980.665 cm/s^2 = 9.80665 m/s^2 exactly
    expect(findAtom('g')?.factorToSI).toBe(9.80665);
    expect(findAtom('mg')?.factorToSI).toBe(9.80665e-3);
    expect(findAtom('µg')?.factorToSI).toBe(9.80665e-6);
  });

  it('defines the nautical mile as 1852 m and the knot as one nautical mile per hour', () => {
    // from memory: international nautical mile 1852 m exactly (IHO 1929)
    expect(findAtom('nmi')?.factorToSI).toBe(1852);
    expect(findAtom('kn')?.factorToSI).toBe(1852 / 3600);
  });

  it('derives degree, arcminute and arcsecond from π/180', () => {
    // computed: pure arithmetic
    expectRelative(findAtom('°')!.factorToSI, 0.017453292519943295, 1e-16);
    expectRelative(findAtom('arcmin')!.factorToSI * 60, findAtom('deg')!.factorToSI, 1e-15);
    expectRelative(findAtom('″')!.factorToSI * 3600, findAtom('deg')!.factorToSI, 1e-15);
  });

  it('accepts the micro sign, the Greek mu and u as spellings of micro', () => {
    expect(findAtom('µg')).toBe(findAtom('μg'));
    expect(findAtom('ug')).toBe(findAtom('μg'));
    expect('µ'.codePointAt(0)).toBe(0xb5);
    expect('μ'.codePointAt(0)).toBe(0x3bc);
  });

  it('suggests the right letter case for a miscased spelling and nothing for an unknown word', () => {
    expect(spellingInOtherCase('HZ')).toBe('Hz');
    expect(spellingInOtherCase('G')).toBe('g');
    expect(spellingInOtherCase('dg')).toBeUndefined();
  });
});
