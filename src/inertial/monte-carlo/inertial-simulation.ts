import { noiseByKey, inOutage } from '../../covariance/measurement-schedule';
import { TIME_SLACK_S } from '../../mission/nominal-trajectory';
import type { MonteCarloModel, NeesGroup, RunSink, SimulatedOutage, SimulatedQuantity } from '../../simulation/monte-carlo-model';
import type { RunRandom } from '../../simulation/run-random';
import { inertialDynamics } from '../inertial-dynamics';
import type { InertialBudgetInput } from '../inertial-input';
import { ATTITUDE, NAV_STATES, POSITION, VELOCITY, type InertialModel } from '../inertial-model';
import { INERTIAL_QUANTITIES } from '../inertial-quantities';
import type { NominalRow } from '../inertial-trajectory';
import { runInertialBudget, type InertialRunOptions } from '../run-inertial';
import { InertialFilter } from './inertial-filter';
import { errorVector, recordInertialStep, INERTIAL_SIMULATED, type InertialStepState } from './inertial-step-record';
import { InertialTruth, type BodyNoise } from './inertial-truth';

/** NEES groups of the 3-D model: every state, the position, the attitude. */
export const INERTIAL_NEES_GROUPS: NeesGroup[] = [
  { id: 'full', label: 'full state' }, { id: 'position', label: 'position' }, { id: 'attitude', label: 'attitude' },
];

/**
 * The 3-D inertial model as a {@link MonteCarloModel} (docs/inertial-model.md §10):
 * truth by nonlinear error propagation ({@link InertialTruth}), an extended
 * Kalman filter with the budget's model linearised about its own solution
 * ({@link InertialFilter}), closed loop (the estimated navigation errors are fed
 * back after every scalar update, the IMU and aiding estimates kept). Each
 * aiding row of §5 measures at the true pose: the innovation is the row at the
 * true pose applied to the true error (exact for position, velocity and height;
 * first order in the attitude error for lever arms and body-frame rows), and
 * the filter's H is the same row at its own solution.
 */
export class InertialSimulation implements MonteCarloModel {
  readonly stepTimesS: Float64Array;
  readonly quantities: SimulatedQuantity[];
  readonly neesGroups = INERTIAL_NEES_GROUPS;
  readonly budgetVariance: Float64Array[];
  readonly outages: SimulatedOutage[];
  private readonly model: InertialModel;
  private readonly rows: NominalRow[];
  private readonly sign: Float64Array;
  private readonly truth: InertialTruth;
  private readonly filter: InertialFilter;
  private readonly state: InertialStepState;
  private readonly events: number[][];
  private readonly rByKey: Map<string, number>;
  private readonly bodyPsd = { velocity: new Float64Array(3), attitude: new Float64Array(3) };
  private readonly noise: BodyNoise = { velocitySd: new Float64Array(3), attitudeSd: new Float64Array(3) };
  private readonly df = new Float64Array(3);
  private readonly dw = new Float64Array(3);

  constructor(input: InertialBudgetInput, options: Pick<InertialRunOptions, 'earth' | 'everyStep'> = {}) {
    const budget = runInertialBudget(input, { ...options, contributions: false });
    const model = (this.model = budget.model);
    this.rows = budget.rows;
    const n = model.states.length;
    this.stepTimesS = Float64Array.from(budget.rows, (r) => r.tS);
    this.quantities = INERTIAL_SIMULATED.map((id) => {
      const q = INERTIAL_QUANTITIES.find((x) => x.id === id)!;
      return { id, label: q.label, unitSI: q.unitSI };
    });
    this.budgetVariance = this.quantities.map((q) => budget.series[q.id].sigma.map((s) => s * s));
    this.outages = model.streams.flatMap((s) => s.outages.map((o) => ({ sensorId: s.sensorId, ...o })));
    const p0 = new Float64Array(n), psd = new Float64Array(n);
    for (const src of model.sources) {
      for (const p of src.initialVariance) p0[p.state] += p.varianceSI;
      for (const q of src.noise) {
        if (q.on === 'state') psd[q.state] += q.psdSI;
        else this.bodyPsd[q.block][q.axis] += q.psdSI;
      }
    }
    // IMU states drive the navigation errors: their error is truth − estimate, so F holds as written (as in the planar model).
    this.sign = new Float64Array(n).fill(1);
    for (const s of model.imuStates) this.sign[s.state] = -1;
    this.truth = new InertialTruth(model, p0, psd);
    this.filter = new InertialFilter(model, p0);
    this.state = { truth: this.truth, filter: this.filter, sign: this.sign, estimate: new Float64Array(n), model };
    this.rByKey = new Map([...noiseByKey(model)].map(([k, v]) => [k, v.rTotal]));
    this.events = this.rows.map(() => []);
    const last = this.rows.length - 1, stepS = this.rows[1] ? this.rows[1].tS - this.rows[0].tS : 1;
    model.streams.forEach((stream, si) => {
      // The budget's schedule (inertial-schedule.ts): instant j/f at the first boundary at or after it, outages at that boundary.
      for (let j = 0; ; j++) {
        const tS = j / stream.rateHz;
        if (tS > this.rows[last].tS + TIME_SLACK_S) break;
        const k = Math.min(last, Math.max(0, Math.ceil(tS / stepS - 1e-9)));
        if (!inOutage(stream.outages, this.rows[k].tS)) this.events[k].push(si);
      }
    });
  }

