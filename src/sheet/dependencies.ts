/**
 * Errors that travel along references. HyperFormula copies an error into
 * every cell that uses the failing one; the user needs to know which cell
 * to fix, so a cell that fails only because a name it uses fails is
 * re-worded to point there, and a circular reference is spelled out.
 * Errors the sheet adds itself (a cell that is neither number nor formula,
 * a grid position) travel the same way.
 */
import { nameKey } from '../document/names';
import { isFailure, type CellOutcome } from './cell-outcome';
import type { SheetCell } from './cell-list';
import { namesInFormula } from './formula-names';

/** Each cell's path with the paths of the named cells its formula uses. */
function referenceGraph(cells: SheetCell[]): { refs: Map<string, string[]>; nameOf: Map<string, string> } {
  const pathOfName = new Map<string, string>();
  const nameOf = new Map<string, string>();
  for (const c of cells) {
    // A repeated name is refused by the workbook, so the first cell keeps it, as in the engine.
    if (c.location.name === undefined || pathOfName.has(nameKey(c.location.name))) continue;
    pathOfName.set(nameKey(c.location.name), c.location.path);
    nameOf.set(c.location.path, c.location.name);
  }
  const refs = new Map<string, string[]>();
  for (const c of cells) {
    const used = namesInFormula(c.quantity.value).flatMap((n) => pathOfName.get(n) ?? []);
    refs.set(c.location.path, used);
  }
  return { refs, nameOf };
}

/** The shortest loop of references through `start`, as paths from `start` back to it, or undefined. */
function loopThrough(start: string, refs: Map<string, string[]>): string[] | undefined {
  const cameFrom = new Map<string, string>();
  const queue = [start];
  for (let k = 0; k < queue.length; k++) {
    for (const next of refs.get(queue[k]) ?? []) {
      if (next === start) {
        const chain = [queue[k]];
        while (chain[0] !== start) chain.unshift(cameFrom.get(chain[0])!);
        return [...chain, start];
      }
      if (!cameFrom.has(next)) {
        cameFrom.set(next, queue[k]);
        queue.push(next);
      }
    }
  }
  return undefined;
}

/** Marks every cell the engine found on a loop with the loop in its message; returns their paths. */
function markLoops(cells: SheetCell[], outcomes: Map<string, CellOutcome>, refs: Map<string, string[]>, nameOf: Map<string, string>): Set<string> {
  const onLoop = new Set<string>();
  for (const c of cells) {
    const outcome = outcomes.get(c.location.path);
    if (!outcome || !isFailure(outcome) || outcome.kind !== 'cycle') continue;
    const loop = loopThrough(c.location.path, refs);
    if (!loop) continue;
    onLoop.add(c.location.path);
    const chain = loop.map((p) => nameOf.get(p) ?? p).join(' → ');
    outcomes.set(c.location.path, { kind: 'cycle', message: `is part of a circular reference (${chain}); replace one formula in the loop with a number` });
  }
  return onLoop;
}

/**
 * Every path, each after the paths it uses (a depth-first post-order,
 * iterative so a long chain of references cannot overflow the stack). On a
 * loop the order is arbitrary; those cells are settled as cycles anyway.
 */
function usesFirst(cells: SheetCell[], refs: Map<string, string[]>): string[] {
  const order: string[] = [];
  const seen = new Set<string>();
  for (const c of cells) {
    const stack: { path: string; next: number }[] = [{ path: c.location.path, next: 0 }];
    while (stack.length > 0) {
      const top = stack[stack.length - 1];
      if (top.next === 0) {
        if (seen.has(top.path)) { stack.pop(); continue; }
        seen.add(top.path);
      }
      const uses = refs.get(top.path) ?? [];
      if (top.next < uses.length) stack.push({ path: uses[top.next++], next: 0 });
      else { stack.pop(); order.push(top.path); }
    }
  }
  return order;
}

/**
 * Re-words, in place, the outcome of every cell that fails (or would
 * compute from a failing cell) because a name it uses fails, and of every
 * cell on a circular reference. A message names the direct reference and
 * repeats the root cause, so the user knows which cell to fix.
 * Throws nothing.
 */
export function explainDependencies(cells: SheetCell[], outcomes: Map<string, CellOutcome>): void {
  const { refs, nameOf } = referenceGraph(cells);
  const onLoop = markLoops(cells, outcomes, refs, nameOf);
  const rootCause = new Map<string, string>();
  for (const path of usesFirst(cells, refs)) {
    const own = outcomes.get(path);
    const bad = onLoop.has(path) ? undefined : (refs.get(path) ?? []).find((r) => isFailure(outcomes.get(r) ?? { value: 0 }));
    if (bad !== undefined) {
      const root = rootCause.get(bad) ?? `${bad}: ${(outcomes.get(bad) as { message: string }).message}`;
      outcomes.set(path, { kind: 'dependency', message: `uses ${nameOf.get(bad) ?? bad}, which has an error (${root})` });
      rootCause.set(path, root);
    } else if (own && isFailure(own)) {
      rootCause.set(path, `${path}: ${own.message}`);
    }
  }
}
