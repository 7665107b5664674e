/**
 * Writes src/budget/horizontal-radius-coefficients.ts: the Chebyshev tables of
 * the horizontal radius for CEP (0.5) and R95 (0.95), computed by
 * chebyshevCoefficients (src/budget/horizontal-radius-table.ts), so that no run
 * pays for them. `npx tsx test/tools/write-radius-coefficients.ts`;
 * test/budget/horizontal-radius-table.test.ts fails when the file is stale.
 */
import { writeFileSync } from 'node:fs';
import { chebyshevCoefficients } from '../../src/budget/horizontal-radius-table';

const PROBABILITIES = [0.5, 0.95];
const path = 'src/budget/horizontal-radius-coefficients.ts';
const tables = PROBABILITIES.map((p) => {
  // Shortest text that reads back as the same double.
  const numbers = Array.from(chebyshevCoefficients(p), (c) => `    ${String(c)},`).join('\n');
  return `  '${p}': [\n${numbers}\n  ],`;
});
writeFileSync(
  path,
  `/**
 * Chebyshev coefficients of the normalised horizontal radius for CEP and R95
 * (see horizontal-radius-table.ts), computed ahead of time by
 * test/tools/write-radius-coefficients.ts. Do not edit by hand.
 */
export const PRECOMPUTED_COEFFICIENTS: Readonly<Record<string, readonly number[]>> = {
${tables.join('\n')}
};
`,
);
console.log(`${path}: written`);
