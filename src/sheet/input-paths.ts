/**
 * Engine paths to document paths. The engine names a bad field in its
 * input (`sensors[0].sources[1].value.unit`); the user edits the document,
 * where that row may sit at another index (rows with failed cells are left
 * out of the input) and where a row's magnitude is the row's own
 * `value`/`unit` (`sensors[0].sources[2].unit`).
 */
import type { InputIndexMap } from './build-input';

/** The document index of input index `text`; the index itself when the map does not know it. */
function documentIndex(list: number[] | undefined, text: string): number {
  const i = Number(text);
  return list?.[i] ?? i;
}

function sensorPath(index: string, rest: string, map: InputIndexMap): string {
  const base = `sensors[${documentIndex(map.sensors, index)}]`;
  const m = /^\.(sources|outages|landmarks)\[(\d+)\](.*)$/.exec(rest);
  if (!m) return base + rest;
  const [, list, item, tail] = m;
  const j = documentIndex(map[list as 'sources' | 'outages' | 'landmarks'][Number(index)], item);
  // A row is itself a quantity in the document: input `value.unit` is the row's `unit`.
  const field = list === 'sources' ? tail.replace(/^\.value\.(value|unit)(?![A-Za-z])/, '.$1') : tail;
  return `${base}.${list}[${j}]${field}`;
}

/**
 * The document path of an engine input path, e.g. from an InputError's
 * `path` after `computeBudget(evaluation.input)` threw. Paths outside the
 * lists are mapped by name (`step` is `settings.step`,
 * `mission.initialSigma.position` is `mission.initialPosition`); anything
 * unknown comes back unchanged. Throws nothing.
 */
export function documentPathOf(inputPath: string, map: InputIndexMap): string {
  let m: RegExpExecArray | null;
  if ((m = /^step(?![A-Za-z])(.*)$/.exec(inputPath))) return `settings.step${m[1]}`;
  if ((m = /^mission\.initialSigma\.(position|heading)(.*)$/.exec(inputPath))) {
    return `mission.${m[1] === 'position' ? 'initialPosition' : 'initialHeading'}${m[2]}`;
  }
  if ((m = /^mission\.segments\[(\d+)\](.*)$/.exec(inputPath))) return `mission.segments[${documentIndex(map.segments, m[1])}]${m[2]}`;
  if ((m = /^(requirements|checkpoints)\[(\d+)\](.*)$/.exec(inputPath))) {
    return `${m[1]}[${documentIndex(map[m[1] as 'requirements' | 'checkpoints'], m[2])}]${m[3]}`;
  }
  if ((m = /^sensors\[(\d+)\](.*)$/.exec(inputPath))) return sensorPath(m[1], m[2], map);
  return inputPath;
}
