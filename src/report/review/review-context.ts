import type { BudgetDocument, QuantityCell } from '../../document/budget-document';
import type { BudgetInput } from '../../inputs/budget-input';
import type { BudgetResult } from '../../pipeline';
import type { SizingResult } from '../../budget/sizing';
import type { JsonResult } from '../json-result';
import { formatSignificant, withUnit } from '../../units';
import type { SimulationJson } from '../../simulation/simulation-json';
import type { FilterDesignResult } from '../../suboptimal/compute-filter-design';
import type { FilterDesignJson } from '../filter-design-json';
import type { SensitivityEntry } from '../../sensitivity/assumption-sensitivity';
import type { RSweep } from '../../suboptimal/r-sweep';

/** Who made the report and from which bytes, so a reviewer can rerun it. */
export interface ReportProvenance {
  /** The file name as given (CLI) or as opened on the page. */
  fileName: string;
  /** Lower-case hex SHA-256 of the document's bytes (the caller hashes: src/ has no crypto API). */
  documentSha256: string;
  /** Sigma Ledger's version (TOOL_VERSION). */
  toolVersion: string;
  /** A Monte Carlo study of this document (`simulate --json`), when the user gives one (sections/monte-carlo-section.ts). */
  simulation?: SimulationJson;
}

/** Everything a report section may read; built once per report. */
export interface ReviewContext extends ReportProvenance {
  document: BudgetDocument;
  input: BudgetInput;
  result: BudgetResult;
  /** The same object `sigma-ledger run --json` prints (every step kept). */
  json: JsonResult;
  /** Each good cell's number by document path (`sensors[0].sources[1].value`), in the cell's own unit. */
  cellValues: ReadonlyMap<string, number>;
  /** Sizing runs the document asks for, in its order. */
  sizing: SizingOutcome[];
  /** Cells that failed and were left out (the report is then partial). */
  problems: string[];
  /** The filter as tuned against the truth, when rows carry a `tuning` (its JSON as `run --json` prints it). */
  filterDesign?: { result: FilterDesignResult; json: FilterDesignJson };
  /** The assumption sensitivity, when asked for (or why it could not be run). */
  sensitivity?: { range: [number, number]; entries: SensitivityEntry[] } | { problem: string };
  /** The R sweeps asked for, in order. */
  rSweeps: (RSweep | { sensorId: string; problem: string })[];
}

/** A sizing run's answer, or why it could not be run (an unknown row or requirement). */
export type SizingOutcome = SizingResult | { requirementId: string; sourceId: string; problem: string };

/** Significant digits of numbers in the report's tables (the JSON result keeps full precision). */
export const REPORT_DIGITS = 4;

/** Digits of a formula's result beside the formula (a typed number is shown as typed). */
const FORMULA_DIGITS = 6;

/** A confidence level as the report prints it: '1sigma' -> '1σ', '95%' -> '95 %'. */
export const levelLabel = (level: string) => level.replace('sigma', 'σ').replace(/%$/, ' %');

/** A number as the report prints it. */
export const fmt = (x: number) => formatSignificant(x, REPORT_DIGITS);

/** A numeric table cell: shown with REPORT_DIGITS, full value kept. */
export const numCell = (value: number) => ({ text: fmt(value), value });

/**
 * A cell as written in the document at `path`, e.g. "0.02 deg/√h" or
 * "=bridgeLength/transitSpeed → 6.667 s" for a formula (its value from the sheet).
 */
export function writtenCell(ctx: ReviewContext, cell: QuantityCell | undefined, path: string): string {
  if (!cell) return '';
  if (typeof cell.value === 'number') return withUnit(formatSignificant(cell.value, 15), cell.unit);
  const v = ctx.cellValues.get(`${path}.value`);
  return `${cell.value} → ${v === undefined ? 'error' : withUnit(formatSignificant(v, FORMULA_DIGITS), cell.unit)}`;
}
