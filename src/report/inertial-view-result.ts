/**
 * The page's view of a 3-D (inertial) budget: the cells evaluated, the
 * inertial model run (runInertialBudget, docs/inertial-model.md), and what
 * the page draws, built on the shared 3-D analysis (analyseInertialDocument:
 * refused items left out in place, requirements judged by src/budget/),
 * thinned to at most MAX_CHART_POINTS steps: every 3-D
 * quantity's 1σ in display units, CEP and R95, calibration sigmas per axis,
 * each source's share traced to its document row, requirement verdicts,
 * the path seen from above and its height over distance.
 */
import type { InertialBudgetDocument } from '../document/inertial-document';
import { analyseInertialDocument } from '../analyse-inertial-document';
import type { InertialBudgetResult } from '../inertial-pipeline';
import type { InertialBudget } from '../inertial/run-inertial';
import { inertialLevelValues, inertialLimitDimension } from '../budget/inertial-requirements';
import type { RequirementResult } from '../budget/requirements';
import type { InertialSheetEvaluation } from '../sheet/inertial-workbook';
import { fromSI, toSI, type DimensionName } from '../units';
import { CAUTION } from './caution';
import { keptSteps } from './json-result';
import { MAX_CHART_POINTS, type RequirementCurve, type ViewResult } from './view-result';

/** Display unit and dimension of each SI unit of the 3-D outputs and calibration states. */
const DISPLAY: Record<string, { unit: string; dimension: DimensionName }> = {
  m: { unit: 'm', dimension: 'length' },
  'm/s': { unit: 'm/s', dimension: 'speed' },
  rad: { unit: 'deg', dimension: 'angle' },
  'rad/s': { unit: 'deg/h', dimension: 'angular-rate' },
  'm/s²': { unit: 'mg', dimension: 'acceleration' },
  '1': { unit: 'ppm', dimension: 'ratio' },
};

/** The display unit of an SI unit and the factor from SI to it (SI itself when the table lacks it). */
function display(unitSI: string): { unit: string; factor: number } {
  const d = DISPLAY[unitSI];
  return d ? { unit: d.unit, factor: fromSI(1, d.unit, d.dimension, unitSI) } : { unit: unitSI, factor: 1 };
}

/** One line of a 3-D chart: 1σ (or a radius) in `unit` per kept step. */
export interface InertialLine {
  id: string;
  label: string;
  unit: string;
  values: number[];
}

/** A source's share of one quantity's variance at the mission's end, traced to the document. */
export interface InertialShareEntry {
  sourceId: string;
  label: string;
  /** Document path of the row (or mission uncertainty) that owns the source. */
  path?: string;
  /** Variance per kept step, in the quantity's display unit squared. */
  variance: number[];
}

/** A requirement's verdict as the page shows it: the shared result, in the limit's unit, plus when it first fails. */
export interface InertialViewVerdict {
  id: string;
  quantity: string;
  level: string;
  pass: boolean;
  limit: number;
  unit: string;
  worst: number;
  worstAtS: number;
  /** First time in the window the value exceeds the limit (s); absent when it never does. */
  firstExceedS?: number;
  /** The window, s (the whole mission without one). */
  windowS: [number, number];
  /** Document path of the requirement. */
  path: string;
}

/** The 3-D parts of a view. */
export interface InertialView {
  t: number[];
  /** Every INERTIAL_QUANTITIES entry by id, then `cep` and `r95`. */
  lines: Record<string, InertialLine>;
  /** Total 1σ of each calibration state (per axis), in display units. */
  calibration: InertialLine[];
  /** Per quantity id, each source's variance over time (empty while contributions are pending). */
  shares: Record<string, InertialShareEntry[]>;
  verdicts: InertialViewVerdict[];
  /** The nominal path: north, east (m), height (m) and horizontal distance travelled (m) per kept step. */
  path: { north: number[]; east: number[]; height: number[]; distanceM: number[] };
  outages: { sensorId: string; id: string; startS: number; endS: number }[];
  /** Numerical conditions the run met, in words. */
  issues: string[];
}

/** Document path of the item owning a source id (`imu.gArw`, `mission.initialTilt`). */
function ownerPath(doc: InertialBudgetDocument, sourceId: string): string | undefined {
  const [sensorId, rowId] = sourceId.split('.');
  if (sensorId === 'mission') return `mission.${rowId}`;
  const s = doc.sensors.findIndex((e) => e.id === sensorId);
  const r = s < 0 ? -1 : doc.sensors[s].sources.findIndex((row) => row.id === rowId);
  return r < 0 ? undefined : `sensors[${s}].sources[${r}]`;
}

function horizontalDistance(b: InertialBudget): number[] {
  let d = 0;
  return b.rows.map((row, k) => {
    if (k > 0) d += Math.hypot(row.northM - b.rows[k - 1].northM, row.eastM - b.rows[k - 1].eastM);
    return d;
  });
}

/** The shared verdict with the first time the requirement's value exceeds its limit in its window. */
function viewVerdict(b: InertialBudget, r: RequirementResult<string>, path: string): InertialViewVerdict {
  const limitSI = toSI(r.limit.value, r.limit.unit, inertialLimitDimension(r.quantity), `${path}.limit`);
  const values = inertialLevelValues(b, r.quantity, r.level);
  const k = b.rows.findIndex((row, i) => row.tS >= r.windowStartS && row.tS <= r.windowEndS && values[i] > limitSI);
  return {
    id: r.id,
    quantity: r.quantity,
    level: r.level,
    pass: r.verdict === 'pass',
    limit: r.limit.value,
    unit: r.limit.unit,
    worst: r.worstValue,
    worstAtS: r.worstTimeS,
    ...(k >= 0 && { firstExceedS: b.rows[k].tS }),
    windowS: [r.windowStartS, r.windowEndS],
    path,
  };
}

