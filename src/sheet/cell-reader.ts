/**
 * Reads evaluated quantities out of the document for the input builder,
 * and the bookkeeping of items left out because a cell failed.
 */
import type { QuantityCell } from '../document/budget-document';
import type { Quantity } from '../inputs/budget-input';

/** The number of the value cell at `path` (in its own unit), or undefined when the cell or its unit failed. */
export type CellLookup = (path: string) => number | undefined;

/** Something the input lacks because one of its cells failed. */
export interface OmittedItem {
  /** Document path of the item: `sensors[0].sources[2]`, `mission.segments[1]`. */
  path: string;
  /** The item in words: `row gyro.bi`, `segment 2`. */
  what: string;
}

/** Evaluated quantities by document path. */
export class QuantityReader {
  constructor(private readonly lookup: CellLookup) {}

  /** The evaluated `{ value, unit }` of the quantity at `path`, or undefined when its cell failed. */
  quantity(q: QuantityCell, path: string): Quantity | undefined {
    const value = this.lookup(`${path}.value`);
    return value === undefined ? undefined : { value, unit: q.unit };
  }

  /**
   * The evaluated quantities under `keys` of `owner` (at `path`), those
   * present only; undefined when any of them failed.
   */
  fields(owner: object, path: string, keys: readonly string[]): Record<string, Quantity> | undefined {
    const out: Record<string, Quantity> = {};
    for (const key of keys) {
      const q = (owner as Record<string, QuantityCell | undefined>)[key];
      if (q === undefined) continue;
      const read = this.quantity(q, `${path}.${key}`);
      if (read === undefined) return undefined;
      out[key] = read;
    }
    return out;
  }
}

/**
 * The entries of `list` (at `path`) that `make` can build, in order; the
 * document index of each kept entry is pushed to `kept`, and each entry
 * left out is pushed to `omitted`, described by `what`.
 */
export function keepBuilt<T, U>(
  list: readonly T[], path: string, make: (item: T, itemPath: string) => U | undefined,
  what: (item: T, index: number) => string, omitted: OmittedItem[], kept: number[],
): U[] {
  const out: U[] = [];
  list.forEach((item, i) => {
    const itemPath = `${path}[${i}]`;
    const built = make(item, itemPath);
    if (built === undefined) {
      omitted.push({ path: itemPath, what: what(item, i) });
      return;
    }
    out.push(built);
    kept.push(i);
  });
  return out;
}
