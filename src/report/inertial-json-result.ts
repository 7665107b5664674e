/**
 * The machine-readable result of a 3-D budget (`sigma-ledger run --json`):
 * the planar result's layout (budgets/result.schema.json) with `"model":
 * "inertial"`, a 1σ series per quantity of INERTIAL_QUANTITIES, each
 * source's variance share per quantity, every calibration state's σ, the
 * verdicts and the checkpoint budgets.
 */
import type { InertialBudgetResult } from '../inertial-pipeline';
import { CAUTION } from './caution';
import { INERTIAL_DISPLAY, inertialDisplay, inertialLevelFactor } from './inertial-display';
import { traceInertialNoise } from './inertial-noise-trace';
import { keptSteps, requirementEntry, type CheckpointEntry, type JsonResult } from './json-result';

/** The 3-D result: JsonResult's keys (without a filter design) and the model's name. */
export interface InertialJsonResult extends Omit<JsonResult, 'filterDesign'> {
  model: 'inertial';
}

/**
 * Builds the 3-D JSON result, keeping every `every`-th step and the last.
 * Contributions are variances in the display unit squared (deg², (m/s)², m²)
 * and sum to the square of the matching sigma series. Throws nothing.
 */
export function buildInertialJsonResult(result: InertialBudgetResult, title: string, every = 1): InertialJsonResult {
  const b = result.budget;
  const keep = keptSteps(b.rows.length, every);
  const pick = (a: ArrayLike<number>) => keep.map((k) => a[k]);
  const series: Record<string, number[]> = { t_s: keep.map((k) => b.rows[k].tS) };
  const contributions: Record<string, Record<string, number[]>> = {};
  for (const d of INERTIAL_DISPLAY) {
    const s = b.series[d.id];
    series[d.seriesKey] = keep.map((k) => s.sigma[k] * d.factor);
    if (s.varianceBySource.length) {
      contributions[d.id] = Object.fromEntries(s.varianceBySource.map((v, i) => [b.model.sources[i].id, keep.map((k) => v[k] * d.factor * d.factor)]));
    }
  }
  series.cep_m = pick(b.cepM);
  series.r95_m = pick(b.r95M);
  const stateUnit = new Map(b.model.states.map((s) => [s.name, s.unitSI]));
  return {
    format: 'sigma-ledger-result', formatVersion: 1, model: 'inertial', title, caution: CAUTION,
    mission: {
      duration_s: result.mission.durationS, step_s: result.stepS, record_every: Math.max(1, Math.floor(every)),
      states: b.model.states.map((s) => s.name),
      sources: b.model.sources.map((s) => ({ id: s.id, sensor: s.sensorId, kind: s.kind, provenance: s.provenance, assumed: s.assumed })),
    },
    series, contributions,
    calibration: Object.entries(b.calibrationSigma).map(([state, sigma]) => ({ state, unit: stateUnit.get(state) ?? '1', sigma: pick(sigma) })),
    requirements: result.requirements.map((r) => requirementEntry(r)),
    checkpoints: result.checkpoints.map((c): CheckpointEntry => ({
      id: c.id, t_s: c.tS, level: result.reportLevel,
      budgets: c.quantities.map((qb) => {
        const d = inertialDisplay(qb.quantity);
        const atLevel = d.factor * inertialLevelFactor(qb.quantity, result.reportLevel);
        return {
          quantity: qb.quantity, unit: d.unit, sigma: d.factor * qb.totalSigmaSI, atLevel: atLevel * qb.totalSigmaSI,
          sources: qb.shares.map((s) => ({ id: s.sourceId, sigma: d.factor * s.sigmaSI, atLevel: atLevel * s.sigmaSI, share: s.fraction })),
        };
      }),
    })),
    noise: traceInertialNoise(b.model),
    status: { healthy: b.run.issues.length === 0, issues: b.run.issues, warnings: [] },
  };
}
