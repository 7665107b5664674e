import type { BudgetInput } from '../inputs/budget-input';
import type { InputIndexMap } from './build-input';
import type { CellError } from './cell-error';
import type { OmittedItem } from './cell-reader';

/**
 * What evaluating a budget's cells gives: the engine's input (when one can
 * be made), every bad cell with its location, and every good cell's
 * number.
 */
export interface SheetEvaluation {
  /** The evaluated budget, without the items listed in `omitted`; absent when `blocked`. */
  input?: BudgetInput;
  /** Why no input could be made: a start-pose or step cell failed, or no segment is left. */
  blocked?: string;
  /** Bad cells and units in document order; empty when everything evaluated. */
  cellErrors: CellError[];
  /** Each good value cell's number by document path (`sensors[0].sources[1].value`), in the cell's own unit. */
  cellValues: Map<string, number>;
  /** Items left out of `input` because one of their cells failed: the input is then partial (and optimistic for error rows). */
  omitted: OmittedItem[];
  /** Where each entry of the input's lists came from, for {@link documentPathOf}. */
  indexMap: InputIndexMap;
}
