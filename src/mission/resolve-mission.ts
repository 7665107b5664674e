import { InputError } from '../errors';
import { nonNegativeToSI, positiveToSI, quantityToSI, requireArray } from '../inputs/checks';
import type { MissionInput, Quantity } from '../inputs/budget-input';
import { describeConversion, type DimensionName } from '../units';

/** One segment in SI, with its place on the mission clock. */
export interface ResolvedSegment {
  label: string;
  startS: number;
  endS: number;
  speedStartMps: number;
  speedEndMps: number;
  turnRateRadps: number;
}

/** The mission in SI units, validated. */
export interface ResolvedMission {
  startNorthM: number;
  startEastM: number;
  startHeadingRad: number;
  initialPositionSigmaM: number;
  initialHeadingSigmaRad: number;
  /** How the start-pose sigmas were converted to SI, one line each, so P0 traces back to the mission's cells. */
  initialSigmaConversions: { position: string; heading: string };
  segments: ResolvedSegment[];
  durationS: number;
}

/**
 * Validates the mission and converts it to SI.
 * @throws InputError naming the field: an empty mission, a non-positive
 *   duration, a negative speed or sigma, a unit of the wrong dimension.
 */
export function resolveMission(mission: MissionInput | undefined, path = 'mission'): ResolvedMission {
  if (!mission || typeof mission !== 'object') throw new InputError(path, 'is missing');
  const start = mission.start ?? ({} as MissionInput['start']);
  const sigma = mission.initialSigma ?? ({} as MissionInput['initialSigma']);
  const segmentsIn = requireArray(mission.segments, `${path}.segments`);
  const segments: ResolvedSegment[] = [];
  let clockS = 0;
  segmentsIn.forEach((seg, i) => {
    const p = `${path}.segments[${i}]`;
    const durationS = positiveToSI(seg?.duration, 'time', `${p}.duration`);
    const speedStartMps = nonNegativeToSI(seg.speed, 'speed', `${p}.speed`);
    const speedEndMps = seg.speedEnd === undefined ? speedStartMps : nonNegativeToSI(seg.speedEnd, 'speed', `${p}.speedEnd`);
    const turnRateRadps = quantityToSI(seg.turnRate, 'angular-rate', `${p}.turnRate`);
    segments.push({
      label: seg.id ?? `segment ${i + 1}`,
      startS: clockS,
      endS: clockS + durationS,
      speedStartMps,
      speedEndMps,
      turnRateRadps,
    });
    clockS += durationS;
  });
  return {
    startNorthM: quantityToSI(start.north, 'length', `${path}.start.north`),
    startEastM: quantityToSI(start.east, 'length', `${path}.start.east`),
    startHeadingRad: quantityToSI(start.heading, 'angle', `${path}.start.heading`),
    initialPositionSigmaM: nonNegativeToSI(sigma.position, 'length', `${path}.initialSigma.position`),
    initialHeadingSigmaRad: nonNegativeToSI(sigma.heading, 'angle', `${path}.initialSigma.heading`),
    initialSigmaConversions: {
      position: conversionText(sigma.position, 'length', `${path}.initialSigma.position`),
      heading: conversionText(sigma.heading, 'angle', `${path}.initialSigma.heading`),
    },
    segments,
    durationS: clockS,
  };
}

/** The conversion line of a quantity already checked by nonNegativeToSI. */
function conversionText(q: Quantity, expected: DimensionName, path: string): string {
  return describeConversion(q.value, q.unit, expected, path).text;
}
