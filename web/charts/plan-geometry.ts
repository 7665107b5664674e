import type { PlanView } from '../../src';

/** A point of the drawing, in SVG pixels (x right, y down). */
export interface Px {
  x: number;
  y: number;
}

/** The plan scaled into a drawing of `width` x `height` px: north up, east right, one scale for both. */
export interface PlanGeometry {
  /** Pixels per metre, the same on both axes. */
  pxPerM: number;
  path: Px[];
  /** Stretches driven during each outage, longest first (so shorter ones can be drawn on top, narrower). */
  outages: { sensorId: string; id: string; path: Px[] }[];
  landmarks: { sensorId: string; id: string; at: Px }[];
  /** A round length for the scale bar, in m, and its length in px. */
  scaleBar: { metres: number; px: number };
}

/** Smallest extent drawn, m, so that a parked vehicle still gets a sensible scale. */
const MIN_EXTENT_M = 10;

/** The largest 1, 2 or 5 times a power of ten that is at most `m` (> 0). */
export function roundLength(m: number): number {
  const p = 10 ** Math.floor(Math.log10(m));
  return [5, 2, 1].map((k) => k * p).find((v) => v <= m) ?? p;
}

/**
 * Scales the plan (north and east in m) into the drawing with `margin` px
 * free on every side, centred; each outage gets the stretch of path driven
 * between its start and end time (empty outages are left out).
 */
export function planGeometry(plan: PlanView, width: number, height: number, margin: number): PlanGeometry {
  const norths = [...plan.north, ...plan.landmarks.map((l) => l.north)];
  const easts = [...plan.east, ...plan.landmarks.map((l) => l.east)];
  const [n0, n1] = [Math.min(...norths), Math.max(...norths)];
  const [e0, e1] = [Math.min(...easts), Math.max(...easts)];
  const spanN = Math.max(n1 - n0, MIN_EXTENT_M), spanE = Math.max(e1 - e0, MIN_EXTENT_M);
  const pxPerM = Math.min((width - 2 * margin) / spanE, (height - 2 * margin) / spanN);
  const midN = (n0 + n1) / 2, midE = (e0 + e1) / 2;
  const at = (north: number, east: number): Px => ({ x: width / 2 + (east - midE) * pxPerM, y: height / 2 - (north - midN) * pxPerM });
  const path = plan.north.map((n, k) => at(n, plan.east[k]));
  const outages = plan.outages
    .map((o) => ({ sensorId: o.sensorId, id: o.id, path: path.filter((_, k) => plan.t[k] >= o.startS && plan.t[k] <= o.endS) }))
    .filter((o) => o.path.length > 1)
    .sort((a, b) => b.path.length - a.path.length);
  const metres = roundLength((width - 2 * margin) / 4 / pxPerM);
  return {
    pxPerM, path, outages,
    landmarks: plan.landmarks.map((l) => ({ sensorId: l.sensorId, id: l.id, at: at(l.north, l.east) })),
    scaleBar: { metres, px: metres * pxPerM },
  };
}

/** Points of an SVG polyline. */
export const polylinePoints = (pts: Px[]) => pts.map((p) => `${p.x.toFixed(1)},${p.y.toFixed(1)}`).join(' ');
