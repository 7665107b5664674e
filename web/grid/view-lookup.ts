/**
 * What the latest view says about one place in the document: a cell's
 * error or evaluated number, a problem that blocked the analysis, items
 * left out. Paths are document paths (`sensors[0].sources[1].value`).
 */
import type { CellError } from '../../src';
import type { ViewResult } from '../../src';

/** The error of the cell at `path` (a value cell path), if the view has one. Throws nothing. */
export function cellErrorAt(view: ViewResult | undefined, path: string): CellError | undefined {
  return view?.cellErrors.find((e) => e.location.path === path);
}

/** The evaluated number of the cell at `path`, in the cell's own unit. Throws nothing. */
export function cellValueAt(view: ViewResult | undefined, path: string): number | undefined {
  return view?.cellValues[path];
}

/** True when `path` is `prefix` or lies inside it (`a[0].b` is inside `a[0]`, `a[10]` is not). Throws nothing. */
export function isWithin(path: string, prefix: string): boolean {
  return path === prefix || path.startsWith(`${prefix}.`) || path.startsWith(`${prefix}[`);
}

/** The blocking problem when its path lies within `prefix`. Throws nothing. */
export function blockedWithin(view: ViewResult | undefined, prefix: string): string | undefined {
  const b = view?.blocked;
  return b?.path !== undefined && isWithin(b.path, prefix) ? b.message : undefined;
}

/** Cell errors within `prefix`, for counts on tabs and sensors. Throws nothing. */
export function errorsWithin(view: ViewResult | undefined, prefix: string): CellError[] {
  return view?.cellErrors.filter((e) => isWithin(e.location.path, prefix)) ?? [];
}

/** True when the item at `path` was left out of the analysis. Throws nothing. */
export function isOmitted(view: ViewResult | undefined, path: string): boolean {
  return view?.omitted.some((o) => o.path === path) ?? false;
}

/**
 * What to show beside an item (an outage, a landmark, a segment, a
 * requirement, a checkpoint): the blocking problem within it, or the error
 * of the item as a whole when the analysis refused and left it out (an
 * outage outside the mission, a window that holds no step). Errors of its
 * value cells are shown by the cells themselves. Throws nothing.
 */
export function itemProblem(view: ViewResult | undefined, prefix: string): string | undefined {
  return blockedWithin(view, prefix)
    ?? view?.cellErrors.find((e) => isWithin(e.location.path, prefix) && !/\.(value|unit)$/.test(e.location.path))?.message;
}
