import { describe, expect, it } from 'vitest';
import { calibrationReport } from '../../src/calibration/calibration-report';
import { fitOffsetAndScaleFactor } from '../../src/calibration/linear-calibration';
import { checkResidualWhiteness } from '../../src/calibration/residual-whiteness';
import { calibrationCandidates } from '../../src/edits/calibration-rows';
import { SeededRandom } from '../allan/seeded-random';

const source = { fileName: 'wheel-run.csv', date: '2026-12-02', samples: 600 };

/** An invented wheel-speed calibration against a reference: scale factor 1.5 %, offset `offsetMps`, noise 0.02 m/s. */
function report(offsetMps: number) {
  const rng = new SeededRandom(21);
  const truth = new Float64Array(600).map((_, i) => 0.5 + (i % 60) * 0.05);
  const measured = truth.map((v) => 1.015 * v + offsetMps + 0.02 * rng.normal());
  const fit = fitOffsetAndScaleFactor(measured, truth);
  return calibrationReport(fit, checkResidualWhiteness(fit.residuals), 'm/s');
}

describe('calibrating a wheel-speed sensor', () => {
  it('writes the scale factor, keeps the fitted offset in its provenance and says why no offset row is written', () => {
    const r = report(0.04);
    const [offset, scale] = calibrationCandidates(r, 'wheel-speed', source);
    expect(offset.plan).toBeUndefined();
    expect(offset.refusal).toMatch(/counts wheel turns and reads zero at rest/);
    expect(offset.refusal).toMatch(new RegExp(`fitted offset ${r.offset.value.toPrecision(3).replace('.', '\\.')}\\d* ±`));
    // 0.04 m/s against a standard deviation near 0.02/√600 · (a few): clearly not zero, so the message points at the reference.
    expect(offset.refusal).toMatch(/more than twice its uncertainty: check the truth column/);
    expect(scale.plan!.fields.provenance).toMatch(/offset 0\.0\d+ ± [\d.e-]+ m\/s/);
  });

  it('calls an offset within its uncertainty consistent with zero', () => {
    const [offset] = calibrationCandidates(report(0), 'wheel-speed', source);
    expect(offset.refusal).toMatch(/consistent with zero/);
  });
});
