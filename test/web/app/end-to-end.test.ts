import { expect, waitUntil } from '@open-wc/testing';
import type { SlSigmaChart } from '../../../web/components/sl-sigma-chart';
import type { SlCell } from '../../../web/components/sl-cell';
import { freshApp, recomputed } from './helpers';

/** The first element matching `selector` anywhere under `root`, through shadow roots. */
function deep<T extends Element>(root: Element | ShadowRoot, selector: string): T | undefined {
  const hit = root.querySelector<T>(selector);
  if (hit) return hit;
  for (const e of root.querySelectorAll('*')) {
    const inner = e.shadowRoot && deep<T>(e.shadowRoot, selector);
    if (inner) return inner;
  }
  return undefined;
}

describe('editing the demo budget on the page', () => {
  it('typing a new value in a grid cell recomputes and changes the plotted heading sigma', async () => {
    const app = await freshApp();
    const chart = deep<SlSigmaChart>(app.shadowRoot!, 'sl-sigma-chart[kind="heading"]')!;
    await waitUntil(() => chart.charts.chart !== undefined, 'heading chart drawn');
    const before = [...(chart.charts.chart!.data.datasets[0].data as number[])];
    const cell = deep<SlCell>(app.shadowRoot!, 'sl-cell[label="gyro.bi magnitude"]')!;
    const input = cell.shadowRoot!.querySelector('input')!;
    input.focus();
    cell.startEditing();
    await cell.updateComplete;
    const editor = cell.shadowRoot!.querySelector('input')!;
    editor.value = '40';
    editor.dispatchEvent(new Event('input', { bubbles: true, composed: true }));
    editor.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true, composed: true }));
    await waitUntil(() => app.store.document.sensors[0].sources[1].value === 40, 'the cell committed');
    await recomputed(app);
    await waitUntil(() => (chart.charts.chart!.data.datasets[0].data as number[]).at(-1) !== before.at(-1), 'chart redrawn');
    const after = chart.charts.chart!.data.datasets[0].data as number[];
    expect(after.at(-1)!).to.be.greaterThan(before.at(-1)!);
    expect(after.length).to.equal(before.length);
  });

  it('a formula error shows in the cell while the rest of the budget still computes', async () => {
    const app = await freshApp();
    app.store.setCell('sensors[0].sources[1].value', '=noSuchValue*2');
    await recomputed(app);
    const cell = deep<SlCell>(app.shadowRoot!, 'sl-cell[label="gyro.bi magnitude"]')!;
    await waitUntil(() => (cell.shadowRoot!.textContent ?? '').includes('noSuchValue') || cell.error !== undefined, 'error in place');
    expect(cell.error).to.be.a('string');
    expect(app.compute.view!.result).to.not.equal(undefined);
    expect(app.compute.view!.omitted.length).to.be.greaterThan(0);
  });
});
