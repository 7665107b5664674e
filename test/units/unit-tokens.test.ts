import { describe, expect, it } from 'vitest';
import { tokenizeUnit, UnitTextProblem } from '../../src/units/unit-tokens';

const kinds = (text: string): string[] =>
  tokenizeUnit(text).map((t) => (t.kind === 'superscript' ? `sup${t.exponent}` : `${t.kind}:${t.text}`));

describe('tokenizeUnit', () => {
  it('uses spaces only to separate tokens', () => {
    expect(kinds(' deg / h ')).toEqual(['word:deg', 'mark:/', 'word:h']);
    expect(kinds('sqrt h')).toEqual(['word:sqrt', 'word:h']);
  });

  it('turns the three multiplication signs into one mark', () => {
    expect(kinds('m*s·m⋅s')).toEqual(['word:m', 'mark:*', 'word:s', 'mark:*', 'word:m', 'mark:*', 'word:s']);
  });

  it('reads the degree sign and the percent sign as words even when touching letters', () => {
    expect(kinds('°/h')).toEqual(['word:°', 'mark:/', 'word:h']);
    expect(kinds('°C')).toEqual(['word:°', 'word:C']);
    expect(kinds('%')).toEqual(['word:%']);
  });

  it('reads runs of superscripts as signed whole exponents', () => {
    expect(kinds('s⁻¹')).toEqual(['word:s', 'sup-1']);
    expect(kinds('h²')).toEqual(['word:h', 'sup2']);
    expect(kinds('m¹²')).toEqual(['word:m', 'sup12']);
  });

  it('reads decimal numbers for powers', () => {
    expect(kinds('h^0.5')).toEqual(['word:h', 'mark:^', 'number:0.5']);
    expect(kinds('h^.5')).toEqual(['word:h', 'mark:^', 'number:.5']);
  });

  it('refuses a superscript minus without digits, naming its position', () => {
    expect(() => tokenizeUnit('s⁻')).toThrow(/position 2/);
  });

  it('refuses a character that cannot be part of a unit, naming it and its position', () => {
    expect(() => tokenizeUnit('deg#h')).toThrow(UnitTextProblem);
    expect(() => tokenizeUnit('deg#h')).toThrow(/'#' at position 4/);
  });
});
