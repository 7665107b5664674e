import type { ErrorModel } from '../covariance/error-model';

/** One source's piece of an R, Q or P0 entry, with how it was obtained. */
export interface TracedPiece {
  sourceId: string;
  valueSI: number;
  /** The formula applied (e.g. "PSD = 2σ²/T with T = 150 s"). */
  derivation: string;
  /** Unit conversions of the row's cells, as recorded when the row was read. */
  conversions: string[];
}

/** One entry of R (a scalar measurement), Q (a noise channel's PSD) or P0 (a state's initial variance). */
export interface TracedEntry {
  /** e.g. "gnss.north", "gyro rate noise -> heading error", "gyro turn-on bias". */
  name: string;
  unitSI: string;
  totalSI: number;
  pieces: TracedPiece[];
}

/** The R, Q and P0 the analysis used, every entry traced to its rows. */
export interface NoiseTrace {
  r: TracedEntry[];
  q: TracedEntry[];
  p0: TracedEntry[];
}

const conversionsOf = (model: ErrorModel, s: number) => model.sources[s].conversions.map((c) => `${c.field}: ${c.text}`);

/**
 * Collects every R, continuous Q (PSD per noise channel) and P0 entry with
 * the sources that own it (docs/planar-model.md §8: "the R and Q actually used, each
 * entry traced to its rows and unit conversions").
 */
export function traceNoise(model: ErrorModel): NoiseTrace {
  const r = new Map<string, TracedEntry>();
  const q = new Map<number, TracedEntry>();
  const p0 = new Map<number, TracedEntry>();
  model.sources.forEach((src, s) => {
    for (const piece of src.measurementNoise) {
      const e = getOrAdd(r, piece.measurement, () => ({ name: piece.measurement, unitSI: squared(model.measurementUnitsSI[piece.measurement] ?? '1'), totalSI: 0, pieces: [] }));
      add(e, { sourceId: src.id, valueSI: piece.varianceSI, derivation: piece.derivation, conversions: conversionsOf(model, s) });
    }
    for (const piece of src.noise) {
      const ch = model.channels[piece.channel];
      const state = model.states[ch.stateIndex];
      const e = getOrAdd(q, piece.channel, () => ({ name: `${ch.name} -> ${state.name}`, unitSI: `${squared(state.unitSI)}/s`, totalSI: 0, pieces: [] }));
      const gate = piece.onlyWhileMoving ? ' (off while parked)' : '';
      add(e, { sourceId: src.id, valueSI: piece.psdSI, derivation: piece.derivation + gate, conversions: conversionsOf(model, s) });
    }
    for (const iv of src.initialVariance) {
      const state = model.states[iv.state];
      const e = getOrAdd(p0, iv.state, () => ({ name: state.name, unitSI: squared(state.unitSI), totalSI: 0, pieces: [] }));
      add(e, { sourceId: src.id, valueSI: iv.varianceSI, derivation: 'σ²', conversions: conversionsOf(model, s) });
    }
  });
  return { r: [...r.values()], q: [...q.values()], p0: [...p0.values()] };
}

/** The entry under `key`, made by `make` when there is none yet. */
export function getOrAdd<K, V>(map: Map<K, V>, key: K, make: () => V): V {
  let v = map.get(key);
  if (!v) map.set(key, (v = make()));
  return v;
}

/** Adds a source's piece to an entry's total. */
export function add(e: TracedEntry, piece: TracedPiece): void {
  e.pieces.push(piece);
  e.totalSI += piece.valueSI;
}

/** "m" -> "m²", "rad/s" -> "(rad/s)²", "1" -> "1". */
export function squared(unit: string): string {
  if (unit === '1') return '1';
  return /^[a-zA-Zµ]+$/.test(unit) ? `${unit}²` : `(${unit})²`;
}
