/**
 * JSON text of a value, piece by piece, for results too large for one
 * string: `run --json` on a 10-hour mission at 0.1 s with 14 sources is
 * hundreds of megabytes, more than V8's longest string (about 512 MiB), so
 * one `JSON.stringify` throws "Invalid string length". The pieces joined are
 * exactly `JSON.stringify(value)` (without `significantDigits`); written one
 * by one, memory holds at most one piece of text at a time.
 */

/** Options of {@link jsonChunks}. */
export interface JsonChunkOptions {
  /** Round every number to this many significant digits (1-17); default: all (the shortest text that reads back exactly). */
  significantDigits?: number;
  /** Numbers of one array per piece; default 4096. */
  numbersPerChunk?: number;
}

/**
 * The JSON text of `value` in pieces, in order. Follows JSON.stringify's rules
 * for plain data: `undefined` and functions are left out of objects and
 * written `null` in arrays, non-finite numbers are `null`, `toJSON` is used.
 * @throws RangeError when `significantDigits` is not an integer from 1 to 17.
 */
export function* jsonChunks(value: unknown, options: JsonChunkOptions = {}): Generator<string> {
  const digits = options.significantDigits;
  if (digits !== undefined && !(Number.isInteger(digits) && digits >= 1 && digits <= 17)) {
    throw new RangeError(`significant digits must be an integer from 1 to 17, got ${digits}`);
  }
  const number = digits === undefined ? (x: number) => JSON.stringify(x) : (x: number) => (Number.isFinite(x) ? String(Number(x.toPrecision(digits))) : 'null');
  yield* chunksOf(value, number, options.numbersPerChunk ?? 4096);
}

function* chunksOf(value: unknown, number: (x: number) => string, perChunk: number): Generator<string> {
  const v = value !== null && typeof value === 'object' && typeof (value as { toJSON?: unknown }).toJSON === 'function'
    ? (value as { toJSON: () => unknown }).toJSON()
    : value;
  if (typeof v === 'number') {
    yield number(v);
  } else if (v === null || typeof v !== 'object') {
    yield JSON.stringify(v) ?? 'null';
  } else if (Array.isArray(v) || ArrayBuffer.isView(v)) {
    yield* arrayChunks(v as ArrayLike<unknown>, number, perChunk);
  } else {
    let first = true;
    yield '{';
    for (const [key, item] of Object.entries(v)) {
      if (item === undefined || typeof item === 'function' || typeof item === 'symbol') continue;
      yield `${first ? '' : ','}${JSON.stringify(key)}:`;
      first = false;
      yield* chunksOf(item, number, perChunk);
    }
    yield '}';
  }
}

function* arrayChunks(a: ArrayLike<unknown>, number: (x: number) => string, perChunk: number): Generator<string> {
  yield '[';
  let piece: string[] = [];
  for (let i = 0; i < a.length; i++) {
    const item = a[i];
    const sep = i > 0 ? ',' : '';
    if (typeof item === 'number') {
      piece.push(sep + number(item));
      if (piece.length >= perChunk) {
        yield piece.join('');
        piece = [];
      }
      continue;
    }
    if (piece.length) yield piece.join('');
    piece = [];
    yield sep;
    if (item === undefined || typeof item === 'function' || typeof item === 'symbol') yield 'null';
    else yield* chunksOf(item, number, perChunk);
  }
  if (piece.length) yield piece.join('');
  yield ']';
}
