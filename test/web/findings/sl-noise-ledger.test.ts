import { expect, fixture, html, oneEvent } from '@open-wc/testing';
import '../../../web/components/sl-noise-ledger';
import type { LedgerCopiedDetail, SlNoiseLedger } from '../../../web/components/sl-noise-ledger';
import { noiseLedgerMarkdown, rootUnit } from '../../../web/charts/noise-markdown';
import { exampleView, HARBOUR } from './views';

/** Replaces navigator.clipboard.writeText for one test; returns what it was given and a restore function. */
function stubClipboard(write: (text: string) => Promise<void>): () => void {
  const clipboard = navigator.clipboard as Clipboard & { writeText: Clipboard['writeText'] };
  clipboard.writeText = write;
  return () => delete (clipboard as Partial<Clipboard>).writeText;
}

async function ledgerOf(i: number): Promise<SlNoiseLedger> {
  const view = exampleView(i);
  return fixture<SlNoiseLedger>(html`<sl-noise-ledger .noise=${view.result!.noise} budget-title=${view.title} caution=${view.caution}></sl-noise-ledger>`);
}

describe('the R · Q · P0 ledger', () => {
  it('puts a Markdown table with every R entry on the clipboard', async () => {
    const el = await ledgerOf(HARBOUR);
    let copied = '';
    const restore = stubClipboard(async (text) => void (copied = text));
    try {
      const done = oneEvent(el, 'sl-ledger-copied');
      el.shadowRoot!.querySelector('button')!.click();
      const detail = ((await done) as CustomEvent<LedgerCopiedDetail>).detail;
      expect(detail.onClipboard).to.equal(true);
    } finally {
      restore();
    }
    const noise = exampleView(HARBOUR).result!.noise;
    expect(noise.r.map((e) => e.name)).to.deep.equal(['gnss.north', 'gnss.east', 'compass.heading']);
    for (const e of noise.r) expect(copied).to.contain(`| ${e.name} | **total** |`);
    for (const e of [...noise.q, ...noise.p0]) expect(copied).to.contain(`| ${e.name.replace(/\|/g, '\\|')} |`);
    expect(copied).to.contain('| Entry | Source | Value | √ value | Derivation | Unit conversions |');
    expect(copied).to.contain(`> Caution: ${exampleView(HARBOUR).caution}`);
    expect(el.shadowRoot!.querySelector('[role="status"]')!.textContent).to.match(/^Copied \d+ lines of Markdown\.$/);
  });

  it('offers the Markdown selected for copying by hand when the browser refuses the clipboard', async () => {
    const el = await ledgerOf(HARBOUR);
    const restore = stubClipboard(() => Promise.reject(new DOMException('denied', 'NotAllowedError')));
    try {
      const done = oneEvent(el, 'sl-ledger-copied');
      el.shadowRoot!.querySelector('button')!.click();
      expect(((await done) as CustomEvent<LedgerCopiedDetail>).detail.onClipboard).to.equal(false);
    } finally {
      restore();
    }
    const area = el.shadowRoot!.querySelector('textarea')!;
    expect(area.value).to.equal(noiseLedgerMarkdown(exampleView(HARBOUR).result!.noise, exampleView(HARBOUR).title, exampleView(HARBOUR).caution));
    expect(area.selectionEnd - area.selectionStart).to.equal(area.value.length);
    expect(el.shadowRoot!.querySelector('[role="status"]')!.textContent).to.contain('press Ctrl+C');
  });

  it('shows each entry with its total and every source\'s piece and derivation', async () => {
    const el = await ledgerOf(HARBOUR);
    const north = el.shadowRoot!.querySelector('tbody[data-entry="gnss.north"]')!;
    // 1.2 m per axis in the budget: R = 1.44 m², √R = 1.2 m.
    const cells = [...north.querySelector('tr.total')!.children].map((c) => c.textContent!.trim());
    expect(cells).to.deep.equal(['gnss.north (total)', '1.44 m²', '1.2 m']);
    expect(north.querySelector('tr.how')!.textContent).to.contain('R = σ² per axis');
  });

  it('takes the square root of variance and PSD units', () => {
    expect(['m²', 'rad²', '(rad/s)²', '1', 'rad²/s', '(rad/s)²/s', 'm/s'].map(rootUnit)).to.deep.equal(['m', 'rad', 'rad/s', '1', 'rad/√s', 'rad/s/√s', undefined]);
  });
});
