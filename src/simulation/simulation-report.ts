import { CAUTION } from '../report/caution';
import { formatSignificant } from '../units';
import type { SimulationFlag } from './study-flags';
import type { StudyStatistics } from './study-statistics';
import type { SimulationJson } from './simulation-json';

/** Display unit and factor from SI for a quantity's unit (angles in degrees). */
function display(unitSI: string): { unit: string; factor: number } {
  return unitSI === 'rad' ? { unit: 'deg', factor: 180 / Math.PI } : { unit: unitSI, factor: 1 };
}

/** What identifies a study: the same values give the same numbers on any machine. */
export interface StudyIdentity {
  /** File name and a hash of its bytes. */
  budget: { file: string; sha256: string };
  seed: number;
  runs: number;
}

/** One line of verdict for a review report: consistent within bounds, or the first warning. */
export function simulationVerdict(stats: StudyStatistics, flags: SimulationFlag[]): string {
  if (flags.length === 0) return `checked by ${stats.runs} Monte Carlo runs: consistent within bounds`;
  return `checked by ${stats.runs} Monte Carlo runs: ${flags.length} warning${flags.length > 1 ? 's' : ''}; first: ${flags[0].text}`;
}

/**
 * The study as JSON (format "sigma-ledger-simulation"): series in display
 * units (heading in deg), every `every`-th step and the last.
 */
export function simulationJson(id: StudyIdentity, stats: StudyStatistics, flags: SimulationFlag[], every = 1): SimulationJson {
  const keep: number[] = [];
  for (let k = 0; k < stats.tS.length; k += every) keep.push(k);
  if (keep[keep.length - 1] !== stats.tS.length - 1) keep.push(stats.tS.length - 1);
  const pick = (a: Float64Array, f = 1) => keep.map((k) => a[k] * f);
  return {
    format: 'sigma-ledger-simulation' as const,
    formatVersion: 1 as const,
    ...id,
    verdict: simulationVerdict(stats, flags),
    flags: flags.map(({ outage, ...f }) => ({ ...f, outage: outage?.id ?? null, sensor: outage?.sensorId ?? null })),
    t_s: pick(stats.tS),
    quantities: stats.quantities.map((q) => {
      const { unit, factor } = display(q.unitSI);
      return {
        id: q.id, unit, rms: pick(q.rms, factor), mean: pick(q.mean, factor), filterSigma: pick(q.filterSigma, factor),
        budgetSigma: pick(q.budgetSigma, factor), bandLow: pick(q.bandLow, factor), bandHigh: pick(q.bandHigh, factor),
      };
    }),
    nees: stats.nees.map((g) => ({ id: g.id, dof: pick(g.dof), average: pick(g.average), low: pick(g.low), high: pick(g.high) })),
    caution: CAUTION,
  };
}

/** A plain-text summary: verdict, warnings, and RMS beside σ at about ten times of the mission. */
export function formatSimulationSummary(id: StudyIdentity, stats: StudyStatistics, flags: SimulationFlag[]): string {
  const lines = [`Monte Carlo check of ${id.budget.file} (${id.runs} runs, seed ${id.seed})`, '', simulationVerdict(stats, flags), ''];
  for (const f of flags.slice(0, 20)) lines.push(`  warning: ${f.text}`);
  if (flags.length > 20) lines.push(`  ... and ${flags.length - 20} more (see --json)`);
  const steps = stats.tS.length;
  const picks = Array.from(new Set(Array.from({ length: 11 }, (_, i) => Math.round((i * (steps - 1)) / 10))));
  lines.push('', 'RMS error / predicted σ [95 % band of the RMS], and average NEES [95 % bounds]:');
  for (const k of picks) {
    const parts = stats.quantities.map((q) => {
      const { unit, factor } = display(q.unitSI);
      const f = (x: number) => formatSignificant(x * factor, 3);
      return `${q.label} ${f(q.rms[k])} / ${f(q.budgetSigma[k])} [${f(q.bandLow[k])}, ${f(q.bandHigh[k])}] ${unit}`;
    });
    const nees = stats.nees.map((g) => `${g.id} ${formatSignificant(g.average[k], 3)} [${formatSignificant(g.low[k], 3)}, ${formatSignificant(g.high[k], 3)}]`);
    lines.push(`  t = ${formatSignificant(stats.tS[k], 4)} s: ${parts.join('; ')}`, `      NEES: ${nees.join('; ')}`);
  }
  lines.push('', CAUTION, '');
  return lines.join('\n');
}
