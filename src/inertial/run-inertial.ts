import { positiveToSI } from '../inputs/checks';
import { fastRadiusForProbability } from '../budget/horizontal-radius-table';
import { runCovarianceProblem, type CovarianceRun } from '../covariance/run-covariance';
import { EARTH, type EarthModel } from './earth';
import type { InertialBudgetInput } from './inertial-input';
import { resolveInertialMission } from './inertial-mission';
import { buildInertialTrajectory, type NominalRow } from './inertial-trajectory';
import { buildInertialModel } from './build-inertial-model';
import { InertialDiscretisation } from './inertial-discretisation';
import { scheduleInertialMeasurements } from './inertial-schedule';
import { INERTIAL_QUANTITIES, RECORDED_PAIRS, type EntryReader } from './inertial-quantities';
import type { InertialModel } from './inertial-model';
import { POSITION } from './inertial-model';
import { sphericalErrorProbableM } from './sphere-probability';

/** One output quantity over the mission: total 1σ, and each source's variance (they sum to the total variance). */
export interface InertialSeries {
  id: string;
  label: string;
  unitSI: string;
  sigma: Float64Array;
  /** Per source (model order), variance per step; empty without contributions. */
  varianceBySource: Float64Array[];
}

/** The 3-D budget over time. */
export interface InertialBudget {
  model: InertialModel;
  rows: NominalRow[];
  run: CovarianceRun;
  series: Record<string, InertialSeries>;
  /** CEP and R95 from the exact bivariate normal, m, per step (total only). */
  cepM: Float64Array;
  r95M: Float64Array;
  /** SEP from the exact trivariate normal at step k, m (computed on demand: it costs a root search). */
  sepAtM(k: number): number;
  /** Total 1σ of every calibration state, by state name, SI. */
  calibrationSigma: Record<string, Float64Array>;
}

/** Options of {@link runInertialBudget}; the Earth and the every-step switch exist for tests. */
export interface InertialRunOptions {
  contributions?: boolean;
  earth?: EarthModel;
  /** Recompute F at every step instead of holding it over straight constant-speed segments. */
  everyStep?: boolean;
}

/**
 * Input → 3-D budget (docs/inertial-model.md): resolve the mission, build the
 * nominal rows and the model, run the shared covariance analysis with the
 * inertial discretisation and schedule, and read the outputs.
 * @throws InputError naming the field of any bad input.
 */
export function runInertialBudget(input: InertialBudgetInput, options: InertialRunOptions = {}): InertialBudget {
  const earth = options.earth ?? EARTH;
  const stepS = positiveToSI(input.step, 'time', 'step');
  const mission = resolveInertialMission(input.mission);
  const rows = buildInertialTrajectory(mission, stepS, earth);
  const model = buildInertialModel(input, mission, earth);
  const schedule = scheduleInertialMeasurements(model, rows, stepS);
  const run = runCovarianceProblem({
    states: model.states, sources: model.sources, tS: Float64Array.from(rows, (r) => r.tS),
    discretisation: new InertialDiscretisation(model, rows, mission.segments, stepS, options.everyStep),
    measurementsAt: (k) => schedule[k], recordedPairs: RECORDED_PAIRS,
    calibrationStates: model.states.flatMap((s, i) => (s.calibration ? [i] : [])),
  }, { contributions: options.contributions });
  return readOutputs(model, rows, run);
}

function readOutputs(model: InertialModel, rows: NominalRow[], run: CovarianceRun): InertialBudget {
  const { steps, sourceCount: S } = run;
  const n = model.states.length;
  const pairOf = new Int32Array(n * n).fill(-1);
  RECORDED_PAIRS.forEach(([i, j], p) => { pairOf[i * n + j] = p; pairOf[j * n + i] = p; });
  // One reader moved over (matrix, step), so reading the outputs allocates nothing per step.
  let at = 0;
  const read: EntryReader = (i, j) => run.recorded[pairOf[i * n + j]][at];
  const reader = (m: number, k: number): EntryReader => { at = m * steps + k; return read; };
  const series: Record<string, InertialSeries> = {};
  for (const q of INERTIAL_QUANTITIES) {
    const sigma = new Float64Array(steps);
    const varianceBySource = Array.from({ length: S }, () => new Float64Array(steps));
    for (let k = 0; k < steps; k++) {
      sigma[k] = Math.sqrt(Math.max(0, q.variance(reader(0, k), rows[k])));
      for (let s = 0; s < S; s++) varianceBySource[s][k] = q.variance(reader(s + 1, k), rows[k]);
    }
    series[q.id] = { id: q.id, label: q.label, unitSI: q.unitSI, sigma, varianceBySource };
  }
  const cepM = new Float64Array(steps), r95M = new Float64Array(steps);
  for (let k = 0; k < steps; k++) {
    const p = reader(0, k);
    const [nn, ee, ne] = [p(POSITION, POSITION), p(POSITION + 1, POSITION + 1), p(POSITION, POSITION + 1)];
    cepM[k] = fastRadiusForProbability(nn, ee, ne, 0.5);
    r95M[k] = fastRadiusForProbability(nn, ee, ne, 0.95);
  }
  const calibrationSigma: Record<string, Float64Array> = {};
  run.calibrationStates.forEach((state, c) => (calibrationSigma[model.states[state].name] = run.calibrationSigma[c]));
  const sepAtM = (k: number) => {
    const p = reader(0, k);
    return sphericalErrorProbableM([0, 1, 2].flatMap((i) => [0, 1, 2].map((j) => p(POSITION + i, POSITION + j))));
  };
  return { model, rows, run, series, cepM, r95M, sepAtM, calibrationSigma };
}
