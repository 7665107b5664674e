import { describe, expect, it } from 'vitest';
import { computeBudget } from '../../src/pipeline';
import { checkCovariance } from '../../src/covariance/covariance-health';
import { scenarioR1, scenarioR2 } from '../fixtures/reference-scenarios';

// docs/planar-model.md §7 (Gelb, Applied Optimal Estimation, 1974, sec. 7.3): with the gains fixed from the full run,
// the recursion is linear in (P0, Q, R), so per-source covariances sum to the total.
describe.each([['R1', scenarioR1], ['R2', scenarioR2]])('per-source contributions of %s', (_name, scenario) => {
  const result = computeBudget(scenario());

  it('sum to the total within 1e-9 relative in every series at every step', () => {
    for (const [name, series] of Object.entries(result.series.quantities)) {
      let worst = 0;
      for (let k = 0; k < series!.total.length; k++) {
        const sum = series!.bySource.reduce((a, s) => a + s[k], 0);
        worst = Math.max(worst, Math.abs(sum - series!.total[k]) / series!.total[k]);
      }
      expect(worst, name).toBeLessThan(1e-9);
    }
  });

  it('leave every source covariance symmetric positive semi-definite at the end', () => {
    const n = result.model.states.length;
    const scratch = new Float64Array(n * n);
    result.history.finalSourceCovariances.forEach((p, s) => {
      expect(checkCovariance(p, 0, n, 0, scratch), result.model.sources[s].id).toBeUndefined();
    });
  });

  it('keep every source share of every variance non-negative at every step (to round-off)', () => {
    for (const [name, series] of Object.entries(result.series.quantities)) {
      series!.bySource.forEach((s, i) => {
        const worst = Math.min(...Array.from(s, (v, k) => v / series!.total[k]));
        expect(worst, `${name} ${result.model.sources[i].id}`).toBeGreaterThan(-1e-12);
      });
    }
  });

  it('sum the final source covariances to the final total covariance', () => {
    const total = result.history.finalCovariance;
    const sum = new Float64Array(total.length);
    for (const p of result.history.finalSourceCovariances) p.forEach((v, e) => (sum[e] += v));
    const n = result.model.states.length;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const scale = Math.sqrt(total[i * n + i] * total[j * n + j]);
        expect(Math.abs(sum[i * n + j] - total[i * n + j]) / scale).toBeLessThan(1e-9);
      }
    }
  });
});
