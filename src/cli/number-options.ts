import { InputError } from '../errors';
import { textOption, type ParsedValues } from './cli-command';

/**
 * A positive number option, or `fallback` when absent.
 * @throws InputError naming the option when it is not a positive finite number.
 */
export function positiveOption(values: ParsedValues, key: string, fallback: number): number {
  const text = textOption(values, key);
  if (text === undefined) return fallback;
  const v = Number(text);
  if (!(v > 0) || !Number.isFinite(v)) throw new InputError(`--${key}`, `must be a positive number, got "${text}"`);
  return v;
}

/**
 * An integer option from `min` to `max`, or undefined when absent.
 * @throws InputError naming the option otherwise.
 */
export function integerOption(values: ParsedValues, key: string, min: number, max: number): number | undefined {
  const text = textOption(values, key);
  if (text === undefined) return undefined;
  const v = Number(text);
  if (!Number.isInteger(v) || v < min || v > max) throw new InputError(`--${key}`, `must be a whole number from ${min} to ${max}, got "${text}"`);
  return v;
}
