import { describe, expect, it } from 'vitest';
import { NEUTRAL_COLOUR, SERIES_COLOURS } from '../web/styles/palette';

// Simulated colour-vision deficiency: Machado, Oliveira & Fernandes, "A
// Physiologically-based Model for Simulation of Color Vision Deficiency",
// IEEE TVCG 15(6), 2009, the severity-1.0 matrices (values from memory),
// applied to linear sRGB as the common implementations do.
const SIMULATIONS: Record<string, number[][]> = {
  protanopia: [[0.152286, 1.052583, -0.204868], [0.114503, 0.786281, 0.099216], [-0.003882, -0.048116, 1.051998]],
  deuteranopia: [[0.367322, 0.860646, -0.227968], [0.280085, 0.672501, 0.047413], [-0.01182, 0.04294, 0.968881]],
  tritanopia: [[1.255528, -0.076749, -0.178779], [-0.078411, 0.930809, 0.147602], [0.004733, 0.691367, 0.3039]],
};

/**
 * Smallest CIE76 ΔE we accept between two series colours after simulation.
 * A judgement, common practice, no source: about 2.3 is often quoted as a
 * just-noticeable difference between large patches side by side (from
 * memory); thin lines and small legend boxes need several times more.
 */
const MIN_DELTA_E = 15;

type Vec3 = [number, number, number];

/** sRGB decoding, IEC 61966-2-1 (the piecewise transfer function). */
function linearRgb(hex: string): Vec3 {
  const channel = (i: number) => {
    const c = parseInt(hex.slice(1 + 2 * i, 3 + 2 * i), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  };
  return [channel(0), channel(1), channel(2)];
}

const apply = (m: number[][], v: Vec3): Vec3 =>
  [0, 1, 2].map((r) => m[r][0] * v[0] + m[r][1] * v[1] + m[r][2] * v[2]) as Vec3;

/** Linear sRGB -> XYZ (D65), IEC 61966-2-1 matrix. */
const SRGB_TO_XYZ = [[0.4124, 0.3576, 0.1805], [0.2126, 0.7152, 0.0722], [0.0193, 0.1192, 0.9505]];
/** D65 white of that matrix (its row sums), so that sRGB white is L* = 100, a* = b* = 0. */
const WHITE: Vec3 = [0.9505, 1, 1.089];

/** XYZ -> CIELAB, CIE 15 (the cube root with the linear segment below (6/29)³). */
function lab(linear: Vec3): Vec3 {
  const clamped = linear.map((c) => Math.min(1, Math.max(0, c))) as Vec3;
  const xyz = apply(SRGB_TO_XYZ, clamped);
  const f = (t: number) => (t > (6 / 29) ** 3 ? Math.cbrt(t) : t / (3 * (6 / 29) ** 2) + 4 / 29);
  const [fx, fy, fz] = xyz.map((v, i) => f(v / WHITE[i]));
  return [116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)];
}

const deltaE76 = (a: Vec3, b: Vec3) => Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);

describe('the chart palette under simulated colour-vision deficiency', () => {
  it('converts sRGB red to the CIELAB value usually quoted for it', () => {
    // sRGB #FF0000 is L* 53.24, a* 80.09, b* 67.20 (D65), from memory.
    const red = lab(linearRgb('#FF0000'));
    expect(red[0]).toBeCloseTo(53.24, 1);
    expect(red[1]).toBeCloseTo(80.09, 0);
    expect(red[2]).toBeCloseTo(67.2, 0);
  });

  it('uses simulation matrices that leave white about white', () => {
    for (const m of Object.values(SIMULATIONS)) {
      for (const row of m) expect(row[0] + row[1] + row[2]).toBeCloseTo(1, 5);
      expect(deltaE76(lab(apply(m, [1, 1, 1])), [100, 0, 0])).toBeLessThan(0.01);
    }
  });

  const colours = [...SERIES_COLOURS, NEUTRAL_COLOUR];
  for (const [name, m] of Object.entries({ 'normal vision': [[1, 0, 0], [0, 1, 0], [0, 0, 1]], ...SIMULATIONS })) {
    it(`keeps every pair of series colours, and each against the neutral grey, at least ΔE ${MIN_DELTA_E} apart under ${name}`, () => {
      const seen = colours.map((c) => lab(apply(m, linearRgb(c))));
      const tooClose: string[] = [];
      for (let i = 0; i < colours.length; i++) {
        for (let j = i + 1; j < colours.length; j++) {
          const d = deltaE76(seen[i], seen[j]);
          if (d < MIN_DELTA_E) tooClose.push(`${colours[i]} and ${colours[j]}: ΔE ${d.toFixed(1)}`);
        }
      }
      expect(tooClose).toEqual([]);
    });
  }
});
