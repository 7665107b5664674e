/**
 * One candidate put in place: a copy of the document in which one sensor's
 * rows (and, when the candidate gives one, its rate) are the candidate's.
 * Works on the document, not on a model, so the same substitution serves
 * any model the document describes; everything else (mission, other
 * sensors, requirements, named values) stays as written.
 */
import type { BudgetDocument } from '../document/budget-document';
import type { CandidateEntry } from './candidate-entries';

/**
 * The document with sensor `sensorId`'s rows replaced by `candidate`'s. The
 * copy has no `candidates` or `sizing` of its own (a sizing run may name a
 * row the candidate lacks). The input is not changed.
 * @throws Error when the sensor is missing (readCandidateSlots checks this first).
 */
export function withCandidateRows(doc: BudgetDocument, sensorId: string, candidate: CandidateEntry): BudgetDocument {
  const copy = JSON.parse(JSON.stringify(doc)) as BudgetDocument;
  delete copy.candidates;
  delete copy.sizing;
  const sensor = copy.sensors.find((s) => s.id === sensorId);
  if (!sensor) throw new Error(`no sensor "${sensorId}" to put candidate "${candidate.id}" in`);
  sensor.sources = JSON.parse(JSON.stringify(candidate.sources)) as typeof sensor.sources;
  if (candidate.rate) sensor.rate = { ...candidate.rate };
  return copy;
}
