/**
 * The quantities the engine reports and requirements constrain, in one
 * table: the id is the one spelling documents, requirements, reports and the
 * page use; the JSON keys are where `run --json` puts each quantity. Adding
 * a quantity is a row here (the schema's requirement enum, the reports and
 * the page read this table).
 */
import type { DimensionName } from '../units';

/** One reported quantity. */
export interface QuantitySpec {
  /** The one spelling, as written in documents (`requirements[].quantity`) and used in code. */
  readonly id: string;
  /** In words, for reports and the page. */
  readonly label: string;
  /** Unit its sigma and a requirement's limit are shown in, and that unit's dimension. */
  readonly displayUnit: string;
  readonly dimension: DimensionName;
  /**
   * SI unit of its variance when it is a variance quantity with per-source
   * contributions (docs/planar-model.md §8); absent for derived quantities
   * (horizontal position is DRMS, 2DRMS, R95 or CEP by level).
   */
  readonly varianceUnitSI?: string;
  /** Key of its 1σ series in the JSON result (`series.<key>`, display unit). */
  readonly seriesKey?: string;
  /**
   * Key of its contributions and checkpoint budgets in the JSON result
   * (`contributions.<key>`): format version 1 of the result keeps these
   * short keys (README, "run --json").
   */
  readonly resultKey?: string;
  /** True when a requirement may constrain it. */
  readonly requirement: boolean;
  /** True when only a suite with a speed input reports it. */
  readonly needsSpeedInput: boolean;
}

/** Every quantity, in the order reports list them. */
export const QUANTITIES = [
  {
    id: 'heading', label: 'heading', displayUnit: 'deg', dimension: 'angle', varianceUnitSI: 'rad²',
    seriesKey: 'heading_sigma_deg', resultKey: 'heading', requirement: true, needsSpeedInput: false,
  },
  {
    id: 'speed', label: 'speed', displayUnit: 'm/s', dimension: 'speed', varianceUnitSI: '(m/s)²',
    seriesKey: 'speed_sigma_mps', resultKey: 'speed', requirement: true, needsSpeedInput: true,
  },
  {
    id: 'north', label: 'north', displayUnit: 'm', dimension: 'length', varianceUnitSI: 'm²',
    seriesKey: 'north_sigma_m', resultKey: 'north', requirement: true, needsSpeedInput: true,
  },
  {
    id: 'east', label: 'east', displayUnit: 'm', dimension: 'length', varianceUnitSI: 'm²',
    seriesKey: 'east_sigma_m', resultKey: 'east', requirement: true, needsSpeedInput: true,
  },
  {
    id: 'along-track', label: 'along-track', displayUnit: 'm', dimension: 'length', varianceUnitSI: 'm²',
    seriesKey: 'along_sigma_m', resultKey: 'along', requirement: true, needsSpeedInput: true,
  },
  {
    id: 'cross-track', label: 'cross-track', displayUnit: 'm', dimension: 'length', varianceUnitSI: 'm²',
    seriesKey: 'cross_sigma_m', resultKey: 'cross', requirement: true, needsSpeedInput: true,
  },
  {
    id: 'drms', label: 'DRMS', displayUnit: 'm', dimension: 'length', varianceUnitSI: 'm²',
    seriesKey: 'drms_m', resultKey: 'drms', requirement: false, needsSpeedInput: true,
  },
  {
    id: 'horizontal', label: 'horizontal position', displayUnit: 'm', dimension: 'length',
    requirement: true, needsSpeedInput: true,
  },
] as const satisfies readonly QuantitySpec[];

type Row = (typeof QUANTITIES)[number];

/** Any quantity id. */
export type QuantityId = Row['id'];
/** Quantities reported as variances with per-source contributions. */
export type VarianceQuantity = Extract<Row, { varianceUnitSI: string }>['id'];
/** Quantities a requirement may constrain. */
export type QuantityName = Extract<Row, { requirement: true }>['id'];

const BY_ID = new Map<string, QuantitySpec>(QUANTITIES.map((q) => [q.id, q]));

/** The table row of a quantity id. @throws Error for an id not in the table (a programming error). */
export function quantitySpec(id: QuantityId): QuantitySpec {
  const q = BY_ID.get(id);
  if (!q) throw new Error(`unknown quantity "${id}"`);
  return q;
}

/** The variance quantities, in report order. */
export const VARIANCE_QUANTITIES = QUANTITIES.filter((q) => 'varianceUnitSI' in q).map((q) => q.id) as VarianceQuantity[];

/** The quantities a requirement may name, in report order (the schema's enum). */
export const QUANTITY_NAMES = QUANTITIES.filter((q) => q.requirement).map((q) => q.id) as QuantityName[];
