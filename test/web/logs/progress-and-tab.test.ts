import { expect, fixture, html } from '@open-wc/testing';
import { computeView } from '../../../src/report/view-result';
import '../../../web/components/sl-workbench';
import type { SlWorkbench } from '../../../web/components/sl-workbench';
import type { SlLogImport } from '../../../web/components/sl-log-import';
import { EXAMPLES } from '../../../web/examples';
import { DocumentStore } from '../../../web/state/document-store';
import { chooseFile, deepQuery, logImport, settle, waitFor, whiteNoiseLog } from './helpers';

describe('progress, cancel and the workbench tab', () => {
  it('a long log reports progress while it is read, and Cancel stops the worker without a result or a change', async () => {
    const { el, store, original } = await logImport();
    await chooseFile(el, whiteNoiseLog('long.csv', 0.05, 100, 10000));
    deepQuery<HTMLButtonElement>(el, 'button#run').click();
    await waitFor(() => el.jobs.progress !== undefined, 15000, 'the first progress message');
    await settle(el);
    const bar = deepQuery(el, 'sl-log-progress').shadowRoot!;
    expect(bar.textContent).to.match(/lines read, .* of .* MB \(\d+ %\)/);
    bar.querySelector<HTMLButtonElement>('#cancel')!.click();
    await settle(el);
    expect(el.jobs.status).to.equal('cancelled');
    expect(bar.textContent).to.match(/Cancelled; nothing in the budget changed/);
    await new Promise((r) => setTimeout(r, 500));
    expect(el.allan).to.equal(undefined);
    expect(store.document).to.deep.equal(original);
  });

  it('the workbench has a "Sensor logs" tab, reached by keyboard, showing the import on the open document', async () => {
    const store = new DocumentStore(structuredClone(EXAMPLES[0].document), EXAMPLES[0].fileName);
    const bench = await fixture<SlWorkbench>(html`<sl-workbench .store=${store} .view=${computeView(store.document)}></sl-workbench>`);
    await settle(bench);
    const tabs = bench.shadowRoot!.querySelector('[role="tablist"]')!;
    tabs.dispatchEvent(new KeyboardEvent('keydown', { key: 'End', bubbles: true }));
    await settle(bench);
    const tab = bench.shadowRoot!.querySelector('#tab-logs')!;
    expect(tab.textContent).to.equal('Sensor logs');
    expect(tab.getAttribute('aria-selected')).to.equal('true');
    const logs = bench.shadowRoot!.querySelector<SlLogImport>('sl-log-import')!;
    expect(logs.store).to.equal(store);
    expect(deepQuery(logs, 'label[for="file"]').textContent).to.match(/Open a log/);
  });
});
