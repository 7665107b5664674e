/**
 * From an Allan analysis to the rows a budget grid takes (docs/planar-model.md §3):
 * - angle random walk: a white-noise row in the term's unit (deg/√h; a
 *   speed log's noise density in m/s/√Hz); where a sensor refuses the
 *   density form, the same noise as a per-sample σ = N·√f at the log's
 *   rate f, with that rate on the row;
 * - bias instability: the Allan floor (biasForm "floor") with correlation
 *   time T = τ_floor / 1.8926, the floor reading as provenance;
 * - rate random walk: a rate-random-walk row;
 * - quantisation: an angle quantum s = Q·√12 (quantum "angle").
 * Rate ramp has no row kind and is not written.
 */
import type { NoiseTermRow } from '../allan/allan-analysis';
import { SENSOR_TERM_UNITS } from '../allan/sensor-term-units';
import type { SensorKind, SourceKind } from '../inputs/budget-input';
import type { RowPlan } from './row-writer';
import { rowRefusal } from './log-targets';
import type { LogAllanResult } from '../allan/log-allan';
import { cellNumber, fittedFrom, uncertaintyText, valueText, type LogSource } from './provenance-text';

/** What the row builders need of a finished Allan analysis of a log. */
export interface AllanOutcome {
  result: LogAllanResult;
  /** Sample rate of the log, Hz. */
  rateHz: number;
}

/** The terms a grid row can take, in slope order. */
export type WritableTermId = 'quantisation' | 'random-walk' | 'bias-instability' | 'rate-random-walk';
export const WRITABLE_TERMS: readonly WritableTermId[] = ['quantisation', 'random-walk', 'bias-instability', 'rate-random-walk'];

/** Which reading supplies the sloped terms: the slope read-offs or the whole-curve fit. */
export type TermMethod = 'slope' | 'fit';

/** One term offered for writing: its plan, or why it cannot be written; `caution` marks a plan to think twice about. */
export interface TermCandidate {
  id: WritableTermId;
  label: string;
  plan?: RowPlan;
  refusal?: string;
  caution?: string;
  /** Which reading the plan holds when it is not the one asked for (the fit's value where the slope was not seen). */
  note?: string;
}

const ID_STEMS: Record<WritableTermId, string> = { 'quantisation': 'quant', 'random-walk': 'arw', 'bias-instability': 'bi', 'rate-random-walk': 'rrw' };
const ROW_KINDS: Record<WritableTermId, SourceKind> = {
  'quantisation': 'quantisation', 'random-walk': 'white-noise', 'bias-instability': 'bias-instability', 'rate-random-walk': 'rate-random-walk',
};

/** How a term was read, for its provenance. */
function howRead(t: NoiseTermRow): string {
  const value = `${t.name} ${valueText(t.value, t.unit)} ± ${uncertaintyText(t.uncertainty)} (1σ)`;
  if (t.method === 'fit') return `${value} by the weighted whole-curve fit`;
  const at = t.readAtTauS !== undefined ? ` at τ = ${valueText(t.readAtTauS, 's')}` : '';
  const flags = [t.extrapolated ? 'extrapolated' : '', t.upperBound ? 'an upper bound: the slope was not seen' : ''].filter(Boolean).join('; ');
  return `${value} by slope read-off${at}${flags ? ` (${flags})` : ''}`;
}

/** The row fields of a sloped term, before the target's checks. */
function slopedFields(id: WritableTermId, t: NoiseTermRow, head: string): Pick<RowPlan, 'fields' | 'sameSource'> {
  const base = { provenance: `${head}; ${howRead(t)}`, assumed: false };
  if (id === 'quantisation') {
    const s = t.value * Math.sqrt(12);
    return {
      fields: { value: cellNumber(s), unit: t.unit, quantum: 'angle', provenance: `${base.provenance}; angle quantum s = Q·√12 = ${valueText(s, t.unit)}`, assumed: false },
      sameSource: (r) => r.quantum === 'angle',
    };
  }
  return { fields: { value: cellNumber(t.value), unit: t.unit, ...base } };
}

