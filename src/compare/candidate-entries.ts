/**
 * Candidate rows in a budget document (the optional top-level `candidates`
 * key, budgets/FORMAT.md "Candidates"): for one sensor at a time, several
 * named sets of rows (three gyros of different grades, two GNSS receivers)
 * that `sigma-ledger compare` runs against the same mission and
 * requirements. The types join {@link BudgetDocument} by declaration merging,
 * so the document's own file needs no edit; the schema's block is
 * `candidates` with the definitions `candidateSlot` and `candidate`.
 */
import { BudgetFileError } from '../document/budget-file-error';
import type { BudgetDocument, QuantityCell, SourceRow } from '../document/budget-document';
import { nameKey } from '../document/names';

/** One candidate for a sensor: its rows replace the sensor's rows as written. */
export interface CandidateEntry {
  /** Unique (ignoring letter case) among the slot's candidates. */
  id: string;
  /** What a unit costs, in the slot's `currency`; leave out when unknown (then it is not ranked by price). */
  price?: number;
  /** The candidate's output rate, when it differs from the sensor's. */
  rate?: QuantityCell;
  /** The rows, as a sensor's `sources` (each with its provenance and `assumed` mark). */
  sources: SourceRow[];
  note?: string;
}

/** The candidates for one sensor of the document. */
export interface CandidateSlot {
  /** Id of the sensor whose rows the candidates replace. */
  sensor: string;
  /** Unit of the prices (free text, e.g. "EUR" or "k$"). */
  currency?: string;
  options: CandidateEntry[];
  note?: string;
}

declare module '../document/budget-document' {
  interface BudgetDocument {
    /** Candidate rows per sensor, for comparing (src/compare/candidate-entries.ts). */
    candidates?: CandidateSlot[];
  }
}

/**
 * The document's candidate slots after the checks the schema cannot state:
 * each names a sensor of the document, no sensor has two slots, candidate
 * ids are unique within a slot and row ids within a candidate (ignoring
 * letter case, as formula names do).
 * @throws BudgetFileError naming `fileName` and the path of the first problem.
 */
export function readCandidateSlots(doc: BudgetDocument, fileName: string): CandidateSlot[] {
  const slots = doc.candidates ?? [];
  const seenSensors = new Map<string, number>();
  slots.forEach((slot, i) => {
    const path = `candidates[${i}]`;
    if (!doc.sensors.some((s) => s.id === slot.sensor)) {
      const known = doc.sensors.map((s) => s.id).join(', ');
      throw new BudgetFileError(
        fileName,
        `${path}.sensor`,
        `no sensor "${slot.sensor}"; the document has ${known || 'none'}`,
      );
    }
    const first = seenSensors.get(nameKey(slot.sensor));
    if (first !== undefined) {
      throw new BudgetFileError(
        fileName,
        `${path}.sensor`,
        `sensor "${slot.sensor}" already has candidates at candidates[${first}]; put them in one list`,
      );
    }
    seenSensors.set(nameKey(slot.sensor), i);
    requireUnique(
      slot.options.map((o, j) => ({ id: o.id, path: `${path}.options[${j}].id` })),
      'candidate ids within a sensor',
      fileName,
    );
    slot.options.forEach((o, j) => {
      requireUnique(
        o.sources.map((r, k) => ({ id: r.id, path: `${path}.options[${j}].sources[${k}].id` })),
        'row ids within a candidate',
        fileName,
      );
    });
  });
  return slots;
}

function requireUnique(items: { id: string; path: string }[], what: string, fileName: string): void {
  const seen = new Map<string, string>();
  for (const item of items) {
    const before = seen.get(nameKey(item.id));
    if (before)
      throw new BudgetFileError(
        fileName,
        item.path,
        `"${item.id}" is already used by ${before}; ${what} must differ in more than letter case`,
      );
    seen.set(nameKey(item.id), item.path);
  }
}
