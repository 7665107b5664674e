/**
 * One slot's comparison as a table of text, candidates side by side: the
 * price, each requirement's verdict, worst value and margin, the time to
 * exceed it after each outage starts, and whether the run was complete.
 * The command line pads it into columns and the review report prints it as
 * a table, so both show the same cells.
 */
import { formatSignificant } from '../units';
import type { CandidateOutcome, SlotComparison } from './compare-candidates';

/** Significant digits of the table's numbers (the JSON keeps full precision). */
const DIGITS = 4;

/** A row: what it shows and one cell per candidate. */
export interface ComparisonRow {
  label: string;
  cells: string[];
}

/** The table of one slot: a header cell per candidate and the rows. */
export interface ComparisonTable {
  candidates: string[];
  rows: ComparisonRow[];
}

const fmt = (x: number) => formatSignificant(x, DIGITS);
const levelText = (level: string) => level.replace('sigma', 'σ').replace(/%$/, ' %');

/** The rows of one slot, in reading order; a cell is '' where a candidate has no such result (it did not run). */
export function comparisonTable(slot: SlotComparison): ComparisonTable {
  const outs = slot.outcomes;
  const rows: ComparisonRow[] = [];
  if (outs.some((o) => o.price !== undefined)) {
    rows.push({
      label: `price${slot.currency ? ` (${slot.currency})` : ''}`,
      cells: outs.map((o) => (o.price === undefined ? 'not given' : fmt(o.price))),
    });
  }
  const reference = outs.find((o) => o.requirements.length > 0);
  for (const req of reference?.requirements ?? []) {
    const of = (o: CandidateOutcome) => o.requirements.find((r) => r.id === req.id);
    const head = `${req.id}: ${req.quantity} ${levelText(req.level)} ≤ ${fmt(req.limit.value)} ${req.limit.unit}`;
    rows.push({ label: `${head}: verdict`, cells: outs.map((o) => of(o)?.verdict.toUpperCase() ?? '') });
    rows.push({ label: `${req.id}: worst (${req.limit.unit})`, cells: outs.map((o) => maybe(of(o)?.worstValue)) });
    rows.push({ label: `${req.id}: margin (${req.limit.unit})`, cells: outs.map((o) => maybe(of(o)?.margin)) });
    req.outages.forEach((hold, i) => {
      rows.push({
        label: `${req.id}: time to exceed after ${hold.sensorId} ${hold.outageId} starts (s)`,
        cells: outs.map((o) => {
          const h = of(o)?.outages[i];
          return h === undefined ? '' : h.timeToExceedS === null ? 'holds' : fmt(h.timeToExceedS);
        }),
      });
    });
  }
  rows.push({
    label: 'analysis',
    cells: outs.map((o) => (o.status === 'complete' ? 'complete' : o.status === 'partial' ? 'PARTIAL' : 'BLOCKED')),
  });
  rows.push({ label: 'passes every requirement', cells: outs.map((o) => (o.passesAll ? 'yes' : 'no')) });
  return { candidates: outs.map((o) => o.candidateId), rows };
}

const maybe = (x: number | undefined) => (x === undefined ? '' : fmt(x));

/** The sentence naming the cheapest passing candidate, or why there is none. */
export function cheapestText(slot: SlotComparison): string {
  const n = slot.passingUnpriced.length;
  const verbs = n === 1 ? 'passes but has' : 'pass but have';
  const unpriced = n ? ` (${slot.passingUnpriced.join(', ')} also ${verbs} no price)` : '';
  const currency = slot.currency ? ` ${slot.currency}` : '';
  if (slot.cheapestPassing) {
    const best = slot.outcomes.find((o) => o.candidateId === slot.cheapestPassing)!;
    const what = `${best.candidateId} (${fmt(best.price!)}${currency})`;
    return `Cheapest candidate for ${slot.sensorId} that passes every requirement: ${what}${unpriced}.`;
  }
  if (n) return `No priced candidate for ${slot.sensorId} passes every requirement${unpriced}.`;
  return `No candidate for ${slot.sensorId} passes every requirement.`;
}
