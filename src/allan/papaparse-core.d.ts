/**
 * The part of papaparse 5.7 that the log parser uses, declared here and
 * imported through the package's main file ('papaparse/papaparse.js').
 *
 * Why not `import Papa from 'papaparse'`: @types/papaparse begins with
 * `/// <reference types="node" />`, so importing it from the pure engine
 * makes Node's globals (process, Buffer) type-check everywhere in src/ and
 * silently defeats src/tsconfig.json's `types: []` (checked: a file using
 * `process` then compiles).
 */
declare module 'papaparse/papaparse.js' {
  /** A problem papaparse found; `row` counts the rows of the parsed text from 0. */
  export interface PapaParseError {
    type: string;
    code: string;
    message: string;
    row?: number;
  }

  /** Rows as arrays of cell texts (header: false, no dynamic typing). */
  export interface PapaParseResult {
    data: string[][];
    errors: PapaParseError[];
    meta: { delimiter: string; linebreak: string; cursor: number };
  }

  /** The options the parser passes. */
  export interface PapaParseConfig {
    delimiter?: string;
    newline?: string;
    header?: false;
    dynamicTyping?: false;
    skipEmptyLines?: false;
  }

  const Papa: {
    /** Parses a whole string synchronously. */
    parse(input: string, config?: PapaParseConfig): PapaParseResult;
  };
  export default Papa;
}
