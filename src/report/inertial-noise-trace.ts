/**
 * The R, Q and P0 of a 3-D analysis, every entry traced to the rows that own
 * it (the inertial counterpart of noise-trace.ts, same entry shape).
 */
import type { InertialModel } from '../inertial/inertial-model';
import { add, getOrAdd, squared, type NoiseTrace, type TracedEntry } from './noise-trace';

const AXES = ['x', 'y', 'z'];
const BLOCK_UNIT = { attitude: 'rad', velocity: 'm/s' } as const;

/**
 * Collects every R, continuous Q (PSD: of a state's own driving noise, or of
 * an IMU axis's white noise entering through C_b^n) and P0 entry of the
 * inertial model with its sources. Measurement units are not kept by the
 * model, so R entries carry the unit "SI²". Throws nothing.
 */
export function traceInertialNoise(model: InertialModel): NoiseTrace {
  const r = new Map<string, TracedEntry>(), q = new Map<string, TracedEntry>(), p0 = new Map<number, TracedEntry>();
  for (const src of model.sources) {
    const conversions = src.conversions.map((c) => `${c.field}: ${c.text}`);
    for (const piece of src.measurementNoise) {
      const e = getOrAdd(r, piece.measurement, () => ({ name: piece.measurement, unitSI: 'SI²', totalSI: 0, pieces: [] }));
      add(e, { sourceId: src.id, valueSI: piece.varianceSI, derivation: piece.derivation, conversions });
    }
    for (const n of src.noise) {
      const [key, name, unit] = n.on === 'state'
        ? [`s${n.state}`, model.states[n.state].name, model.states[n.state].unitSI]
        : [`${n.block}${n.axis}`, `${model.imuId} ${AXES[n.axis]}-axis white noise -> ${n.block}`, BLOCK_UNIT[n.block]];
      const e = getOrAdd(q, key, () => ({ name, unitSI: `${squared(unit)}/s`, totalSI: 0, pieces: [] }));
      add(e, { sourceId: src.id, valueSI: n.psdSI, derivation: n.derivation, conversions });
    }
    for (const iv of src.initialVariance) {
      const state = model.states[iv.state];
      const e = getOrAdd(p0, iv.state, () => ({ name: state.name, unitSI: squared(state.unitSI), totalSI: 0, pieces: [] }));
      add(e, { sourceId: src.id, valueSI: iv.varianceSI, derivation: 'σ²', conversions });
    }
  }
  return { r: [...r.values()], q: [...q.values()], p0: [...p0.values()] };
}
