/**
 * The filter's rows from the truth's rows and each row's `tuning`: the
 * rows a filter designer would have typed if the filter were the truth.
 * The truth stays the rows as written (docs/planar-model.md §3, §5).
 */
import { InputError } from '../errors';
import type { SensorInput, SourceInput } from '../inputs/budget-input';
import { resolveBiasInstability } from '../sources/bias-instability';
import { tuningModels } from './tuning-choices';

/** What turning rows into the filter's rows did, for the model built from them. */
export interface FilterRows {
  sensors: SensorInput[];
  /** Filter-only variance factor by source id (`gyro.bi`), from `tuning.inflation`. */
  inflation: Map<string, number>;
  /**
   * Bias-instability rows the filter carries as a random walk: source id to
   * the stationary variance σ² (SI) the filter starts the walk with.
   */
  randomWalkStart: Map<string, number>;
  /** Per filter sensor, the truth row index of each filter row (left-out rows are skipped). */
  rowIndex: number[][];
}

/** True when any row of the suite carries a `tuning` that changes the filter. */
export function hasFilterDesign(sensors: SensorInput[]): boolean {
  return sensors.some((s) => (s.sources ?? []).some((r) => r.tuning !== undefined && Object.keys(r.tuning).length > 0));
}

/**
 * The filter's sensors: left-out rows dropped, tuned values and correlation
 * times in place of the truth's, multipath folded or carried as states,
 * bias instability as a random walk (a rate-random-walk row with the
 * Gauss-Markov's driving PSD 2σ²/T, docs/planar-model.md §3, started at σ²).
 * @throws InputError naming the row's `tuning` field for a model its kind cannot take.
 */
export function filterRows(sensors: SensorInput[]): FilterRows {
  const inflation = new Map<string, number>();
  const randomWalkStart = new Map<string, number>();
  const rowIndex: number[][] = [];
  const out = sensors.map((sensor, i) => {
    const kept: number[] = [];
    const sources: SourceInput[] = [];
    sensor.sources.forEach((row, j) => {
      const t = row.tuning;
      const path = `sensors[${i}].sources[${j}].tuning`;
      if (t?.leftOut) return;
      const id = `${sensor.id}.${row.id}`;
      if (t?.inflation !== undefined) {
        if (!(t.inflation > 0) || !Number.isFinite(t.inflation)) throw new InputError(`${path}.inflation`, `must be a number above zero, got ${t.inflation}`);
        inflation.set(id, t.inflation);
      }
      sources.push(tunedRow(row, path, id, randomWalkStart));
      kept.push(j);
    });
    rowIndex.push(kept);
    return { ...sensor, sources };
  });
  return { sensors: out, inflation, randomWalkStart, rowIndex };
}

function tunedRow(row: SourceInput, path: string, id: string, randomWalkStart: Map<string, number>): SourceInput {
  const { tuning, ...truth } = row;
  if (!tuning) return truth;
  const tuned: SourceInput = {
    ...truth,
    ...(tuning.value && { value: tuning.value }),
    ...(tuning.correlationTime && { correlationTime: tuning.correlationTime }),
  };
  if (tuning.model === undefined) return tuned;
  const choices = tuningModels(row.kind);
  if (!choices.some((c) => c.value === tuning.model)) {
    const allowed = choices.length ? `a ${row.kind} row takes ${choices.map((c) => `"${c.value}"`).join(' or ')}` : `a ${row.kind} row takes none`;
    throw new InputError(`${path}.model`, `"${tuning.model}" does not apply: ${allowed} (random-walk or gauss-markov on bias instability, folded or states on multipath)`);
  }
  if (row.kind === 'multipath') return { ...tuned, multipathModel: tuning.model as 'folded' | 'states' };
  if (tuning.model === 'gauss-markov') return tuned;
  const gm = resolveBiasInstability(tuned, 'angular-rate', path.replace(/\.tuning$/, ''));
  randomWalkStart.set(id, gm.sigmaSI * gm.sigmaSI);
  // K² = 2σ²/T: the walk grows like the Gauss-Markov bias does at first.
  const { correlationTime: _t, biasForm: _b, ...rest } = tuned;
  return { ...rest, kind: 'rate-random-walk', value: { value: Math.sqrt(gm.psdSI), unit: 'rad/s/√s' } };
}
