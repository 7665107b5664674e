import { describe, expect, it } from 'vitest';
import { formatTickValues, linearTicks } from '../../../src/report/tick-labels';
import { decimateMinMax, valueAt } from '../../../src/report/review/chart-points';
import { placeBandLabels, renderLineChartSvg, type LineChart } from '../../../src/report/review/svg-line-chart';
import { seriesStyle } from '../../../src/report/review/series-styles';

describe('axis tick labels', () => {
  it('never mix plain decimals and exponent notation on one axis', () => {
    for (const [lo, hi] of [[0, 0.0012], [0, 4e-4], [0, 2.5], [0, 1.2e6], [0, 0.05]]) {
      const { labels } = linearTicks(lo, hi, 6);
      const exp = labels.map((l) => /e/.test(l));
      expect(new Set(exp.slice(1)).size, `${lo}..${hi}: ${labels}`).toBe(1);
    }
  });

  it('give every plain label the decimals of the step (1-2-5 steps, as d3-array ticks)', () => {
    expect(formatTickValues([0, 0.005, 0.01, 0.015], 0.005)).toEqual(['0.000', '0.005', '0.010', '0.015']);
    expect(linearTicks(0, 10, 5).labels).toEqual(['0', '2', '4', '6', '8', '10']);
    expect(formatTickValues([0, 2e-4, 4e-4], 2e-4)).toEqual(['0', '2e-4', '4e-4']);
  });
});

describe('chart points', () => {
  it('keep each pixel column\'s smallest and largest value, so peaks survive thinning', () => {
    const x = Array.from({ length: 10_000 }, (_, k) => k);
    const y = x.map((k) => (k === 4321 ? 50 : Math.sin(k)));
    const pts = decimateMinMax(x, y, (v) => v / 100, (v) => v);
    expect(pts.length).toBeLessThanOrEqual(4 * 101);
    expect(Math.max(...pts.map((p) => p[1]))).toBe(50);
  });

  it('interpolate linearly and give NaN outside the data', () => {
    expect(valueAt([0, 10], [0, 5], 4)).toBeCloseTo(2, 12);
    expect(valueAt([0, 10], [0, 5], 11)).toBeNaN();
  });
});

describe('the SVG line chart', () => {
  const chart: LineChart = {
    title: 'T <&>', xLabel: 'time (s)', yLabel: 'σ (m)',
    series: [0, 1, 2].map((i) => ({ label: `s${i}`, x: [0, 50, 100], y: [1 + i, 2 + i, 0.5] })),
    limits: [{ label: 'limit 3 m', value: 3 }],
    bands: [{ label: 'gnss a', from: 10, to: 12 }, { label: 'gnss b', from: 13, to: 15 }, { label: 'gnss far', from: 80, to: 90 }],
  };

  it('puts labels of bands that would overlap in different rows', () => {
    const { rows } = placeBandLabels(chart.bands, 0, 100);
    expect(rows[0]).not.toBe(rows[1]);
    expect(rows[2]).toBe(0);
  });

  it('tells series apart by dash pattern and marker, not by colour alone', () => {
    const styles = [0, 1, 2, 3, 4, 5].map(seriesStyle);
    expect(new Set(styles.map((s) => s.dash)).size).toBe(6);
    expect(new Set(styles.map((s) => s.marker)).size).toBe(6);
    const svg = renderLineChartSvg(chart, 'c1');
    for (const s of styles.slice(0, 3)) expect(svg).toContain(`stroke-dasharray="${s.dash}"`);
  });

  it('escapes text and references only its own ids', () => {
    const svg = renderLineChartSvg(chart, 'c1');
    expect(svg).toContain('T &lt;&amp;&gt;');
    expect([...svg.matchAll(/url\(#([^)]+)\)/g)].map((m) => m[1]).every((id) => id.startsWith('c1-'))).toBe(true);
  });
});
