import type { NoiseTrace, TracedEntry } from '../../src';
import { formatSignificant, withUnit } from '../../src';
import { markdownText, neutraliseCell } from '../../src';

/** A ledger value: four significant digits (the unit goes beside it). */
export const ledgerNumber = (x: number) => formatSignificant(x, 4);

/** The three blocks of the ledger: key in NoiseTrace, symbol, what an entry is. */
export const LEDGER_BLOCKS: [key: keyof NoiseTrace, symbol: string, meaning: string][] = [
  ['r', 'R', 'measurement noise variance per scalar measurement'],
  ['q', 'Q', 'continuous noise PSD per noise input (discretised per step by Van Loan)'],
  ['p0', 'P0', 'initial variance per state'],
];

/**
 * The square root of a variance or PSD unit, for the "√" column: m² -> m,
 * (rad/s)² -> rad/s, rad²/s -> rad/√s, 1 -> 1; undefined for a unit of
 * another form.
 */
export function rootUnit(unitSI: string): string | undefined {
  const m = /^(?:\((.+)\)²|([A-Za-zµ]+)²|(1))(\/s)?$/.exec(unitSI);
  if (!m) return undefined;
  const base = m[1] ?? m[2] ?? m[3];
  return m[4] ? `${base}/√s` : base;
}

/** A value with its unit, and its square root with the root unit (empty when the unit has no plain root). */
export function valueAndRoot(valueSI: number, unitSI: string): [string, string] {
  const root = rootUnit(unitSI);
  return [withUnit(ledgerNumber(valueSI), unitSI), root && valueSI >= 0 ? withUnit(ledgerNumber(Math.sqrt(valueSI)), root) : ''];
}

/** A table cell: safe to paste into a spreadsheet and rendered as the same text. */
const cell = (text: string) => markdownText(neutraliseCell(text));
const row = (cells: string[]) => `| ${cells.map(cell).join(' | ')} |`;

function entryRows(e: TracedEntry): string[] {
  return [
    row([e.name, '**total**', ...valueAndRoot(e.totalSI, e.unitSI), '', '']),
    ...e.pieces.map((p) => row(['', p.sourceId, ...valueAndRoot(p.valueSI, e.unitSI), p.derivation, p.conversions.join('; ')])),
  ];
}

/**
 * The R, Q and P0 the analysis used as Markdown, ready for a design review:
 * a heading, one table per block with each entry's total and every
 * source's piece, derivation and unit conversions, and the caution.
 */
export function noiseLedgerMarkdown(noise: NoiseTrace, title: string, caution: string): string {
  const lines = [`## R, Q and P0 used: ${markdownText(title)}`, ''];
  for (const [key, symbol, meaning] of LEDGER_BLOCKS) {
    lines.push(`### ${symbol}: ${meaning}`, '');
    if (noise[key].length === 0) {
      lines.push('(none)', '');
      continue;
    }
    lines.push(row(['Entry', 'Source', 'Value', '√ value', 'Derivation', 'Unit conversions']), '| --- | --- | --- | --- | --- | --- |');
    lines.push(...noise[key].flatMap(entryRows), '');
  }
  lines.push(`> Caution: ${markdownText(caution)}`, '');
  return lines.join('\n');
}