/** The white-noise row as a per-sample σ at the log's rate, for sensors that refuse the density form. */
function perSampleFields(t: NoiseTermRow, outcome: AllanOutcome, head: string): RowPlan['fields'] {
  const unit = SENSOR_TERM_UNITS[outcome.result.kind].rateUnitSI;
  const sigma = t.valueSI * Math.sqrt(outcome.rateHz);
  return {
    value: cellNumber(sigma), unit, rate: { value: cellNumber(outcome.rateHz), unit: 'Hz' },
    provenance: `${head}; ${howRead(t)}; written as the per-sample σ = N·√f = ${valueText(sigma, unit)} at f = ${valueText(outcome.rateHz, 'Hz')}`,
    assumed: false,
  };
}

function biasCandidate(outcome: AllanOutcome, sensorKind: SensorKind, head: string): TermCandidate {
  const b = outcome.result.analysis.biasInstability;
  const label = SENSOR_TERM_UNITS[outcome.result.kind].terms['bias-instability'].name;
  if (!b) return { id: 'bias-instability', label, refusal: 'the curve shows no floor, so there is only an upper bound and no correlation time' };
  const refusal = rowRefusal(sensorKind, 'bias-instability', b.unit);
  if (refusal) return { id: 'bias-instability', label, refusal };
  const provenance = `${head}; ${b.provenance}; 1σ of the floor ${uncertaintyText(b.uncertainty)} ${b.unit}`;
  return {
    id: 'bias-instability', label,
    plan: {
      kind: 'bias-instability', idStem: ID_STEMS['bias-instability'], label,
      fields: { value: cellNumber(b.floor), unit: b.unit, correlationTime: { value: cellNumber(b.correlationTimeS), unit: 's' }, biasForm: 'floor', provenance, assumed: false },
    },
  };
}

/**
 * The reading a sloped term's row takes: the one asked for, except that a
 * slope read-off that saw no slope (an upper bound only) gives way to the
 * whole-curve fit's value when the fit finds the term significant; writing
 * nothing would leave the budget optimistic.
 */
function chosenReading(id: WritableTermId, outcome: AllanOutcome, method: TermMethod): { t: NoiseTermRow; note?: string } {
  const terms = outcome.result.analysis.terms;
  const t = terms.find((r) => r.id === id && r.method === method)!;
  if (!t.upperBound) return { t };
  const fit = terms.find((r) => r.id === id && r.method === 'fit');
  if (!fit || fit.atZero || fit.notSignificant) return { t };
  return { t: fit, note: `the slope read-off saw no slope (only an upper bound), so the whole-curve fit's value ${valueText(fit.value, fit.unit)} was written` };
}

function slopedCandidate(id: WritableTermId, outcome: AllanOutcome, method: TermMethod, sensorKind: SensorKind, head: string): TermCandidate {
  const { t, note } = chosenReading(id, outcome, method);
  const rowHead = note ? `${head}; slope not seen, whole-curve fit used` : head;
  const label = t.name;
  if (t.atZero) return { id, label, refusal: 'the fit held it at zero: the curve shows none of it' };
  const caution = t.upperBound ? 'only an upper bound: its slope was not seen, and the whole-curve fit does not find it significant either'
    : t.notSignificant ? 'not significant: the fit puts its squared value within two standard errors of zero (the value under four)'
    : t.extrapolated ? 'read from an extrapolated line' : undefined;
  const planned = slopedFields(id, t, rowHead);
  let fields = planned.fields;
  let refusal = rowRefusal(sensorKind, ROW_KINDS[id], fields.unit);
  if (refusal && id === 'random-walk' && !rowRefusal(sensorKind, 'white-noise', SENSOR_TERM_UNITS[outcome.result.kind].rateUnitSI)) {
    fields = perSampleFields(t, outcome, rowHead);
    refusal = undefined;
  }
  if (refusal) return { id, label, refusal };
  return { id, label, caution, ...(note && { note }), plan: { kind: ROW_KINDS[id], idStem: ID_STEMS[id], label, fields, sameSource: planned.sameSource } };
}

/**
 * What each writable term would become in a sensor of `sensorKind`.
 * @param method which reading supplies quantisation, random walk and rate random walk (bias instability always comes from the floor).
 * @returns one candidate per {@link WRITABLE_TERMS} entry. Throws nothing.
 */
export function allanCandidates(outcome: AllanOutcome, method: TermMethod, sensorKind: SensorKind, source: LogSource): TermCandidate[] {
  const head = fittedFrom(source);
  return WRITABLE_TERMS.map((id) => (id === 'bias-instability' ? biasCandidate(outcome, sensorKind, head) : slopedCandidate(id, outcome, method, sensorKind, head)));
}
