import { expect } from '@open-wc/testing';
import { analyseLogColumn } from '../../../src/allan/log-allan';
import type { BudgetDocument } from '../../../src/document';
import { EXAMPLES } from '../../../web/examples';
import { allanCandidates } from '../../../src/edits/allan-rows';
import { writeRows } from '../../../src/edits/row-writer';
import type { AllanOutcome } from '../../../web/logs/log-protocol';
import { normal } from './helpers';

const SOURCE = { fileName: 'log.csv', date: '2024-05-06', samples: 40000 };

/** An outcome of the worker's shape, from `samples` analysed as the worker would. */
function outcomeOf(samples: Float64Array, unit: string, rateHz: number): AllanOutcome {
  const result = analyseLogColumn({ samples, unit, rateHz, analysis: { sourceName: 'log.csv' } });
  return { fileName: 'log.csv', samples: samples.length, rateHz, unit, parseMs: 0, computeMs: 0, result };
}

/** A gyro log (deg/s) of a first-order Gauss-Markov bias (σ, T) plus white noise, sampled exactly as an AR(1) process. */
function gaussMarkovLog(sigma: number, correlationS: number, white: number, rateHz: number, n: number): Float64Array {
  const next = normal(21);
  const phi = Math.exp(-1 / (rateHz * correlationS));
  const out = new Float64Array(n);
  let b = sigma * next();
  for (let i = 0; i < n; i++) {
    b = phi * b + sigma * Math.sqrt(1 - phi * phi) * next();
    out[i] = b + white * next();
  }
  return out;
}

const orchard = (): BudgetDocument => structuredClone(EXAMPLES[0].document);

describe('rows made from an Allan analysis', () => {
  it('bias instability is written as the floor with T = τ_floor / 1.8926 and the floor reading as provenance', () => {
    const o = outcomeOf(gaussMarkovLog(0.02, 10, 0.02, 10, 40000), 'deg/s', 10);
    const b = o.result.analysis.biasInstability!;
    const plan = allanCandidates(o, 'slope', 'yaw-gyro', SOURCE).find((c) => c.id === 'bias-instability')!.plan!;
    expect(plan.fields).to.deep.include({ unit: 'deg/h', biasForm: 'floor', assumed: false });
    expect(plan.fields.value as number).to.be.closeTo(b.floor, 1e-3 * b.floor);
    // docs/planar-model.md §3: the Gauss-Markov Allan peak sits at τ = 1.8926 T.
    expect(plan.fields.correlationTime!.value as number).to.be.closeTo(b.tauFloorS / 1.8926, 1e-3 * b.tauFloorS);
    expect(plan.fields.provenance).to.match(/^fitted from log\.csv, 2024-05-06, 40000 samples; Allan deviation floor .* T_bi = τ_floor/);
    // The peak of a Gauss-Markov Allan deviation is 0.6173643 σ (docs/planar-model.md §3): 0.02 deg/s gives 44.45 deg/h, here from a finite log.
    expect(b.floor / (0.6173643 * 0.02 * 3600) - 1).to.be.within(-0.3, 0.3);
    const doc = orchard();
    const [written] = writeRows(doc, 0, [plan]);
    expect(written).to.include({ fullId: 'gyro.bi', action: 'overwritten' });
    expect(doc.sensors[0].sources.find((r) => r.id === 'bi')).to.deep.include({ kind: 'bias-instability', biasForm: 'floor' });
  });

  it('an angle quantisation Q is written as the quantum s = Q·√12 with quantum "angle", beside a rate LSB row', () => {
    // A clearly seen −1 slope needs a busy angle-increment sensor; the fitted Q is set by hand so the check is exact.
    const o = outcomeOf(gaussMarkovLog(0.001, 5, 0.05, 100, 20000), 'deg/s', 100);
    const terms = o.result.analysis.terms.map((t) => (t.id === 'quantisation' && t.method === 'fit' ? { ...t, value: 2, valueSI: 2 / 206264.8, atZero: false } : t));
    const fake: AllanOutcome = { ...o, result: { ...o.result, analysis: { ...o.result.analysis, terms } } };
    const plan = allanCandidates(fake, 'fit', 'yaw-gyro', SOURCE).find((c) => c.id === 'quantisation')!.plan!;
    expect(plan.fields).to.deep.include({ unit: 'arcsec', quantum: 'angle' });
    expect(plan.fields.value).to.equal(Number((2 * Math.sqrt(12)).toPrecision(4)));
    const doc = orchard();
    const [written] = writeRows(doc, 0, [plan]);
    // The orchard gyro's "lsb" row is a rate LSB: another source, so the angle quantum gets a row of its own.
    expect(written).to.include({ fullId: 'gyro.quant', action: 'added' });
    expect(doc.sensors[0].sources.find((r) => r.id === 'lsb')!.unit).to.equal('deg/s');
  });

  it('a speed log\'s white noise goes into a wheel-speed sensor as a noise density in m/s/√Hz', () => {
    const next = normal(9);
    const samples = Float64Array.from({ length: 20000 }, () => 0.02 * next());
    const o = outcomeOf(samples, 'm/s', 50);
    const candidates = allanCandidates(o, 'slope', 'wheel-speed', SOURCE);
    const white = candidates.find((c) => c.id === 'random-walk')!.plan!;
    expect(white.fields.unit).to.equal('m/s/√Hz');
    // N = σ/√f = 0.02/√50 m/s/√Hz (IEEE Std 952 two-sided convention), within a few percentage errors (δ = 2.2 % at τ = 1 s).
    expect(white.fields.value as number).to.be.closeTo(0.02 / Math.sqrt(50), (0.02 / Math.sqrt(50)) * 0.1);
    expect(candidates.find((c) => c.id === 'rate-random-walk')!.refusal).to.match(/wheel-speed sensor has no rate-random-walk row/);
  });

  it('an overwrite that changes a row\'s unit keeps formulas that use the row in the unit they were written for', () => {
    const doc = orchard();
    doc.values!.gyroNoise = { value: '=gyro.arw*2', unit: 'deg/s/√Hz' };
    const [w] = writeRows(doc, 0, [{ kind: 'white-noise', idStem: 'arw', label: 'angle random walk', fields: { value: 0.3, unit: 'deg/√h', provenance: 'p', assumed: false } }]);
    expect(w).to.include({ fullId: 'gyro.arw', action: 'overwritten', previous: '0.004 deg/s/√Hz' });
    expect(doc.values!.gyroNoise.value).to.equal('=CONVERTUNIT(gyro.arw, "deg/√h", "deg/s/√Hz")*2');
  });
});
