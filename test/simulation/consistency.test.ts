import { describe, expect, it } from 'vitest';
import { blockCount, reduceNodes } from '../../src/simulation/block-tree';
import { runBlocks } from '../../src/simulation/run-blocks';
import { findFlags } from '../../src/simulation/study-flags';
import { BAND_TAIL, studyStatistics } from '../../src/simulation/study-statistics';
import { jstatChiSquareInv } from './chi-square-reference';
import { fixtureModel } from './fixture-model';

function study(name: string, runs: number) {
  const model = fixtureModel(name);
  const sums = reduceNodes(runBlocks(model, { seed: 2026, runs, firstBlock: 0, endBlock: blockCount(runs) }), blockCount(runs));
  const stats = studyStatistics(model, sums);
  return { model, stats, flags: findFlags(stats, model.outages) };
}

describe('Monte Carlo check of the linearised budget', () => {
  it('a linear scenario (GNSS position only, straight): RMS within the chi-square band of σ and NEES within its bounds, 500 runs', () => {
    // Bar-Shalom, Li and Kirubarajan 2001, §5.4.2: N·(average NEES) ~ χ²(N·n); N·RMS²/σ² ~ χ²(N).
    const { stats, flags } = study('linear-gnss', 500);
    expect(flags).toEqual([]);
    const steps = stats.tS.length, N = stats.runs;
    // Two-sided bounds that hold at every step at once (Bonferroni over the steps).
    const lowF = Math.sqrt(jstatChiSquareInv(BAND_TAIL / 2 / steps, N) / N);
    const highF = Math.sqrt(jstatChiSquareInv(1 - BAND_TAIL / 2 / steps, N) / N);
    for (const q of stats.quantities) {
      for (let k = 0; k < steps; k++) {
        expect(q.rms[k], `${q.id} at ${stats.tS[k]} s`).toBeGreaterThanOrEqual(q.budgetSigma[k] * lowF);
        expect(q.rms[k], `${q.id} at ${stats.tS[k]} s`).toBeLessThanOrEqual(q.budgetSigma[k] * highF);
      }
      // The filter's own σ (linearised about its estimate) matches the budget's (about the nominal path).
      for (let k = 0; k < steps; k++) expect(Math.abs(q.filterSigma[k] / q.budgetSigma[k] - 1)).toBeLessThan(0.01);
    }
    for (const g of stats.nees) {
      let ratio = 0;
      for (let k = 0; k < steps; k++) {
        const dofTotal = g.dof[k] * N;
        expect(g.average[k], `${g.id} NEES at ${stats.tS[k]} s`).toBeGreaterThanOrEqual(jstatChiSquareInv(BAND_TAIL / 2 / steps, dofTotal) / N);
        expect(g.average[k], `${g.id} NEES at ${stats.tS[k]} s`).toBeLessThanOrEqual(jstatChiSquareInv(1 - BAND_TAIL / 2 / steps, dofTotal) / N);
        ratio += g.average[k] / g.dof[k] / steps;
      }
      // Steps are strongly correlated in time, so the time average scatters about as much as one step: ± 5 %.
      expect(Math.abs(ratio - 1), g.id).toBeLessThan(0.05);
    }
  }, 300_000);

  it('flags a landmark 2 m from the path with a 10° bearing σ', () => {
    const { flags } = study('close-landmark', 300);
    expect(flags.some((f) => f.subject === 'nees:position')).toBe(true);
    expect(flags.some((f) => f.subject === 'cross-track' || f.subject === 'along-track')).toBe(true);
    const rms = flags.find((f) => f.subject === 'cross-track' || f.subject === 'along-track')!;
    expect(rms.ratio).toBeGreaterThan(1.2);
    expect(rms.text).toMatch(/^linearisation breaks down at [\d.]+ s: RMS (cross|along)-track [\d.]+× the predicted σ/);
  }, 300_000);
});
