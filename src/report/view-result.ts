import type { BudgetDocument } from '../document/budget-document';
import { evaluateBudgetDocument, documentPathOf } from '../sheet';
import type { CellError } from '../sheet/cell-error';
import type { OmittedItem } from '../sheet/cell-reader';
import type { SheetEvaluation } from '../sheet/sheet-evaluation';
import { computeBudget } from '../pipeline';
import { SigmaLedgerError } from '../errors';
import { levelSeries, limitDimension } from '../budget/levels';
import { fromSI, toSI } from '../units';
import { buildJsonResult, type JsonResult } from './json-result';
import { CAUTION } from './caution';

/** Most points a chart series gets; longer missions are thinned to every n-th step. */
export const MAX_CHART_POINTS = 1500;

/** A requirement's own series (its quantity at its level, in the limit's unit), for drawing against its limit. */
export interface RequirementCurve {
  id: string;
  /** Key of the chart it belongs to: heading, speed, horizontal, north, east, along-track, cross-track. */
  quantity: string;
  level: string;
  limit: number;
  unit: string;
  values: number[];
}

/** The nominal path and what the plan view marks on it. */
export interface PlanView {
  north: number[];
  east: number[];
  t: number[];
  landmarks: { sensorId: string; id: string; north: number; east: number }[];
  outages: { sensorId: string; id: string; startS: number; endS: number }[];
}

/** Everything the page shows after one recompute, as structured-clone-safe data. */
export interface ViewResult {
  title: string;
  caution: string;
  cellErrors: CellError[];
  omitted: OmittedItem[];
  /** Good cells' numbers by document path, in each cell's own unit. */
  cellValues: Record<string, number>;
  /** Why nothing could be computed (a start-pose cell failed, an engine input error), with the document path when known. */
  blocked?: { message: string; path?: string };
  result?: JsonResult;
  /** True when the view was computed without per-source contributions (a quick first answer; shares follow). */
  contributionsPending?: boolean;
  curves: RequirementCurve[];
  plan?: PlanView;
}

/**
/**
 * Evaluates a document's cells and runs the budget, for the page's compute
 * worker (and tests under Node): never throws for bad input; a problem comes
 * back in `blocked` or `cellErrors`. With `contributions: false` only the
 * totals are computed (several times faster): the page shows those first.
 */
export function computeView(doc: BudgetDocument, options: { contributions?: boolean } = {}): ViewResult {
  return viewFromSheet(doc, evaluateBudgetDocument(doc), options);
}

/** The view of a document whose cells are already evaluated (see view-session.ts, which keeps the sheet between edits). */
export function viewFromSheet(doc: BudgetDocument, sheet: SheetEvaluation, options: { contributions?: boolean } = {}): ViewResult {
  const base: ViewResult = {
    title: doc.title, caution: CAUTION, cellErrors: sheet.cellErrors, omitted: sheet.omitted,
    cellValues: Object.fromEntries(sheet.cellValues), curves: [],
  };
  if (!sheet.input) return { ...base, blocked: { message: sheet.blocked ?? 'nothing to compute' } };
  try {
    // The engine keeps only the steps a chart draws; verdicts and checkpoints are still exact.
    const r = computeBudget(sheet.input, { ...options, maxRecordedSteps: MAX_CHART_POINTS });
    const steps = Array.from(r.history.recordedSteps);
    const keep = (a: ArrayLike<number>) => steps.map((k) => a[k]);
    const curves = r.requirements.map((req) => {
      const spec = sheet.input!.requirements!.find((x) => x.id === req.id)!;
      const series = levelSeries(r.series, spec.quantity, spec.level, req.id);
      const dim = limitDimension(spec.quantity);
      return { id: req.id, quantity: spec.quantity, level: spec.level, limit: req.limit.value, unit: req.limit.unit, values: Array.from(series, (v) => fromSI(v, req.limit.unit, dim, req.id)) };
    });
    const plan: PlanView = {
      north: keep(r.trajectory.northM), east: keep(r.trajectory.eastM), t: keep(r.trajectory.tS),
      landmarks: sheet.input.sensors.flatMap((s) => (s.landmarks ?? []).map((l) => ({
        sensorId: s.id, id: l.id, north: toSI(l.north.value, l.north.unit, 'length', l.id), east: toSI(l.east.value, l.east.unit, 'length', l.id),
      }))),
      outages: r.model.streams.flatMap((s) => s.outages.map((o) => ({ sensorId: s.sensorId, id: o.id, startS: o.startS, endS: o.endS }))),
    };
    const pending = options.contributions === false;
    return { ...base, result: buildJsonResult(r, doc.title), curves, plan, ...(pending && { contributionsPending: true }) };
  } catch (e) {
    if (!(e instanceof SigmaLedgerError)) throw e;
    const path = e.path ? documentPathOf(e.path, sheet.indexMap) : undefined;
    return { ...base, blocked: { message: e.path ? e.message.slice(e.path.length + 2) : e.message, path } };
  }
}
