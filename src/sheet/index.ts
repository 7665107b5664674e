/**
 * The sheet: a budget document's cells evaluated with HyperFormula into the
 * engine's input, each bad cell reported in place.
 */
export { BudgetWorkbook } from './budget-workbook';
export { evaluateBudgetDocument } from './evaluate-budget-document';
export { documentPathOf } from './input-paths';
export { CONVERT_FUNCTION, registerUnitFunctions } from './unit-functions';
export type { BuiltInput, InputIndexMap } from './build-input';
export type { CellError, CellErrorKind, CellLocation } from './cell-error';
export type { OmittedItem } from './cell-reader';
export type { SheetEvaluation } from './sheet-evaluation';
export { CellSheet, type ReadCells } from './budget-workbook';
export { evaluateInertialDocument, InertialWorkbook, type InertialSheetEvaluation } from './inertial-workbook';
export type { InertialBuiltInput, InertialIndexMap } from './build-inertial-input';
