/**
 * The plain-text report of an Allan analysis: the curve as a table, the
 * terms by both methods, and the bias-instability row for the budget grid.
 */
import { formatSignificant } from '../units';
import type { NoiseTermRow } from './allan-analysis';
import type { LogAllanResult } from './log-allan';

const DIGITS = 4;
const fmt = (x: number): string => formatSignificant(x, DIGITS);

function column(cells: string[], width: number): string {
  return cells.map((c) => c.padEnd(width)).join(' ').trimEnd();
}

function curveTable(r: LogAllanResult): string[] {
  const head = column(['tau (s)', `adev (${r.adevUnit})`, 'lower', 'upper'], 14);
  return [head, ...r.points.map((p) => column([fmt(p.tau_s), fmt(p.adev), fmt(p.lower), fmt(p.upper)], 14))];
}

function slopeLine(t: NoiseTermRow): string {
  const name = t.name.padEnd(22);
  if (t.upperBound) return `${name}≤ ${fmt(t.value)} ${t.unit}   (slope not seen; bound set at τ = ${fmt(t.readAtTauS ?? Number.NaN)} s; see the fit below)`;
  const where = t.id === 'bias-instability' ? `floor at τ = ${fmt(t.readAtTauS ?? Number.NaN)} s` : `read at τ = ${fmt(t.readAtTauS ?? Number.NaN)} s`;
  return `${name}${fmt(t.value)} ± ${fmt(t.uncertainty)} ${t.unit}   (${where}${t.extrapolated ? ', extrapolated beyond the points used' : ''})`;
}

function fitLine(t: NoiseTermRow): string {
  const name = t.name.padEnd(22);
  if (t.atZero) return `${name}0 ${t.unit}   (held at zero; resolvable from about ${fmt(t.uncertainty)} ${t.unit})`;
  if (t.notSignificant) return `${name}${fmt(t.value)} ± ${fmt(t.uncertainty)} ${t.unit}   (not significant: under 4 standard errors, so its squared value, the fitted term, is within 2 of zero)`;
  return `${name}${fmt(t.value)} ± ${fmt(t.uncertainty)} ${t.unit}`;
}

/**
 * The report as text, ending in a newline.
 * @param source names the log ("log.csv"). Throws nothing.
 */
export function formatAllanText(source: string, samples: number, rateHz: number, r: LogAllanResult): string {
  const a = r.analysis;
  const slope = a.terms.filter((t) => t.method === 'slope');
  const fit = a.terms.filter((t) => t.method === 'fit');
  const bi = a.biasInstability;
  const lines = [
    `${source}: ${samples} samples at ${fmt(rateHz)} Hz, ${r.kind} ${r.input === 'rate' ? 'rates' : 'increments'}; ${r.curveSI.estimator} Allan deviation`,
    '',
    ...curveTable(r),
    '',
    'noise terms (IEEE Std 952), read off lines of the term\'s slope:',
    ...slope.map((t) => '  ' + slopeLine(t)),
    '',
    `noise terms, weighted non-negative fit of the whole curve (χ² ${fmt(a.fitChiSquare)} for ${a.fitDegreesOfFreedom} degrees of freedom):`,
    ...fit.map((t) => '  ' + fitLine(t)),
    '',
    bi
      ? `bias-instability row (kind "floor"): floor ${fmt(bi.floor)} ${bi.unit} at τ = ${fmt(bi.tauFloorS)} s, correlation time ${fmt(bi.correlationTimeS)} s (τ_floor / 1.8926)`
      : 'bias-instability row: no floor in the curve (it never levels off where δ ≤ 10 %); log longer or use the bound above',
    '',
    'Uncertainties come from the IEEE Std 952 percentage error δ = 1/√(2(N/n − 1)), which understates the real scatter',
    '(by about 20 % for white noise); neighbouring points share data, so the fit\'s standard errors are a lower limit.',
    '',
  ];
  return lines.join('\n');
}