  simulate(rng: RunRandom, sink: RunSink): void {
    const { rows, truth, filter, state } = this;
    const est = state.estimate;
    truth.start(rng);
    filter.reset();
    est.fill(0);
    const n = this.model.states.length;
    for (let k = 0; k < rows.length; k++) {
      if (k > 0) {
        const row = rows[k - 1], dtS = rows[k].tS - row.tS;
        this.imuErrors(row);
        filter.propagate(this.estimatedRow(row), dtS);
        for (let a = 0; a < 3; a++) {
          this.noise.velocitySd[a] = Math.sqrt(this.bodyPsd.velocity[a] * dtS);
          this.noise.attitudeSd[a] = Math.sqrt(this.bodyPsd.attitude[a] * dtS);
        }
        truth.advance(row, dtS, this.df, this.dw, inertialDynamics(this.model, row), this.noise, rng);
        truth.advanceStates(rows[k].tS, rng);
        for (let s = NAV_STATES; s < n; s++) {
          const decay = this.model.states[s].decayPerS;
          if (decay > 0) est[s] *= Math.exp(-decay * dtS);
        }
      }
      for (const si of this.events[k]) this.measure(k, si, rng);
      this.imuErrors(rows[k]);
      recordInertialStep(state, rows[k], this.estimatedRow(rows[k]), sink, k);
    }
  }

  /** Errors of the corrected IMU outputs, body axes: (u (s − ŝ) + b − b̂) / (1 + ŝ), the affine model inverted exactly. */
  private imuErrors(row: NominalRow): void {
    const est = this.state.estimate;
    const b = [0, 0, 0, 0, 0, 0], bHat = [0, 0, 0, 0, 0, 0], s = [0, 0, 0, 0, 0, 0], sHat = [0, 0, 0, 0, 0, 0];
    for (const st of this.model.imuStates) {
      const slot = (st.instrument === 'gyro' ? 3 : 0) + st.axis;
      const value = this.truth.processes[st.state].value;
      if (st.effect === 'bias') { b[slot] += value; bHat[slot] += est[st.state]; } else { s[slot] += value; sHat[slot] += est[st.state]; }
    }
    for (let a = 0; a < 3; a++) {
      const f = row.specificForceBody[a], w = row.bodyRateRadps[a];
      this.df[a] = (f * (s[a] - sHat[a]) + b[a] - bHat[a]) / (1 + sHat[a]);
      this.dw[a] = (w * (s[3 + a] - sHat[3 + a]) + b[3 + a] - bHat[3 + a]) / (1 + sHat[3 + a]);
    }
  }

  /** The filter's own solution at a nominal instant: its attitude, velocity and corrected IMU outputs (call imuErrors first). */
  private estimatedRow(row: NominalRow): NominalRow {
    const c = this.truth.estimatedAttitude(row, new Float64Array(9));
    const fb: [number, number, number] = [0, 1, 2].map((a) => row.specificForceBody[a] + this.df[a]) as [number, number, number];
    const fn = [0, 1, 2].map((i) => c[3 * i] * fb[0] + c[3 * i + 1] * fb[1] + c[3 * i + 2] * fb[2]) as [number, number, number];
    return {
      ...row, bodyToNav: c, specificForceBody: fb, specificForceNed: fn,
      velocityNed: [0, 1, 2].map((i) => row.velocityNed[i] + this.truth.dv[i]) as [number, number, number],
      bodyRateRadps: [0, 1, 2].map((a) => row.bodyRateRadps[a] + this.dw[a]) as [number, number, number],
    };
  }

  /** One stream's rows at step k: innovation from the true pose and error, H from the filter's solution, Joseph update, feedback. */
  private measure(k: number, streamIndex: number, rng: RunRandom): void {
    const stream = this.model.streams[streamIndex];
    const { truth, filter, sign, state } = this;
    const est = state.estimate;
    for (const trueRow of stream.rowsAt(this.rows[k])) {
      this.imuErrors(this.rows[k]);
      const estRow = stream.rowsAt(this.estimatedRow(this.rows[k])).find((r) => r.key === trueRow.key);
      if (!estRow) continue;
      const r = this.rByKey.get(trueRow.noiseKey) ?? 0;
      const x = errorVector(state);
      let z = r > 0 ? -Math.sqrt(r) * rng.normal() : 0;
      for (const [s, h] of trueRow.h) z += h * x[s];
      const h = estRow.h.filter(([, v]) => v !== 0);
      if (filter.update(Int32Array.from(h, ([s]) => s), Float64Array.from(h, ([, v]) => v), r) === 0) continue;
      const g = filter.gain;
      truth.correct([0, 1, 2].map((i) => g[POSITION + i] * z), [0, 1, 2].map((i) => g[VELOCITY + i] * z), [0, 1, 2].map((i) => g[ATTITUDE + i] * z));
      for (let s = NAV_STATES; s < est.length; s++) est[s] -= sign[s] * g[s] * z;
    }
  }
}

/**
 * The Monte Carlo model of a 3-D budget: what `simulate` runs for an
 * InertialBudgetInput (the CLI's dispatch hook is simulationModelFor in
 * src/cli/simulation-model.ts).
 * @throws InputError naming the field of any bad input, as runInertialBudget does.
 */
export function inertialSimulation(input: InertialBudgetInput, options: Pick<InertialRunOptions, 'earth' | 'everyStep'> = {}): InertialSimulation {
  return new InertialSimulation(input, options);
}
