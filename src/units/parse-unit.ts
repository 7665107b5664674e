/**
 * Parses a trade unit text ('deg/√h', 'ug/rtHz', 'm/s²') into its factor to SI
 * and its dimension.
 *
 * Grammar (products and quotients read left to right, so 'a/b/c' is a/(b·c)):
 *   unit     := '' | product
 *   product  := factor (('/' | '*' | '·' | nothing) factor)*
 *   factor   := root factor | primary power?
 *   root     := '√' | 'sqrt' | 'rt'            (a root covers the power after it: √h² = h)
 *   primary  := atom | '(' product ')' | '1' | 'rt'atom | 'sqrt'atom   ('rtHz', 'sqrth')
 *   power    := '^' exponent | superscripts ('²', '⁻¹')
 *   exponent := ['-'|'+'] number ['/' number] | '(' the same ')'   ('^0.5', '^1/2', '^(-1/2)')
 * Only whole and half powers are allowed in the result.
 */
import { InputError } from '../errors';
import { DIMENSIONLESS, multiplyDimensions, raiseDimension, type Dimension } from './dimension';
import { findAtom, spellingInOtherCase, type UnitAtom } from './unit-atoms';
import { tokenizeUnit, UnitTextProblem, type UnitMark, type UnitToken } from './unit-tokens';

/** A parsed unit. `factorToSI` multiplies a value in this unit to give SI (m, rad, s). */
export interface ParsedUnit {
  /** The text as given. */
  readonly text: string;
  /** Multiply a value in this unit by this to get the SI value; always finite and > 0. */
  readonly factorToSI: number;
  /** Exponents of m, rad and s, doubled. */
  readonly dimension: Dimension;
  /** The table atoms used, each once, in order of appearance (for provenance). */
  readonly atoms: readonly UnitAtom[];
}

/** The outcome of {@link readUnit}: a unit, or a problem in words. */
export type UnitReading =
  | { readonly ok: true; readonly unit: ParsedUnit }
  | { readonly ok: false; readonly kind: 'unknown' | 'syntax'; readonly problem: string };

/** Longer texts are refused: no real unit is this long, and it bounds the work. */
const MAX_UNIT_TEXT_CHARS = 64;
const ROOT_WORDS = ['sqrt', 'rt'];

interface Term {
  readonly factorToSI: number;
  readonly dimension: Dimension;
  readonly atoms: readonly UnitAtom[];
}

const ONE: Term = { factorToSI: 1, dimension: DIMENSIONLESS, atoms: [] };

function syntax(problem: string): UnitTextProblem {
  return new UnitTextProblem('syntax', problem);
}

function product(a: Term, b: Term): Term {
  const atoms = [...a.atoms, ...b.atoms.filter((x) => !a.atoms.includes(x))];
  return { factorToSI: a.factorToSI * b.factorToSI, dimension: multiplyDimensions(a.dimension, b.dimension), atoms };
}

/** x^(halfSteps/2), through Math.sqrt for the half so that √3600 is exactly 60. */
function powerOfHalfSteps(x: number, halfSteps: number): number {
  if (halfSteps < 0) return 1 / powerOfHalfSteps(x, -halfSteps);
  const whole = x ** Math.floor(halfSteps / 2);
  return halfSteps % 2 === 1 ? whole * Math.sqrt(x) : whole;
}

function raise(t: Term, exponentHalfSteps: number): Term {
  const dim = raiseDimension(t.dimension, exponentHalfSteps);
  if (dim === undefined) throw syntax(`raising to the power ${exponentHalfSteps / 2} here leaves a quarter power; only whole and half powers are allowed`);
  return { factorToSI: powerOfHalfSteps(t.factorToSI, exponentHalfSteps), dimension: dim, atoms: t.atoms };
}

function describe(token: UnitToken | undefined): string {
  if (token === undefined) return 'the end of the text';
  const text = token.kind === 'superscript' ? 'a superscript' : `'${token.text}'`;
  return `${text} at position ${token.at + 1}`;
}

function atomTerm(word: string): Term {
  const atom = findAtom(word);
  if (atom) return { factorToSI: atom.factorToSI, dimension: atom.dimension, atoms: [atom] };
  const root = ROOT_WORDS.find((r) => word.startsWith(r) && findAtom(word.slice(r.length)));
  if (root) return raise(atomTerm(word.slice(root.length)), 1);
  const other = spellingInOtherCase(word);
  const hint = other ? ` (units are case-sensitive: did you mean '${other}'?)` : '';
  throw new UnitTextProblem('unknown', `no unit is called '${word}'${hint}`);
}

/** Recursive-descent parser over the token list; see the grammar at the top of the file. */
class UnitParser {
  private pos = 0;

  constructor(private readonly tokens: readonly UnitToken[]) {}

  parseWhole(): Term {
    if (this.tokens.length === 0) return ONE;
    const result = this.product();
    if (this.peek()) throw syntax(`unexpected ${describe(this.peek())}`);
    return result;
  }

