import { expect } from '@open-wc/testing';
import { DECIMATE_ABOVE, keptIndices, pick } from '../../../web/charts/decimate-series';
import { ChartController } from '../../../web/charts/chart-controller';

describe('thinning long series for drawing', () => {
  it('keeps every sample of a series below the threshold', () => {
    const values = Array.from({ length: 5000 }, (_, i) => Math.sin(i));
    expect(keptIndices(values.length, [values], 800)).to.have.length(5000);
  });

  // Common practice, no source: min-max decimation must keep every bucket's extremes, the ends and the gaps.
  it('keeps the ends, every peak and trough, and the edges of gaps, shared by all series', () => {
    const n = 100_000;
    const a = Array.from({ length: n }, (_, i) => Math.sin(i / 50) + (i === 31_337 ? 10 : 0));
    const b: (number | null)[] = Array.from({ length: n }, (_, i) => (i >= 40_000 && i < 41_000 ? null : i % 7));
    const kept = keptIndices(n, [a, b], 1000);
    expect(kept.length).to.be.below(n / 10);
    expect(kept[0]).to.equal(0);
    expect(kept[kept.length - 1]).to.equal(n - 1);
    expect(kept).to.include(31_337);
    expect(kept).to.include.members([39_999, 40_000, 40_999, 41_000]);
    expect(Math.max(...pick(a, kept))).to.equal(Math.max(...a));
    expect(Math.min(...pick(a, kept))).to.equal(Math.min(...a));
    expect([...kept].sort((x, y) => x - y)).to.deep.equal(kept);
    expect(n).to.be.above(DECIMATE_ABOVE);
  });

  it('draws a long series thinned, with the exact values at the kept steps', () => {
    const canvas = document.createElement('canvas');
    canvas.style.width = '600px';
    canvas.style.height = '200px';
    document.body.append(canvas);
    const host = { addController: () => undefined, requestUpdate: () => undefined, removeController: () => undefined, updateComplete: Promise.resolve(true) };
    const controller = new ChartController(host);
    const labels = Array.from({ length: 50_000 }, (_, i) => i * 0.1);
    const data = labels.map((t) => Math.sqrt(t));
    controller.draw(canvas, { labels, datasets: [{ label: 'σ', data }], options: { animation: false, scales: { x: { type: 'linear' }, y: { type: 'linear' } } } });
    const drawn = controller.chart!.data;
    expect(drawn.labels!.length).to.be.below(10_000);
    (drawn.labels as number[]).forEach((t, i) => expect(drawn.datasets[0].data[i]).to.equal(Math.sqrt(t)));
    controller.hostDisconnected();
    canvas.remove();
  });
});
