/**
 * Comparing candidates: each candidate of each slot (budgets/FORMAT.md
 * "Candidates") replaces its sensor's rows and the whole document is
 * analysed again against the same mission and requirements. The work is a
 * list of independent runs ({@link candidateRuns}), each a pure function of
 * the document ({@link runCandidate}), assembled at the end
 * ({@link assembleComparison}), so runs can be split between threads or
 * machines and put back together in any order.
 */
import type { BudgetDocument } from '../document/budget-document';
import { readCandidateSlots } from './candidate-entries';
import { analyseCandidateDocument, type CandidateAnalyser, type CandidateAnalysis } from './candidate-analysis';
import { withCandidateRows } from './substitute-rows';

/** One run of the comparison: candidate `optionIndex` of slot `slotIndex`. */
export interface CandidateRun {
  slotIndex: number;
  optionIndex: number;
}

/** One candidate's analysis with its identity and price. */
export interface CandidateOutcome extends CandidateAnalysis, CandidateRun {
  sensorId: string;
  candidateId: string;
  price?: number;
  /** True when the run is complete, the document has requirements and every one passes. */
  passesAll: boolean;
}

/** Every candidate of one sensor, side by side. */
export interface SlotComparison {
  sensorId: string;
  currency?: string;
  note?: string;
  outcomes: CandidateOutcome[];
  /**
   * The passing candidate with the lowest price (the first in document order
   * on a tie); undefined when none is priced and passing.
   */
  cheapestPassing?: string;
  /** Candidates that pass but have no price, so could not be ranked. */
  passingUnpriced: string[];
}

/** The comparison of every slot. */
export interface CandidateComparison {
  /** Requirement ids of the document, in its order. */
  requirementIds: string[];
  slots: SlotComparison[];
}

/** Options of {@link compareCandidates}. */
export interface CompareOptions {
  /** Named in messages about the candidates (default `budget`). */
  fileName?: string;
  /** The analysis of one candidate's document (default: the planar chain). */
  analyse?: CandidateAnalyser;
  /** Called after each run with the runs done and the total, for progress. */
  onRun?: (done: number, total: number) => void;
}

/**
 * The runs a comparison needs, slot by slot in document order.
 * @throws BudgetFileError for a slot naming a missing sensor or a repeated id.
 */
export function candidateRuns(doc: BudgetDocument, fileName = 'budget'): CandidateRun[] {
  return readCandidateSlots(doc, fileName).flatMap((slot, slotIndex) =>
    slot.options.map((_, optionIndex) => ({ slotIndex, optionIndex })),
  );
}

/** Analyses one candidate in place of its sensor's rows. Bad cells come back in the outcome, never as a throw. */
export function runCandidate(
  doc: BudgetDocument,
  run: CandidateRun,
  analyse: CandidateAnalyser = analyseCandidateDocument,
): CandidateOutcome {
  const slot = doc.candidates![run.slotIndex];
  const option = slot.options[run.optionIndex];
  const analysis = analyse(withCandidateRows(doc, slot.sensor, option));
  const passesAll =
    analysis.status === 'complete' &&
    analysis.requirements.length > 0 &&
    analysis.requirements.every((r) => r.verdict === 'pass');
  return {
    ...run,
    sensorId: slot.sensor,
    candidateId: option.id,
    ...(option.price !== undefined && { price: option.price }),
    ...analysis,
    passesAll,
  };
}

/**
 * Puts the outcomes of every run (in any order) back into slots and ranks
 * each slot's passing candidates by price.
 * @throws Error when an outcome is missing.
 */
export function assembleComparison(doc: BudgetDocument, outcomes: CandidateOutcome[]): CandidateComparison {
  const slots = (doc.candidates ?? []).map((slot, slotIndex): SlotComparison => {
    const mine = slot.options.map((o, optionIndex) => {
      const found = outcomes.find((x) => x.slotIndex === slotIndex && x.optionIndex === optionIndex);
      if (!found) throw new Error(`no result for candidate "${o.id}" of sensor "${slot.sensor}"`);
      return found;
    });
    const priced = mine.filter((o) => o.passesAll && o.price !== undefined);
    const cheapest = priced.reduce<CandidateOutcome | undefined>(
      (best, o) => (best === undefined || o.price! < best.price! ? o : best),
      undefined,
    );
    return {
      sensorId: slot.sensor,
      ...(slot.currency && { currency: slot.currency }),
      ...(slot.note && { note: slot.note }),
      outcomes: mine,
      ...(cheapest && { cheapestPassing: cheapest.candidateId }),
      passingUnpriced: mine.filter((o) => o.passesAll && o.price === undefined).map((o) => o.candidateId),
    };
  });
  return { requirementIds: (doc.requirements ?? []).map((r) => r.id), slots };
}

/**
 * Every candidate of every slot run against the document's mission and
 * requirements, one after another.
 * @throws BudgetFileError for a slot naming a missing sensor or a repeated id.
 */
export function compareCandidates(doc: BudgetDocument, options: CompareOptions = {}): CandidateComparison {
  const runs = candidateRuns(doc, options.fileName);
  const outcomes = runs.map((run, i) => {
    const outcome = runCandidate(doc, run, options.analyse);
    options.onRun?.(i + 1, runs.length);
    return outcome;
  });
  return assembleComparison(doc, outcomes);
}