  private peek(): UnitToken | undefined {
    return this.tokens[this.pos];
  }

  private takeMark(mark: UnitMark): boolean {
    const t = this.peek();
    if (t?.kind !== 'mark' || t.text !== mark) return false;
    this.pos++;
    return true;
  }

  private takeRoot(): boolean {
    const t = this.peek();
    if (t?.kind !== 'word' || !ROOT_WORDS.includes(t.text)) return this.takeMark('√');
    this.pos++;
    return true;
  }

  private startsFactor(t: UnitToken | undefined): boolean {
    return t?.kind === 'word' || t?.kind === 'number' || (t?.kind === 'mark' && (t.text === '(' || t.text === '√'));
  }

  private product(): Term {
    let acc = this.factor();
    for (;;) {
      if (this.takeMark('/')) acc = product(acc, raise(this.factor(), -2));
      else if (this.takeMark('*') || this.startsFactor(this.peek())) acc = product(acc, this.factor());
      else return acc;
    }
  }

  private factor(): Term {
    if (this.takeRoot()) return raise(this.factor(), 1);
    const base = this.primary();
    const exponentHalfSteps = this.power();
    return exponentHalfSteps === undefined ? base : raise(base, exponentHalfSteps);
  }

  private primary(): Term {
    const t = this.peek();
    if (t?.kind === 'word' || (t?.kind === 'number' && Number(t.text) === 1)) {
      this.pos++;
      return t.kind === 'word' ? atomTerm(t.text) : ONE;
    }
    if (this.takeMark('(')) {
      const inner = this.product();
      if (!this.takeMark(')')) throw syntax(`expected ')' but found ${describe(this.peek())}`);
      return inner;
    }
    if (t?.kind === 'number') throw syntax(`the number '${t.text}' at position ${t.at + 1} is not a unit (only '1' is)`);
    throw syntax(`expected a unit but found ${describe(t)}`);
  }

  /** An optional power, as half-steps. */
  private power(): number | undefined {
    const t = this.peek();
    if (t?.kind === 'superscript') {
      this.pos++;
      return 2 * t.exponent;
    }
    if (!this.takeMark('^')) return undefined;
    const bracketed = this.takeMark('(');
    const halfSteps = this.exponent();
    if (bracketed && !this.takeMark(')')) throw syntax(`expected ')' after the power but found ${describe(this.peek())}`);
    return halfSteps;
  }

  private exponent(): number {
    const sign = this.takeMark('-') ? -1 : 1;
    if (sign === 1) this.takeMark('+');
    const numerator = this.number();
    const next = this.tokens[this.pos + 1];
    const denominator = next?.kind === 'number' && this.takeMark('/') ? this.number() : 1;
    const halfSteps = (sign * 2 * numerator) / denominator;
    if (!Number.isInteger(halfSteps)) {
      throw syntax(`the power ${sign * numerator}${denominator === 1 ? '' : `/${denominator}`} is not allowed; only whole and half powers are`);
    }
    return halfSteps;
  }

  private number(): number {
    const t = this.peek();
    if (t?.kind !== 'number') throw syntax(`expected a number for the power but found ${describe(t)}`);
    this.pos++;
    return Number(t.text);
  }
}

/**
 * Reads a unit text. Never throws: a text it cannot use comes back as
 * `{ ok: false, kind, problem }`, with `kind` 'unknown' for an unknown symbol
 * and 'syntax' for a malformed text. The empty text and '1' are a plain ratio.
 */
export function readUnit(text: string): UnitReading {
  if (text.length > MAX_UNIT_TEXT_CHARS) {
    return { ok: false, kind: 'syntax', problem: `a unit text has at most ${MAX_UNIT_TEXT_CHARS} characters` };
  }
  try {
    const term = new UnitParser(tokenizeUnit(text)).parseWhole();
    if (!Number.isFinite(term.factorToSI) || term.factorToSI === 0) {
      return { ok: false, kind: 'syntax', problem: 'its factor to SI is beyond the range of numbers; check the powers' };
    }
    return { ok: true, unit: { text, ...term } };
  } catch (e) {
    if (e instanceof UnitTextProblem) return { ok: false, kind: e.kind, problem: e.message };
    throw e;
  }
}

/**
 * The message for a unit text that failed to read, e.g.
 * "unknown unit 'dg/h' (no unit is called 'dg')". Throws nothing.
 */
export function unitProblemMessage(text: string, reading: UnitReading & { ok: false }): string {
  const lead = reading.kind === 'unknown' ? 'unknown unit' : 'cannot read the unit';
  return `${lead} '${text}' (${reading.problem})`;
}

/**
 * Parses a unit text.
 * @param path where the text sits in the input, for the error message.
 * @throws InputError naming `path` when the text is unknown or malformed.
 */
export function parseUnit(text: string, path: string): ParsedUnit {
  const reading = readUnit(text);
  if (!reading.ok) throw new InputError(path, unitProblemMessage(text, reading));
  return reading.unit;
}
