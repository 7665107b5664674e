import type { BudgetSeries, VarianceQuantity } from '../budget/budget-series';
import type { MeasurementGeometry, ScalarMeasurement } from '../covariance/error-model';
import { wrapAngle } from '../sensors/range-bearing';
import { DeadReckoningRun } from './dead-reckoning-run';
import type { MonteCarloModel, NeesGroup, RunSink, SimulatedOutage, SimulatedQuantity } from './monte-carlo-model';
import { PlanarFilter } from './planar-filter';
import type { PlanarPlan } from './planar-plan';
import { recordPlanarStep, type StepBuffers } from './planar-step-record';
import type { RunRandom } from './run-random';

const POSITION_QUANTITIES: SimulatedQuantity[] = [
  { id: 'north', label: 'north', unitSI: 'm' },
  { id: 'east', label: 'east', unitSI: 'm' },
  { id: 'along-track', label: 'along-track', unitSI: 'm' },
  { id: 'cross-track', label: 'cross-track', unitSI: 'm' },
  { id: 'speed', label: 'speed', unitSI: 'm/s' },
];
const HEADING: SimulatedQuantity = { id: 'heading', label: 'heading', unitSI: 'rad' };

/** NEES groups of the planar model: every state, the horizontal position, the heading. */
export const PLANAR_NEES_GROUPS: NeesGroup[] = [
  { id: 'full', label: 'full state' },
  { id: 'position', label: 'position' },
  { id: 'heading', label: 'heading' },
];

/**
 * The planar model as a {@link MonteCarloModel}: truth and dead reckoning
 * from {@link DeadReckoningRun}, an extended Kalman filter ({@link PlanarFilter})
 * linearised about its own estimate, aided by every aiding sensor's nonlinear
 * measurement (GNSS position plus multipath, compass heading and bearings
 * wrapped to (-π, π], ranges) of the landmarks visible from the true pose.
 * The error-state estimate is fed back into the navigation solution after
 * every scalar update (closed loop), so the filter's error state is zero
 * between updates.
 */
export class PlanarSimulation implements MonteCarloModel {
  readonly stepTimesS: Float64Array;
  readonly quantities: SimulatedQuantity[];
  readonly neesGroups = PLANAR_NEES_GROUPS;
  readonly budgetVariance: Float64Array[];
  readonly outages: SimulatedOutage[];
  private readonly dr: DeadReckoningRun;
  private readonly filter: PlanarFilter;
  private readonly buffers: StepBuffers;
  private readonly hIdx: Int32Array;
  private readonly hVal: Float64Array;
  private readonly geometry: MeasurementGeometry = { northM: 0, eastM: 0, headingRad: 0, everyRow: true };
  private readonly trueGeometry: MeasurementGeometry = { northM: 0, eastM: 0, headingRad: 0 };

  constructor(private readonly plan: PlanarPlan, budget: BudgetSeries) {
    this.stepTimesS = plan.trajectory.tS;
    this.quantities = plan.model.hasSpeedInput ? [HEADING, ...POSITION_QUANTITIES] : [HEADING];
    this.budgetVariance = this.quantities.map((q) => budget.quantities[q.id as VarianceQuantity]!.total);
    this.outages = plan.model.streams.flatMap((s) => s.outages.map((o) => ({ sensorId: s.sensorId, ...o })));
    this.dr = new DeadReckoningRun(plan);
    this.filter = new PlanarFilter(plan);
    this.buffers = {
      errors: new Float64Array(this.quantities.length), variances: new Float64Array(this.quantities.length),
      nees: new Float64Array(3), neesDof: new Float64Array(3), scratch: new Float64Array(plan.n * (plan.n + 2)),
      active: new Int32Array(plan.n),
    };
    this.hIdx = new Int32Array(plan.n);
    this.hVal = new Float64Array(plan.n);
  }

