import { formatTickValues } from '../../src/index';
import { formatSignificant } from '../../src';

/**
 * Log-axis tick label: over several decades (`crowded`) only at 1, 2 and 5
 * times a power of ten; otherwise at every one-digit value (0.5, 0.6, ...),
 * so the axis's own end values (0.49) do not print over their neighbours.
 */
function logTick(v: number, crowded: boolean): string {
  const mantissa = v / 10 ** Math.floor(Math.log10(v) + 1e-9);
  const shown = crowded ? [1, 2, 5].some((m) => Math.abs(mantissa - m) < 1e-6) : Math.abs(mantissa - Math.round(mantissa)) < 1e-6;
  return shown ? formatSignificant(v, 3) : '';
}

/**
 * Labels of one y axis: a linear axis in one number format for all ticks
 * (never "0.001" beside "1e-4"); a log axis at 1-2-5 (or every digit) as
 * logTick says, or at every tick when that would leave fewer than two
 * labels (a narrow range inside one decade).
 */
export function yTickLabels(values: number[], logarithmic: boolean): string[] {
  if (!logarithmic) return formatTickValues(values, values.length > 1 ? Math.abs(values[1] - values[0]) : 0);
  const labels = values.map((v) => logTick(v, values.length > 8));
  const shown = labels.filter((l) => l !== '');
  if (shown.length < 2) return values.map((v) => formatSignificant(v, 2));
  const mixed = shown.some((l) => l.includes('e')) && shown.some((l) => !l.includes('e'));
  return mixed ? labels.map((l, i) => (l === '' ? '' : values[i].toExponential(0).replace('e+', 'e'))) : labels;
}