function buildView(
  doc: InertialBudgetDocument,
  sheet: InertialSheetEvaluation,
  result: InertialBudgetResult,
): { inertial: InertialView; curves: RequirementCurve[] } {
  const input = sheet.input!;
  const b = result.budget;
  const steps = keptSteps(b.rows.length, Math.ceil(b.rows.length / MAX_CHART_POINTS));
  const keep = (a: ArrayLike<number>, f = 1) => steps.map((k) => a[k] * f);
  const lines: Record<string, InertialLine> = {};
  const shares: Record<string, InertialShareEntry[]> = {};
  for (const s of Object.values(b.series)) {
    const { unit, factor: f } = display(s.unitSI);
    lines[s.id] = { id: s.id, label: s.label, unit, values: keep(s.sigma, f) };
    shares[s.id] = s.varianceBySource.map((v, i) => ({
      sourceId: b.model.sources[i].id,
      label: b.model.sources[i].label,
      path: ownerPath(doc, b.model.sources[i].id),
      variance: keep(v, f * f),
    }));
  }
  lines.cep = { id: 'cep', label: 'CEP (horizontal, 50 %)', unit: 'm', values: keep(b.cepM) };
  lines.r95 = { id: 'r95', label: 'R95 (horizontal, 95 %)', unit: 'm', values: keep(b.r95M) };
  const calibration = Object.entries(b.calibrationSigma).map(([name, sigma]) => {
    const { unit, factor } = display(b.model.states.find((s) => s.name === name)?.unitSI ?? '1');
    return { id: name, label: name, unit, values: keep(sigma, factor) };
  });
  const verdicts = result.requirements.map((r, i) =>
    viewVerdict(b, r, `requirements[${sheet.indexMap.requirements[i]}]`),
  );
  const curves: RequirementCurve[] = result.requirements.map((r, i) => {
    const perSI = fromSI(1, r.limit.unit, inertialLimitDimension(r.quantity), verdicts[i].path);
    return {
      id: r.id,
      quantity: r.quantity,
      level: r.level,
      limit: r.limit.value,
      unit: r.limit.unit,
      values: keep(inertialLevelValues(b, r.quantity, r.level), perSI),
    };
  });
  const distance = horizontalDistance(b);
  const inertial: InertialView = {
    t: keep(Float64Array.from(b.rows, (r) => r.tS)),
    lines,
    calibration,
    shares,
    verdicts,
    path: {
      north: keep(Float64Array.from(b.rows, (r) => r.northM)),
      east: keep(Float64Array.from(b.rows, (r) => r.eastM)),
      height: keep(Float64Array.from(b.rows, (r) => r.heightM)),
      distanceM: keep(distance),
    },
    outages: inertialOutages(input),
    issues: b.run.issues.map((i) => `${i.kind} at ${i.tS} s: ${i.detail}`),
  };
  return { inertial, curves };
}

function inertialOutages(input: NonNullable<InertialSheetEvaluation['input']>): InertialView['outages'] {
  const seconds = (q: { value: number; unit: string }, p: string) => toSI(q.value, q.unit, 'time', p);
  return input.aiding.flatMap((s) =>
    (s.outages ?? []).map((o, j) => ({
      sensorId: s.id,
      id: o.id ?? String(j + 1),
      startS: seconds(o.start, s.id),
      endS: seconds(o.end, s.id),
    })),
  );
}

/**
 * The view of a 3-D document whose cells are evaluated (the page's worker,
 * through ViewSession). Never throws for bad input: an engine refusal
 * comes back as `blocked` with the document path of the field and as an
 * error on that cell, so the page shows it in place and keeps the text.
 */
export function inertialViewFromSheet(
  doc: InertialBudgetDocument,
  evaluated: InertialSheetEvaluation,
  options: { contributions?: boolean } = {},
): ViewResult {
  const a = analyseInertialDocument(doc, [], {
    evaluate: () => evaluated,
    contributions: options.contributions !== false,
    report: false,
  });
  const sheet = a.sheet;
  const base: ViewResult = {
    title: doc.title,
    caution: CAUTION,
    cellErrors: sheet.cellErrors,
    omitted: sheet.omitted,
    cellValues: Object.fromEntries(sheet.cellValues),
    curves: [],
  };
  if (!a.budget || !sheet.input) {
    const blocked = a.blocked ?? { message: 'nothing to compute' };
    // A refusal at a cell is also that cell's error (the path names the cell), so the page shows it in place and
    // keeps what was typed.
    const path = blocked.path;
    const message = path ? `${path}: ${blocked.message}` : blocked.message;
    const cellErrors = path
      ? [
          ...base.cellErrors,
          { location: { path, field: path.split('.').slice(-2).join('.') }, kind: 'other' as const, message },
        ]
      : base.cellErrors;
    return { ...base, cellErrors, blocked: { message, ...(path && { path }) } };
  }
  const { inertial, curves } = buildView(doc, sheet, a.budget);
  return { ...base, inertial, curves, ...(options.contributions === false && { contributionsPending: true }) };
}
