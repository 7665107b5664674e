/**
 * Reference χ² quantile from jstat (npm `jstat` 1.9.6, jStat.chisquare.inv),
 * for the simulation tests' own bounds. Not a test file itself.
 */
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);
const { jStat } = require('jstat') as { jStat: { chisquare: { inv(p: number, dof: number): number } } };

/** jStat.chisquare.inv(p, dof). */
export const jstatChiSquareInv = (p: number, dof: number): number => jStat.chisquare.inv(p, dof);
