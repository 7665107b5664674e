/**
 * A record of one conversion to SI, for provenance: the report shows where
 * every engine number came from, step by step, not just the result.
 */
import { formatSignificant } from './format-significant';
import { DIMENSIONS, type DimensionName } from './named-dimensions';
import { toSI, unitFor } from './to-si';

/** Digits that show the value as the user wrote it (0.2, not 0.200000000000000011). */
const INPUT_DIGITS = 15;

/**
 * A number and its unit as reports print them; a plain ratio ('1' or '') is
 * written bare, so a scale factor reads "0.003", never "0.003 1".
 */
export function withUnit(numberText: string, unit: string): string {
  const u = unit.trim();
  return u === '' || u === '1' ? numberText : `${numberText} ${u}`;
}

/** One conversion to SI, as data and as a sentence. */
export interface ConversionRecord {
  /** The value as given, in `unit`. */
  readonly value: number;
  /** The unit text as given. */
  readonly unit: string;
  /** SI per one `unit` (e.g. (rad/√s) per (deg/√h)). */
  readonly factorToSI: number;
  /** The value in `unitSI`. */
  readonly valueSI: number;
  /** The SI unit text of the expected dimension (rad/√s). */
  readonly unitSI: string;
  /** Definitions of the table units used, e.g. ['1 deg = π/180 rad', '1 h = 3600 s']. */
  readonly definitions: readonly string[];
  /**
   * The conversion as one line, e.g. "0.2 deg/√h × 2.90888e-4 rad/√s per deg/√h =
   * 5.81776e-5 rad/√s (1 deg = π/180 rad; 1 h = 3600 s)".
   */
  readonly text: string;
}

/**
 * Converts `value` in `unit` to SI and records how.
 * @param expected the dimension the value must have.
 * @param path where the value sits in the input, for error messages.
 * @param digits significant digits for the factor and result in `text` (the
 *   numbers in the record are exact).
 * @throws InputError naming `path` as {@link toSI} does, or at 'digits' when
 *   `digits` is not a whole number from 1 to 17.
 */
export function describeConversion(value: number, unit: string, expected: DimensionName, path = '', digits = 6): ConversionRecord {
  const valueSI = toSI(value, unit, expected, path);
  const parsed = unitFor(unit, expected, path);
  const unitSI = DIMENSIONS[expected].si;
  const definitions = parsed.atoms.flatMap((a) => (a.definition ? [`1 ${a.symbol} = ${a.definition}`] : []));
  const given = withUnit(formatSignificant(value, INPUT_DIGITS), unit);
  const result = withUnit(formatSignificant(valueSI, digits), unitSI);
  const per = unit.trim() === '' ? '' : ` per ${unit}`;
  const step = parsed.factorToSI === 1 ? '' : ` × ${withUnit(formatSignificant(parsed.factorToSI, digits), unitSI)}${per}`;
  const sources = definitions.length > 0 ? ` (${definitions.join('; ')})` : '';
  return { value, unit, factorToSI: parsed.factorToSI, valueSI, unitSI, definitions, text: `${given}${step} = ${result}${sources}` };
}
