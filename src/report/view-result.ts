import type { BudgetDocument } from '../document/budget-document';
import { evaluateBudgetDocument } from '../sheet';
import type { CellError } from '../sheet/cell-error';
import type { OmittedItem } from '../sheet/cell-reader';
import type { SheetEvaluation } from '../sheet/sheet-evaluation';
import { analyseParsedDocument } from '../analyse-parsed-document';
import { toSI } from '../units';
import { requirementSeries } from './requirement-curves';
import { keptSteps, type JsonResult } from './json-result';
import { prepareBudget } from '../pipeline';
import { dropRefusedItems } from '../sheet/drop-refused-items';
import { CAUTION } from './caution';
import { hasFilterDesign } from '../suboptimal/filter-rows';
import { computeFilterDesign } from '../suboptimal/compute-filter-design';
import { buildFilterDesignJson } from './filter-design-json';
import type { InertialView } from './inertial-view-result';

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
  /** A 3-D budget's series, shares, verdicts and path (inertial-view-result.ts); `result` and `plan` are then absent. */
  inertial?: InertialView;
}

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
export function viewFromSheet(doc: BudgetDocument, evaluated: SheetEvaluation, options: { contributions?: boolean } = {}): ViewResult {
  // Items the engine refuses (a unit of the wrong kind for the row) are left out and shown in place, like cell errors.
  const sheet = dropRefusedItems(doc, evaluated, (input) => prepareBudget(input, options));
  const a = analyseParsedDocument(doc, [], { evaluate: () => sheet, contributions: options.contributions, report: { maxPoints: MAX_CHART_POINTS } });
  const base: ViewResult = {
    title: doc.title, caution: CAUTION, cellErrors: sheet.cellErrors, omitted: sheet.omitted,
    cellValues: Object.fromEntries(sheet.cellValues), curves: [],
  };
  if (!a.budget || !a.report || !sheet.input) return { ...base, blocked: a.blocked ?? { message: 'nothing to compute' } };
  const r = a.budget;
  const input = sheet.input;
  const every = Math.ceil(r.trajectory.tS.length / MAX_CHART_POINTS);
  const steps = keptSteps(r.trajectory.tS.length, every);
  const keep = (values: ArrayLike<number>) => steps.map((k) => values[k]);
  const curves = requirementSeries(r).map((c) => ({ ...c, values: keep(c.values) }));
  const plan: PlanView = {
    north: keep(r.trajectory.northM), east: keep(r.trajectory.eastM), t: keep(r.trajectory.tS),
    landmarks: input.sensors.flatMap((s) => (s.landmarks ?? []).map((l) => ({
      sensorId: s.id, id: l.id, north: toSI(l.north.value, l.north.unit, 'length', l.id), east: toSI(l.east.value, l.east.unit, 'length', l.id),
    }))),
    outages: r.model.streams.flatMap((s) => s.outages.map((o) => ({ sensorId: s.sensorId, id: o.id, startS: o.startS, endS: o.endS }))),
  };
  const pending = options.contributions === false;
  const result: JsonResult = a.report;
  if (hasFilterDesign(input.sensors)) {
    const design = computeFilterDesign(input, r, { contributions: options.contributions });
    result.filterDesign = buildFilterDesignJson(design, r.model, input, every);
  }
  return { ...base, result, curves, plan, ...(pending && { contributionsPending: true }) };
}
