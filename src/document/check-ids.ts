/**
 * The rules on ids and names that a JSON Schema cannot state: uniqueness
 * (ignoring letter case, because formula names ignore it), the reserved
 * sensor id, and named values the formula engine would refuse.
 */
import { BudgetFileError } from './budget-file-error';
import type { AnyBudgetDocument } from './inertial-document';
import { formulaNameProblem, nameKey, RESERVED_SENSOR_ID } from './names';

/** The parts of a document of either model that carry ids. */
type IdDocument = Pick<AnyBudgetDocument, 'values' | 'requirements' | 'checkpoints'> & {
  sensors: { id: string; sources: { id: string }[]; landmarks?: { id: string }[] }[];
};

interface Named {
  id: string;
  path: string;
}

/** A check that throws when an id equals, ignoring case, one it was given before. */
function uniqueIds(what: string, fileName: string): (item: Named) => void {
  const seen = new Map<string, Named>();
  return (item) => {
    const first = seen.get(nameKey(item.id));
    if (first) {
      const spelled = first.id === item.id ? '' : ` as "${first.id}"`;
      throw new BudgetFileError(fileName, item.path, `"${item.id}" is already used by ${first.path}${spelled}; ${what} must differ in more than letter case`);
    }
    seen.set(nameKey(item.id), item);
  };
}

/** Throws for the first id in `items` equal, ignoring case, to an earlier one. */
function requireUnique(items: Named[], what: string, fileName: string): void {
  items.forEach(uniqueIds(what, fileName));
}

/** Ids of a list with the path of each id. */
function idsOf(list: { id?: string }[] | undefined, base: string): Named[] {
  return (list ?? []).flatMap((item, i) => (item.id === undefined ? [] : [{ id: item.id, path: `${base}[${i}].id` }]));
}

/** Sensor ids, then each sensor's row and landmark ids, in document order. */
function checkSensors(doc: IdDocument, fileName: string): void {
  const sensorId = uniqueIds('sensor ids', fileName);
  doc.sensors.forEach((s, i) => {
    if (nameKey(s.id) === RESERVED_SENSOR_ID) {
      throw new BudgetFileError(fileName, `sensors[${i}].id`, `"${s.id}" is reserved for the start-pose sources (mission.initialPosition); choose another sensor id`);
    }
    sensorId({ id: s.id, path: `sensors[${i}].id` });
    requireUnique(idsOf(s.landmarks, `sensors[${i}].landmarks`), 'landmark ids within a sensor', fileName);
    requireUnique(idsOf(s.sources, `sensors[${i}].sources`), 'row ids within a sensor', fileName);
  });
}

function checkValueNames(doc: IdDocument, fileName: string): void {
  const names = Object.keys(doc.values ?? {}).map((name) => ({ id: name, path: `values.${name}` }));
  for (const { id, path } of names) {
    const problem = formulaNameProblem(id);
    if (problem) throw new BudgetFileError(fileName, path, problem);
  }
  requireUnique(names, 'named values', fileName);
}

/**
 * Checks ids and names of a document whose shape the schema already
 * accepted: sensor, row, landmark, requirement and checkpoint ids unique
 * ignoring case; no sensor called "mission"; every named value usable in
 * formulas.
 * @throws BudgetFileError naming the first offending id.
 */
export function checkIds(doc: IdDocument, fileName: string): void {
  checkValueNames(doc, fileName);
  checkSensors(doc, fileName);
  requireUnique(idsOf(doc.requirements, 'requirements'), 'requirement ids', fileName);
  requireUnique(idsOf(doc.checkpoints, 'checkpoints'), 'checkpoint ids', fileName);
}
