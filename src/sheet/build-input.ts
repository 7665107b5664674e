/**
 * Evaluated cells to the engine's input. An item with a failed cell (a row,
 * an outage, a landmark, a sensor, a segment, a requirement, a checkpoint)
 * is left out and listed, so everything else still computes; the start pose
 * and the step have no such fallback, so their failure means no input.
 */
import type { BudgetDocument, MissionEntry, RequirementEntry } from '../document/budget-document';
import type { BudgetInput, CheckpointInput, MissionInput, RequirementInput, SegmentInput } from '../inputs/budget-input';
import { buildSensors, type SensorIndexMap } from './build-sensors';
import { keepBuilt, QuantityReader, type CellLookup, type OmittedItem } from './cell-reader';

/** For each list of the input, the document index of each entry kept (input index i came from document index map[i]). */
export interface InputIndexMap extends SensorIndexMap {
  segments: number[];
  requirements: number[];
  checkpoints: number[];
}

/** The input, or why there is none, with what was left out. */
export interface BuiltInput {
  input?: BudgetInput;
  /** Why no input could be made: a start-pose or step cell failed, or no segment is left. */
  blocked?: string;
  omitted: OmittedItem[];
  indexMap: InputIndexMap;
}

/** The mission, or the reason there is none. */
function buildMission(r: QuantityReader, m: MissionEntry, omitted: OmittedItem[], kept: number[]): MissionInput | string {
  const start = r.fields(m.start, 'mission.start', ['north', 'east', 'heading']);
  const position = r.quantity(m.initialPosition, 'mission.initialPosition');
  const heading = r.quantity(m.initialHeading, 'mission.initialHeading');
  const segments = keepBuilt(m.segments, 'mission.segments', (s, p) => {
    const fields = r.fields(s, p, ['duration', 'speed', 'speedEnd', 'turnRate']);
    return fields && ({ ...(s.id !== undefined && { id: s.id }), ...fields } as SegmentInput);
  }, (s, i) => `segment ${s.id ?? i + 1}`, omitted, kept);
  if (start === undefined) return 'a cell of the start pose (mission.start) has an error';
  if (position === undefined || heading === undefined) return 'a start-pose uncertainty (mission.initialPosition or mission.initialHeading) has an error';
  if (segments.length < m.segments.length) {
    const failed = m.segments.findIndex((_s, i) => !kept.includes(i));
    // Leaving a leg out would shift every later time (outages, checkpoints) and blame the wrong fields.
    return `mission.segments[${failed}] has a cell error, and the mission's timeline cannot be built without it`;
  }
  const note = (s: { provenance: string; assumed: boolean }) => ({ provenance: s.provenance, assumed: s.assumed });
  return {
    start: start as MissionInput['start'], initialSigma: { position, heading }, segments,
    initialSigmaNotes: { position: note(m.initialPosition), heading: note(m.initialHeading) },
  };
}

/** The requirements whose cells evaluated (either model's: the quantity is copied as written). */
export function buildRequirements<Q extends string>(
  r: QuantityReader, doc: { requirements?: (Omit<RequirementEntry, 'quantity'> & { quantity: Q })[] }, omitted: OmittedItem[], kept: number[],
): (Omit<RequirementInput, 'quantity'> & { quantity: Q })[] {
  return keepBuilt(doc.requirements ?? [], 'requirements', (req, p) => {
    const limit = r.quantity(req.limit, `${p}.limit`);
    const window = req.window && r.fields(req.window, `${p}.window`, ['start', 'end']);
    if (limit === undefined || (req.window && window === undefined)) return undefined;
    return { id: req.id, quantity: req.quantity, level: req.level, limit, ...(window && { window: window as RequirementInput['window'] }) };
  }, (req) => `requirement ${req.id}`, omitted, kept);
}

/** The checkpoints whose time evaluated. */
export function buildCheckpoints(r: QuantityReader, doc: Pick<BudgetDocument, 'checkpoints'>, omitted: OmittedItem[], kept: number[]): CheckpointInput[] {
  return keepBuilt(doc.checkpoints ?? [], 'checkpoints', (c, p) => {
    const time = r.quantity(c.time, `${p}.time`);
    return time && { id: c.id, time };
  }, (c) => `checkpoint ${c.id}`, omitted, kept);
}

/**
 * The engine's input from a document and its evaluated cells.
 * @param lookup the number of a value cell by path, undefined when the cell or its unit failed.
 * Throws nothing: a failure that leaves no input comes back as `blocked`.
 */
export function buildBudgetInput(doc: BudgetDocument, lookup: CellLookup): BuiltInput {
  const r = new QuantityReader(lookup);
  const omitted: OmittedItem[] = [];
  const kept = { segments: [] as number[], requirements: [] as number[], checkpoints: [] as number[] };
  const mission = buildMission(r, doc.mission, omitted, kept.segments);
  const step = r.quantity(doc.settings.step, 'settings.step');
  const { sensors, map } = buildSensors(r, doc.sensors, omitted);
  const requirements = buildRequirements(r, doc, omitted, kept.requirements);
  const checkpoints = buildCheckpoints(r, doc, omitted, kept.checkpoints);
  const indexMap: InputIndexMap = { ...map, ...kept };
  if (typeof mission === 'string') return { blocked: mission, omitted, indexMap };
  if (step === undefined) return { blocked: 'the step (settings.step) has an error', omitted, indexMap };
  const input: BudgetInput = { mission, sensors, step };
  if (doc.settings.level !== undefined) input.reportLevel = doc.settings.level;
  if (doc.requirements !== undefined) input.requirements = requirements;
  if (doc.checkpoints !== undefined) input.checkpoints = checkpoints;
  return { input, omitted, indexMap };
}
