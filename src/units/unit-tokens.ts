/**
 * Splits a unit text into tokens for the unit parser.
 *
 * Spaces only separate tokens. The three multiplication signs '*', '·'
 * (U+00B7) and '⋅' (U+22C5) become one mark '*', so the parser sees a single
 * spelling of each operator.
 */

/** Operator and bracket marks after normalisation. */
export type UnitMark = '/' | '*' | '^' | '(' | ')' | '-' | '+' | '√';

/** One token; `at` is its 0-based character position in the text, for messages. */
export type UnitToken =
  | { readonly kind: 'word'; readonly text: string; readonly at: number }
  | { readonly kind: 'number'; readonly text: string; readonly at: number }
  | { readonly kind: 'mark'; readonly text: UnitMark; readonly at: number }
  | { readonly kind: 'superscript'; readonly exponent: number; readonly at: number };

/**
 * A unit text the parser cannot use. `kind` tells an unknown symbol ('dg')
 * from a malformed text ('deg//h'). Thrown and caught inside the units module
 * only; callers see an InputError.
 */
export class UnitTextProblem extends Error {
  constructor(readonly kind: 'unknown' | 'syntax', problem: string) {
    super(problem);
    this.name = 'UnitTextProblem';
  }
}

const MARKS: Readonly<Record<string, UnitMark>> = {
  '/': '/', '*': '*', '·': '*', '⋅': '*', '^': '^', '(': '(', ')': ')', '-': '-', '+': '+', '√': '√',
};
// Symbols that are whole units on their own and may touch letters ('°C' is '°' then 'C').
const SYMBOL_WORDS = new Set(['°', '′', '″', '%']);
const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';
const WORD_CHAR = /[A-Za-zµμ]/;
const NUMBER_AT = /^(\d+(\.\d*)?|\.\d+)/;

/** Reads a run of superscript characters ('²', '⁻¹') as an integer exponent. */
function readSuperscript(text: string, start: number): { exponent: number; end: number } {
  let end = start;
  const negative = text[end] === '⁻';
  if (negative) end++;
  let digits = '';
  while (end < text.length && SUPERSCRIPT_DIGITS.includes(text[end])) {
    digits += SUPERSCRIPT_DIGITS.indexOf(text[end]);
    end++;
  }
  if (digits === '') throw new UnitTextProblem('syntax', `'⁻' at position ${start + 1} needs superscript digits after it`);
  return { exponent: (negative ? -1 : 1) * Number(digits), end };
}

/** Reads the longest run of `pattern` characters from `start`. */
function readRun(text: string, start: number, pattern: RegExp): number {
  let end = start;
  while (end < text.length && pattern.test(text[end])) end++;
  return end;
}

/** Reads the token starting at `i`; `token` is undefined for white space. */
function readToken(text: string, i: number): { token?: UnitToken; end: number } {
  const c = text[i];
  if (/\s/.test(c)) return { end: i + 1 };
  if (MARKS[c] !== undefined) return { token: { kind: 'mark', text: MARKS[c], at: i }, end: i + 1 };
  if (SYMBOL_WORDS.has(c)) return { token: { kind: 'word', text: c, at: i }, end: i + 1 };
  if (c === '⁻' || SUPERSCRIPT_DIGITS.includes(c)) {
    const { exponent, end } = readSuperscript(text, i);
    return { token: { kind: 'superscript', exponent, at: i }, end };
  }
  const number = NUMBER_AT.exec(text.slice(i));
  if (number) return { token: { kind: 'number', text: number[0], at: i }, end: i + number[0].length };
  if (WORD_CHAR.test(c)) {
    const end = readRun(text, i, WORD_CHAR);
    return { token: { kind: 'word', text: text.slice(i, end), at: i }, end };
  }
  throw new UnitTextProblem('syntax', `the character '${c}' at position ${i + 1} cannot be part of a unit`);
}

/**
 * Tokenises a unit text. Throws {@link UnitTextProblem} (kind 'syntax') on a
 * character that cannot be part of a unit, naming it and its 1-based position.
 */
export function tokenizeUnit(text: string): UnitToken[] {
  const tokens: UnitToken[] = [];
  for (let i = 0; i < text.length; ) {
    const { token, end } = readToken(text, i);
    if (token) tokens.push(token);
    i = end;
  }
  return tokens;
}
