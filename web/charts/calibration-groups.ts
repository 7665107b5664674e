import type { JsonResult } from '../../src';
import { SigmaLedgerError } from '../../src';
import { convert } from '../../src';

/** Calibration states that share a unit, for one plot. */
export interface CalibrationGroup {
  /** What the states are, in words: "angular rates", "scale factors". */
  title: string;
  /** SI unit of the engine's states (rad/s, 1, m, rad). */
  unitSI: string;
  /** Unit the plot shows (deg/h, ppm, m, deg). */
  unit: string;
  states: { state: string; sigma: number[] }[];
}

/** How each SI unit of a calibration state is shown: the trade's usual unit and a name for the group. */
const SHOWN_AS: Record<string, { unit: string; title: string }> = {
  'rad/s': { unit: 'deg/h', title: 'angular rates' },
  rad: { unit: 'deg', title: 'angles' },
  '1': { unit: 'ppm', title: 'scale factors' },
  m: { unit: 'm', title: 'lengths' },
  'm/s': { unit: 'm/s', title: 'speeds' },
};

/**
 * The result's calibration states grouped by unit, in group order of first
 * appearance, each σ series converted from SI to the unit the trade
 * usually writes (rad/s -> deg/h, 1 -> ppm, rad -> deg); units without
 * a usual form stay in SI.
 */
export function calibrationGroups(result: JsonResult): CalibrationGroup[] {
  const groups = new Map<string, CalibrationGroup>();
  for (const c of result.calibration) {
    let group = groups.get(c.unit);
    if (!group) {
      const shown = SHOWN_AS[c.unit] ?? { unit: c.unit, title: `states in ${c.unit}` };
      groups.set(c.unit, (group = { title: shown.title, unitSI: c.unit, unit: shown.unit, states: [] }));
    }
    const f = factor(c.unit, group.unit);
    group.states.push({ state: c.state, sigma: c.sigma.map((s) => s * f) });
  }
  return [...groups.values()];
}

function factor(fromSI: string, to: string): number {
  try {
    return convert(1, fromSI, to, 'calibration');
  } catch (e) {
    if (!(e instanceof SigmaLedgerError)) throw e;
    return 1;
  }
}
