import type { SourceNote } from '../inputs/budget-input';
import type {
  CoreStates, ErrorModel, MeasurementStream, ModelSource, NoiseChannel, StateInfo,
} from './error-model';

/** One entry of F: constant + perSpeed * v + perTurnRate * w (SI). */
interface DynamicsTerm {
  row: number;
  col: number;
  constant: number;
  perSpeed: number;
  perTurnRate: number;
}

/**
 * Collects states, dynamics terms, noise channels, sources and measurement
 * streams while the sensors are placed, then freezes them into an
 * {@link ErrorModel}. States are created on first use by a key, so rows of the
 * same kind that share dynamics (turn-on biases, scale factors) share a state.
 */
export class ModelBuilder {
  private readonly states: StateInfo[] = [];
  private readonly stateKeys = new Map<string, number>();
  private readonly channelKeys = new Map<string, number>();
  private readonly channels: NoiseChannel[] = [];
  private readonly terms: DynamicsTerm[] = [];
  readonly sources: ModelSource[] = [];
  readonly streams: MeasurementStream[] = [];
  readonly core: CoreStates;
  private readonly measurementUnits: Record<string, string> = {};
  hasSpeedInput = false;

  constructor() {
    this.core = {
      along: this.state('along', { name: 'along-track position error', unitSI: 'm', calibration: false }),
      cross: this.state('cross', { name: 'cross-track position error', unitSI: 'm', calibration: false }),
      heading: this.state('heading', { name: 'heading error', unitSI: 'rad', calibration: false }),
      speedScale: -1,
    };
    // Path-frame kinematics (docs/planar-model.md §3 rotated by the heading): the frame turns at w.
    this.term(this.core.along, this.core.cross, { perTurnRate: 1 });
    this.term(this.core.cross, this.core.along, { perTurnRate: -1 });
    this.term(this.core.cross, this.core.heading, { perSpeed: 1 });
  }

  /** The index of the state with this key, creating it with `info` on first use. */
  state(key: string, info: StateInfo): number {
    const found = this.stateKeys.get(key);
    if (found !== undefined) return found;
    this.states.push(info);
    this.stateKeys.set(key, this.states.length - 1);
    return this.states.length - 1;
  }

  /** A calibration state shared by rows of one kind; `link` adds its dynamics the first time only. */
  sharedState(key: string, name: string, unitSI: string, link: (index: number) => void): number {
    const isNew = !this.stateKeys.has(key);
    const s = this.state(key, { name, unitSI, calibration: true });
    if (isNew) link(s);
    return s;
  }

  /** The index of the state with this key, or undefined when none was created. Throws nothing. */
  stateIndex(key: string): number | undefined {
    return this.stateKeys.get(key);
  }

  /** Whether a state with this key exists yet. */
  hasState(key: string): boolean {
    return this.stateKeys.has(key);
  }

  /** Adds F[row, col] += constant + perSpeed v + perTurnRate w. */
  term(row: number, col: number, c: { constant?: number; perSpeed?: number; perTurnRate?: number }): void {
    this.terms.push({ row, col, constant: c.constant ?? 0, perSpeed: c.perSpeed ?? 0, perTurnRate: c.perTurnRate ?? 0 });
  }

  /** Records the SI unit of what the measurement with noise key `key` measures (R is in its square). */
  measurementUnit(key: string, unitSI: string): void {
    this.measurementUnits[key] = unitSI;
  }

  /** The index of the white-noise channel driving `stateIndex`, created on first use. */
  channel(name: string, stateIndex: number): number {
    const key = `${name}@${stateIndex}`;
    const found = this.channelKeys.get(key);
    if (found !== undefined) return found;
    this.channels.push({ name, stateIndex });
    this.channelKeys.set(key, this.channels.length - 1);
    return this.channels.length - 1;
  }

  /** Freezes what was collected. */
  build(): ErrorModel {
    const n = this.states.length;
    const terms = this.terms.slice();
    return {
      states: this.states.slice(),
      core: { ...this.core },
      channels: this.channels.slice(),
      sources: this.sources.slice(),
      streams: this.streams.slice(),
      hasSpeedInput: this.hasSpeedInput,
      measurementUnitsSI: { ...this.measurementUnits },
      dynamics(speedMps: number, turnRateRadps: number): Float64Array {
        const f = new Float64Array(n * n);
        for (const t of terms) f[t.row * n + t.col] += t.constant + t.perSpeed * speedMps + t.perTurnRate * turnRateRadps;
        return f;
      },
    };
  }
}

/** A fresh source record with no pieces yet, carrying the row's provenance and assumption flag. */
export function emptySource(id: string, sensorId: string, kind: string, label: string, note: SourceNote = {}): ModelSource {
  return {
    id, sensorId, kind, label,
    initialVariance: [], noise: [], measurementNoise: [],
    headingOutputVarianceSI: 0, speedOutputVarianceSI: 0,
    conversions: [], assumptions: note.assumed ? [`${id} is marked as an assumption`] : [],
    provenance: note.provenance, assumed: note.assumed === true,
  };
}