  simulate(rng: RunRandom, sink: RunSink): void {
    const { plan, dr, filter } = this;
    const { core } = plan.model;
    const traj = plan.trajectory;
    const p0 = plan.initialVariance;
    // Initial errors in the path frame of the start heading, rotated to north/east.
    const a0 = Math.sqrt(p0[core.along]) * rng.normal(), x0 = Math.sqrt(p0[core.cross]) * rng.normal();
    const c = Math.cos(plan.mission.startHeadingRad), s = Math.sin(plan.mission.startHeadingRad);
    dr.start(rng, { northM: c * a0 - s * x0, eastM: s * a0 + c * x0, headingRad: Math.sqrt(p0[core.heading]) * rng.normal() });
    filter.reset();
    for (let k = 0; k < traj.tS.length; k++) {
      if (k > 0) {
        const dtS = traj.tS[k] - traj.tS[k - 1];
        const turned = dr.advanceTo(traj.tS[k], rng);
        filter.propagate(dr.speedMps, turned / dtS, dtS, dr.moving);
        // The filter predicts its Gauss-Markov estimates as the model says: x̂ ← e^{-Δ/T} x̂.
        for (const c of plan.calibration) if (c.decayPerS > 0) dr.estimate[c.state] *= this.decay(c.decayPerS, dtS);
      }
      for (const c of plan.calibration) dr.truth[c.state].advanceTo(traj.tS[k], rng);
      this.trueGeometry.northM = traj.northM[k];
      this.trueGeometry.eastM = traj.eastM[k];
      this.trueGeometry.headingRad = traj.headingRad[k];
      for (const stream of plan.events[k]) {
        for (const row of stream.rowsAt(this.trueGeometry)) this.measure(row, stream.rowsAt, rng);
      }
      recordPlanarStep(plan, dr, filter, traj, k, this.buffers);
      sink.step(k, this.buffers.errors, this.buffers.variances, this.buffers.nees, this.buffers.neesDof);
    }
  }

  private readonly decays = new Map<number, number>();

  /** e^{-Δ/T}, cached per 1/T for the mission's (fixed) step. */
  private decay(decayPerS: number, dtS: number): number {
    if (Math.abs(dtS - this.plan.trajectory.stepS) > 1e-12 * dtS) return Math.exp(-dtS * decayPerS);
    let phi = this.decays.get(decayPerS);
    if (phi === undefined) this.decays.set(decayPerS, (phi = Math.exp(-this.plan.trajectory.stepS * decayPerS)));
    return phi;
  }

  /** Appends (state, coefficient) to the sparse H when the coefficient is not zero; returns the new count. */
  private putH(count: number, state: number, coefficient: number): number {
    if (coefficient === 0) return count;
    this.hIdx[count] = state;
    this.hVal[count] = coefficient;
    return count + 1;
  }

  /** One scalar measurement: truth from the true pose, prediction and H from the estimate, Joseph update, feedback. */
  private measure(truthRow: ScalarMeasurement, rowsAt: (g: MeasurementGeometry) => ScalarMeasurement[], rng: RunRandom): void {
    const { plan, dr, filter, geometry } = this;
    const { along, cross, heading } = plan.model.core;
    const r = plan.rByKey.get(truthRow.noiseKey) ?? 0;
    geometry.northM = dr.northM;
    geometry.eastM = dr.eastM;
    geometry.headingRad = dr.headingRad;
    const est = rowsAt(geometry).find((row) => row.key === truthRow.key);
    if (!est) return;
    let y = truthRow.ideal + (r > 0 ? Math.sqrt(r) * rng.normal() : 0);
    let yHat = est.ideal;
    for (const [s, coeff] of truthRow.hStates) if (s !== heading) y += coeff * dr.truth[s].value;
    for (const [s, coeff] of est.hStates) if (s !== heading) yHat += coeff * dr.estimate[s];
    const z = est.wraps ? wrapAngle(yHat - y) : yHat - y;
    const c = Math.cos(dr.headingRad), s = Math.sin(dr.headingRad);
    // H in the filter's frame, its non-zero entries only (no closure: this runs for every scalar measurement).
    let count = this.putH(0, along, est.hNorth * c + est.hEast * s);
    count = this.putH(count, cross, -est.hNorth * s + est.hEast * c);
    for (let e = 0; e < est.hStates.length; e++) {
      const st = est.hStates[e][0];
      count = this.putH(count, st, est.hStates[e][1] * plan.sign[st]);
    }
    if (filter.update(this.hIdx, this.hVal, count, r) === 0) return;
    const g = filter.gain;
    const dA = g[along] * z, dX = g[cross] * z, dPsi = g[heading] * z;
    dr.northM -= c * dA - s * dX;
    dr.eastM -= s * dA + c * dX;
    dr.headingRad -= dPsi;
    for (const cal of plan.calibration) dr.estimate[cal.state] -= plan.sign[cal.state] * g[cal.state] * z;
    filter.rotateFrame(-dPsi, along, cross);
  }
}
