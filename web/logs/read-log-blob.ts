/**
 * Reads a File (or any Blob) as text in slices, so that a log of any size
 * goes through the streaming parser a slice at a time and progress can be
 * reported between slices. UTF-8 is decoded in streaming mode, so a
 * character cut by a slice boundary comes out whole in the next piece.
 */
import type { LogProgress } from './log-protocol';

/** Bytes read per slice: large enough that slicing costs nothing, small enough for frequent progress. */
export const SLICE_BYTES = 1 << 20;

/** Counts line ends ('\n', or lone '\r' for old Mac files) in `text`. Throws nothing. */
export function countLineEnds(text: string): number {
  let n = 0;
  for (let i = text.indexOf('\n'); i >= 0; i = text.indexOf('\n', i + 1)) n++;
  if (n === 0 && text.indexOf('\r') >= 0) for (let i = text.indexOf('\r'); i >= 0; i = text.indexOf('\r', i + 1)) n++;
  return n;
}

/**
 * Feeds `blob` to `take` as text pieces, in order, and calls `progress`
 * after each slice.
 * @param take receives each decoded piece; what it throws stops the reading and is rethrown.
 * @param sliceBytes bytes per slice (default {@link SLICE_BYTES}).
 * @returns the progress at the end (all bytes read).
 */
export async function readBlobInSlices(
  blob: Blob,
  take: (text: string) => void,
  progress: (p: LogProgress) => void = () => {},
  sliceBytes = SLICE_BYTES,
): Promise<LogProgress> {
  const decoder = new TextDecoder('utf-8');
  const state: LogProgress = { linesRead: 0, bytesRead: 0, totalBytes: blob.size };
  for (let start = 0; start < blob.size; start += sliceBytes) {
    const bytes = await blob.slice(start, Math.min(blob.size, start + sliceBytes)).arrayBuffer();
    const text = decoder.decode(bytes, { stream: true });
    state.bytesRead += bytes.byteLength;
    state.linesRead += countLineEnds(text);
    if (text !== '') take(text);
    progress({ ...state });
  }
  const rest = decoder.decode();
  if (rest !== '') take(rest);
  return state;
}

/**
 * The first `maxBytes` of `blob` as text (for the header), decoded as
 * UTF-8; a character cut at the end is dropped. Throws nothing of its own.
 */
export async function readBlobStart(blob: Blob, maxBytes: number): Promise<string> {
  const bytes = await blob.slice(0, Math.min(blob.size, maxBytes)).arrayBuffer();
  return new TextDecoder('utf-8').decode(bytes, { stream: true });
}
