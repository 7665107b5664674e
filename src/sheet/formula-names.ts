/**
 * The names a formula mentions, read from its text. The sheet uses them to
 * say which cell an error came from ("uses gyro.bi, which has an error")
 * and to spell out a circular reference; HyperFormula does the evaluating.
 */
import { nameKey } from '../document/names';

// A name as HyperFormula reads one (letters include U+00C0-U+02AF). The look-behind keeps the
// exponent of 1e-7 from reading as a name; group 2 marks a function call, which is not a name.
const NAME_TOKEN = /(?<![A-Za-z\u00C0-\u02AF0-9_.$])([A-Za-z\u00C0-\u02AF_][A-Za-z\u00C0-\u02AF0-9_.]*)(\s*\()?/g;

/** A formula with its string literals ("..." with "" inside) blanked out. */
export function withoutStrings(formula: string): string {
  return formula.replace(/"(?:[^"]|"")*"?/g, (s) => ' '.repeat(s.length));
}

/**
 * The name keys (lower case) a cell's content mentions, in order of first
 * appearance; empty for a number. Words that are not names (TRUE) come
 * back too; callers keep those they know. Throws nothing.
 */
export function namesInFormula(content: unknown): string[] {
  if (typeof content !== 'string' || !content.startsWith('=')) return [];
  const names = new Set<string>();
  for (const m of withoutStrings(content.slice(1)).matchAll(NAME_TOKEN)) if (m[2] === undefined) names.add(nameKey(m[1]));
  return [...names];
}
