/**
 * Text the command line prints, made safe for a terminal. A budget's title,
 * provenance, notes, units and a log's headers come from files anyone may
 * write; a control character in them (ESC[1A ESC[2K moves the cursor up and
 * erases a line) could overwrite the report on screen, and a bidirectional
 * override could make text read differently from what it is. Each such
 * character is printed as its \uXXXX escape instead; newlines and tabs stay.
 * The escape is also valid inside JSON strings, so `--json` output stays
 * valid JSON with the same meaning.
 */

/** C0 controls but tab and newline, DEL, C1 controls, line/paragraph separators, bidirectional embeddings, overrides and isolates. */
// eslint-disable-next-line no-control-regex -- matching control characters is the point.
const UNSAFE = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g;

/** `text` with every unsafe character replaced by its \uXXXX escape. Throws nothing. */
export function escapeTerminalText(text: string): string {
  return text.replace(UNSAFE, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}
