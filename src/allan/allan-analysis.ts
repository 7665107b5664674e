/**
 * From an Allan curve in SI to the noise-term rows a budget grid takes: the
 * slope read-offs (method "slope"), the whole-curve fit (method "fit"), and
 * the bias-instability row as docs/planar-model.md §3 writes a fitted value (the floor,
 * kind "floor", with T_bi = τ_floor / 1.8926).
 */
import { convert, formatSignificant } from '../units';
import { gaussMarkovCorrelationTimeFromFloorTau, GM_ALLAN_PEAK_U } from '../sources/gauss-markov-allan';
import { readBiasInstabilityFloor } from './floor-reading';
import type { CurvePoints } from './log-log-lines';
import { NOISE_TERMS, type NoiseTermId } from './noise-terms';
import { SENSOR_TERM_UNITS, type AllanSensorKind } from './sensor-term-units';
import { readTermBySlope, type SlopeReadOptions, type TermReading } from './slope-readoff';
import { fitNoiseTerms, type FittedTerm } from './term-fit';

/** One noise term as a grid row would take it. */
export interface NoiseTermRow {
  /** IEEE Std 952 term name ("angle random walk", "bias instability", …). */
  readonly name: string;
  readonly id: NoiseTermId;
  /** Value in `unit` (an upper bound when `upperBound`). */
  readonly value: number;
  /** Display unit (deg/√h, deg/h, m/s/√h, …). */
  readonly unit: string;
  /** Value in `unitSI`. */
  readonly valueSI: number;
  /** SI unit (rad/√s, rad/s, rad/s/√s, …). */
  readonly unitSI: string;
  /** One standard uncertainty in `unit` (see slope-readoff.ts and term-fit.ts for how each is made). */
  readonly uncertainty: number;
  readonly method: 'slope' | 'fit';
  /** Slope method: the reference τ lay outside the points used. */
  readonly extrapolated?: boolean;
  /** Slope method: the term's slope was not seen; `value` is only an upper bound. */
  readonly upperBound?: boolean;
  /** Fit method: the non-negativity bound held the term at zero. */
  readonly atZero?: boolean;
  /**
   * Fit method: the fitted c = value² lies within two of its standard errors
   * of zero (value < 4 × uncertainty, since se(c) = 2·value·uncertainty):
   * the curve does not show the term, whatever the number says.
   */
  readonly notSignificant?: boolean;
  /** Slope method: τ in s where the value was read (the floor's τ for bias instability). */
  readonly readAtTauS?: number;
}

/** The bias-instability row in the form docs/planar-model.md §3 stores a fitted value. */
export interface BiasInstabilityRow {
  /** The row holds the Allan floor (not the flicker coefficient). */
  readonly kind: 'floor';
  /** Floor in the display unit. */
  readonly floor: number;
  readonly unit: string;
  readonly floorSI: number;
  readonly unitSI: string;
  /** τ of the floor in s. */
  readonly tauFloorS: number;
  /** T_bi = τ_floor / GM_ALLAN_PEAK_U in s. */
  readonly correlationTimeS: number;
  /** One standard uncertainty of the floor, display unit. */
  readonly uncertainty: number;
  /** How the values were obtained, for the row's provenance. */
  readonly provenance: string;
}

/** The result of {@link analyseAllanCurve}. */
export interface AllanAnalysis {
  /** Slope read-offs then fitted terms, five each, in slope order. */
  readonly terms: readonly NoiseTermRow[];
  /** Absent when no floor was seen (the slope row is then an upper bound). */
  readonly biasInstability?: BiasInstabilityRow;
  /** χ² and degrees of freedom of the whole-curve fit. */
  readonly fitChiSquare: number;
  readonly fitDegreesOfFreedom: number;
}

function fromSlope(kind: AllanSensorKind, r: TermReading): NoiseTermRow {
  const lab = SENSOR_TERM_UNITS[kind].terms[r.id];
  const value = convert(r.coefficient, lab.unitSI, lab.unit, r.id);
  return {
    name: lab.name, id: r.id, value, unit: lab.unit, valueSI: r.coefficient, unitSI: lab.unitSI,
    uncertainty: value * r.relativeUncertainty, method: 'slope', extrapolated: r.extrapolated, upperBound: r.upperBound, readAtTauS: r.readAtTauS,
  };
}

/** A fitted coefficient below this many standard errors is not significant (c within 2 se(c) of zero). */
export const SIGNIFICANCE_FACTOR = 4;

function fromFit(kind: AllanSensorKind, t: FittedTerm): NoiseTermRow {
  const lab = SENSOR_TERM_UNITS[kind].terms[t.id];
  const toDisplay = (x: number): number => (Number.isFinite(x) ? convert(x, lab.unitSI, lab.unit, t.id) : x);
  return {
    name: lab.name, id: t.id, value: toDisplay(t.coefficient), unit: lab.unit, valueSI: t.coefficient, unitSI: lab.unitSI,
    uncertainty: toDisplay(t.standardError), method: 'fit', atZero: t.atZero,
    // A z-test at about 95 % on the linear parameter c (common practice, no source).
    notSignificant: !t.atZero && t.coefficient < SIGNIFICANCE_FACTOR * t.standardError,
  };
}

function biasRow(kind: AllanSensorKind, r: TermReading, sourceName: string): BiasInstabilityRow | undefined {
  if (r.upperBound) return undefined;
  const lab = SENSOR_TERM_UNITS[kind].terms['bias-instability'];
  const floor = convert(r.deviation, lab.unitSI, lab.unit, 'floor');
  const correlationTimeS = gaussMarkovCorrelationTimeFromFloorTau(r.readAtTauS);
  const provenance =
    `Allan deviation floor ${formatSignificant(floor, 4)} ${lab.unit} at τ = ${formatSignificant(r.readAtTauS, 4)} s, ` +
    `read from ${sourceName}; T_bi = τ_floor / ${formatSignificant(GM_ALLAN_PEAK_U, 7)} = ${formatSignificant(correlationTimeS, 4)} s (docs/planar-model.md §3)`;
  return {
    kind: 'floor', floor, unit: lab.unit, floorSI: r.deviation, unitSI: lab.unitSI, tauFloorS: r.readAtTauS,
    correlationTimeS, uncertainty: floor * r.relativeUncertainty, provenance,
  };
}

/** Options of {@link analyseAllanCurve}. */
export interface AllanAnalysisOptions extends SlopeReadOptions {
  /** Names the log in the provenance text; default "the log". */
  readonly sourceName?: string;
}

/**
 * Reads and fits the IEEE Std 952 terms of an Allan curve.
 * @param curveSI the curve with σ in the SI rate unit of `kind` (rad/s, m/s², m/s).
 * @throws InputError when fewer than two points of the curve are above zero.
 */
export function analyseAllanCurve(curveSI: CurvePoints, kind: AllanSensorKind, options: AllanAnalysisOptions = {}): AllanAnalysis {
  const readings = NOISE_TERMS.map((t) => (t.id === 'bias-instability' ? readBiasInstabilityFloor(curveSI, options) : readTermBySlope(curveSI, t.id, options)));
  const fit = fitNoiseTerms(curveSI);
  const floorReading = readings.find((r) => r.id === 'bias-instability')!;
  return {
    terms: [...readings.map((r) => fromSlope(kind, r)), ...fit.terms.map((t) => fromFit(kind, t))],
    biasInstability: biasRow(kind, floorReading, options.sourceName ?? 'the log'),
    fitChiSquare: fit.chiSquare,
    fitDegreesOfFreedom: fit.degreesOfFreedom,
  };
}
