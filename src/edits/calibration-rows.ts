/**
 * From a calibration to the rows a budget grid takes. The fitted offset and
 * scale factor are estimates the navigation software subtracts; what is left
 * for the budget is their uncertainty. So the turn-on-bias row's 1σ is the
 * offset's standard deviation and the scale-factor row's 1σ is the scale
 * factor's, and the estimates themselves go into the provenance.
 */
import type { CalibrationReport } from '../calibration/calibration-report';
import type { SensorKind } from '../inputs/budget-input';
import { formatSignificant } from '../units';
import type { RowPlan } from './row-writer';
import { rowRefusal } from './log-targets';
import { calibratedFrom, cellNumber, type LogSource } from './provenance-text';

/** One calibration row offered for writing, or why it cannot be written. */
export interface CalibrationCandidate {
  id: 'offset' | 'scale-factor';
  label: string;
  plan?: RowPlan;
  refusal?: string;
}

const est = (x: number, sd: number, unit: string) => `${formatSignificant(x, 4)} ± ${formatSignificant(sd, 2)} ${unit}`;

/** The whiteness verdict as a clause of the provenance. */
export function whitenessClause(r: CalibrationReport): string {
  const w = r.whiteness;
  if (!w) return 'residual whiteness not checked (fewer than 10 samples)';
  const p = formatSignificant(w.ljungBoxPValue, 2);
  return w.white
    ? `residuals consistent with white noise (Ljung-Box p = ${p})`
    : `residuals CORRELATED (Ljung-Box p = ${p}), so these standard deviations are too small`;
}

/**
 * "calibrated from FILE, DATE, N samples: offset b ± σb UNIT, scale factor s ± σs ppm; <whiteness>".
 * Throws nothing.
 */
export function calibrationProvenance(r: CalibrationReport, source: LogSource): string {
  return `${calibratedFrom(source)}: offset ${est(r.offset.value, r.offset.uncertainty, r.offset.unit)}, ` +
    `scale factor ${est(r.scaleFactor.value, r.scaleFactor.uncertainty, 'ppm')}; ${whitenessClause(r)}`;
}

/**
 * The turn-on-bias and scale-factor rows for a sensor of `sensorKind`.
 * @returns two candidates, offset first. Throws nothing.
 */
export function calibrationCandidates(r: CalibrationReport, sensorKind: SensorKind, source: LogSource): CalibrationCandidate[] {
  const provenance = calibrationProvenance(r, source);
  const offset: RowPlan = {
    kind: 'turn-on-bias', idStem: 'bias', label: 'turn-on bias (1σ left after calibration)',
    fields: { value: cellNumber(r.offset.uncertainty), unit: r.offset.unit, provenance, assumed: false },
  };
  const scale: RowPlan = {
    kind: 'scale-factor', idStem: 'sf', label: 'scale factor (1σ left after calibration)',
    fields: { value: cellNumber(r.scaleFactor.uncertainty), unit: 'ppm', provenance, assumed: false },
  };
  return [
    { id: 'offset', label: offset.label, ...offsetCandidate(r, sensorKind, offset) },
    { id: 'scale-factor', label: scale.label, ...candidate(sensorKind, scale) },
  ];
}

/** A speed sensor that takes no offset row (a wheel-speed sensor) is told why, with the fitted value. */
function offsetCandidate(r: CalibrationReport, sensorKind: SensorKind, plan: RowPlan): { plan?: RowPlan; refusal?: string } {
  const c = candidate(sensorKind, plan);
  return c.refusal && r.offset.unitSI === 'm/s' ? { refusal: wheelOffsetReason(r) } : c;
}

function candidate(sensorKind: SensorKind, plan: RowPlan): { plan?: RowPlan; refusal?: string } {
  const refusal = rowRefusal(sensorKind, plan.kind, plan.fields.unit);
  return refusal ? { refusal } : { plan };
}

/**
 * Why a wheel-speed sensor gets no offset row, with the fitted value kept in
 * the message (it is also in the scale-factor row's provenance). A wheel
 * encoder counts turns: a wheel that stands still reads exactly zero, so its
 * error is a scale factor (the rolling radius) and noise while moving, with
 * no additive bias (common practice, no source; the planar model's speed
 * error, docs/planar-model.md §3). An offset clearly above its uncertainty
 * comes from the truth reference or a time shift between the two columns.
 */
export function wheelOffsetReason(r: CalibrationReport): string {
  const clear = Math.abs(r.offset.value) > 2 * r.offset.uncertainty;
  return `a wheel-speed sensor counts wheel turns and reads zero at rest, so the model has no speed offset; the fitted offset ` +
    `${est(r.offset.value, r.offset.uncertainty, r.offset.unit)} is kept in the scale-factor row's provenance` +
    (clear ? ` and is more than twice its uncertainty: check the truth column and the time alignment of the two columns` : ' and is consistent with zero');
}
