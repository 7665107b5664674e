/**
 * The filter model of a suboptimal-filter analysis and how its states relate
 * to the truth's: the map T with x_filter = T x_truth for the quantities both
 * carry (Gelb, Applied Optimal Estimation, 1974, §7.2; Maybeck, Stochastic
 * Models, Estimation and Control, vol. 1, 1979, ch. 6).
 */
import { InputError, SigmaLedgerError } from '../errors';
import type { MissionInput, SensorInput } from '../inputs/budget-input';
import type { ErrorModel, ModelSource } from '../covariance/error-model';
import type { ResolvedMission } from '../mission/resolve-mission';
import { buildErrorModel } from '../sensors/build-error-model';
import { filterRows } from './filter-rows';

/** A filter model with its map from the truth's states. */
export interface FilterModel {
  model: ErrorModel;
  /** T, row-major n_filter x n_truth: 1 where a filter state stands for a truth state. */
  truthMap: Float64Array;
}

/** A filter-only change of one sensor's R (the R sweep). */
export interface RScale {
  sensorId: string;
  factor: number;
}

/**
 * Builds the filter's error model from the suite's `tuning` fields and
 * matches its states to the truth's by key; a filter random walk standing
 * for a truth Gauss-Markov bias maps to that bias (and to any truth rate
 * random walk sharing the state).
 * @throws InputError naming the row (and its `tuning` field) the filter cannot model.
 */
export function buildFilterModel(
  sensors: SensorInput[], mission: ResolvedMission, notes: MissionInput['initialSigmaNotes'], truth: ErrorModel, rScale?: RScale,
): FilterModel {
  const rows = filterRows(sensors);
  let model: ErrorModel;
  try {
    model = buildErrorModel(rows.sensors, mission, notes);
  } catch (e) {
    if (!(e instanceof SigmaLedgerError)) throw e;
    throw new InputError(truthPath(e.path, rows.rowIndex), `in the filter's design (tuning): ${e.message.slice(e.path.length + 2) || e.message}`);
  }
  const keyOf = (m: ErrorModel) => m.stateKeys ?? [];
  const rwKey = new Map<string, string>();
  const sources = model.sources.map((src): ModelSource => {
    const factor = (rows.inflation.get(src.id) ?? 1) * (rScale && src.sensorId === rScale.sensorId ? rScale.factor : 1);
    const start = rows.randomWalkStart.get(src.id);
    const out = scaleSource(src, rows.inflation.get(src.id) ?? 1, factor);
    if (start !== undefined) {
      const state = keyOf(model).indexOf(`${src.sensorId}#rrw`);
      out.initialVariance = [{ state, varianceSI: start * (rows.inflation.get(src.id) ?? 1) }];
      rwKey.set(`${src.id}#gm`, `${src.sensorId}#rrw`);
    }
    return out;
  });
  model = { ...model, sources };
  return { model, truthMap: truthMap(keyOf(truth), keyOf(model), rwKey) };
}

/** A source with its variances times `factor` (R times `rFactor`, which includes a sweep's scale). */
function scaleSource(src: ModelSource, factor: number, rFactor: number): ModelSource {
  if (factor === 1 && rFactor === 1) return src;
  return {
    ...src,
    initialVariance: src.initialVariance.map((p) => ({ ...p, varianceSI: p.varianceSI * factor })),
    noise: src.noise.map((p) => ({ ...p, psdSI: p.psdSI * factor })),
    measurementNoise: src.measurementNoise.map((p) => ({ ...p, varianceSI: p.varianceSI * rFactor })),
    headingOutputVarianceSI: src.headingOutputVarianceSI * factor,
    speedOutputVarianceSI: src.speedOutputVarianceSI * factor,
  };
}

function truthMap(truthKeys: string[], filterKeys: string[], alias: Map<string, string>): Float64Array {
  const nt = truthKeys.length, nf = filterKeys.length;
  const t = new Float64Array(nf * nt);
  truthKeys.forEach((key, i) => {
    const j = filterKeys.indexOf(alias.get(key) ?? key);
    if (j >= 0) t[j * nt + i] = 1;
  });
  return t;
}

/** The document-order path of a filter-row path (left-out rows shift indices). */
function truthPath(path: string, rowIndex: number[][]): string {
  const m = /^sensors\[(\d+)\]\.sources\[(\d+)\](.*)$/.exec(path);
  if (!m) return path;
  const j = rowIndex[Number(m[1])]?.[Number(m[2])] ?? Number(m[2]);
  return `sensors[${m[1]}].sources[${j}]${m[3]}`;
}
