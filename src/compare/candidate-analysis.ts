/**
 * What comparing needs from one analysis of a candidate's document:
 * whether it ran completely, every requirement's verdict, margin and times
 * to exceed, and each requirement's curve over time for overlaid plots.
 * The default analyser is the planar chain through analyseParsedDocument;
 * another model plugs in by passing its own {@link CandidateAnalyser}.
 */
import { analyseParsedDocument } from '../analyse-parsed-document';
import type { BudgetDocument } from '../document/budget-document';
import type { RequirementResult } from '../budget/requirements';
import { requirementSeries } from '../report/requirement-curves';

/** Most points kept of each curve (a chart's width in pixels is about this). */
export const MAX_CURVE_POINTS = 400;

/** One requirement's quantity at its level over time, in the limit's unit. */
export interface RequirementCurve {
  requirementId: string;
  unit: string;
  limit: number;
  tS: number[];
  values: number[];
}

/** One candidate document analysed: 'partial' when cells were left out, 'blocked' when nothing ran. */
export interface CandidateAnalysis {
  status: 'complete' | 'partial' | 'blocked';
  /** Cells left out or why nothing ran, each with its document path. */
  problems: string[];
  requirements: RequirementResult[];
  curves: RequirementCurve[];
  /** Every aiding sensor's outages (label "sensor outage"), for shading the curves' charts. */
  outages: { label: string; fromS: number; toS: number }[];
}

/** Analyses one candidate's document (a pure function of the document). */
export type CandidateAnalyser = (doc: BudgetDocument) => CandidateAnalysis;

/**
 * The planar analysis of a document, totals only (no per-source shares):
 * verdicts and times to exceed come from every step; curves keep at most
 * {@link MAX_CURVE_POINTS} points and the last step.
 */
export function analyseCandidateDocument(doc: BudgetDocument): CandidateAnalysis {
  const a = analyseParsedDocument(doc, [], { contributions: false, report: false });
  const problems = [
    ...a.sheet.cellErrors.map((e) => `${e.location.path}: ${e.message}`),
    ...a.sheet.omitted.map((o) => `${o.path}: left out (${o.what})`),
  ];
  if (!a.budget) {
    const where = a.blocked?.path ? `${a.blocked.path}: ` : '';
    return {
      status: 'blocked',
      problems: [...problems, `${where}${a.blocked?.message ?? 'nothing could be computed'}`],
      requirements: [],
      curves: [],
      outages: [],
    };
  }
  const t = a.budget.series.tS;
  const keep = thinnedSteps(t.length);
  const curves = requirementSeries(a.budget).map((r) => ({
    requirementId: r.id,
    unit: r.unit,
    limit: r.limit,
    tS: keep.map((k) => t[k]),
    values: keep.map((k) => r.values[k]),
  }));
  const outages = a.budget.model.streams.flatMap((st) =>
    st.outages.map((o) => ({ label: `${st.sensorId} ${o.id}`, fromS: o.startS, toS: o.endS })),
  );
  return { status: a.partial ? 'partial' : 'complete', problems, requirements: a.budget.requirements, curves, outages };
}

/** Indices of every n-th step and the last, at most MAX_CURVE_POINTS + 1 of them. */
function thinnedSteps(count: number): number[] {
  const stride = Math.max(1, Math.ceil(count / MAX_CURVE_POINTS));
  const keep: number[] = [];
  for (let k = 0; k < count; k += stride) keep.push(k);
  if (count > 0 && keep[keep.length - 1] !== count - 1) keep.push(count - 1);
  return keep;
}
