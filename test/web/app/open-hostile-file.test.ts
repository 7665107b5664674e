/**
 * Hostile corpus, opening a file in the page: bytes that are not UTF-8 are
 * refused with the offset of the first one, and the open budget is kept.
 */
import { expect } from '@open-wc/testing';
import { EXAMPLES } from '../../../web/examples';
import { freshApp } from './helpers';

describe('opening a hostile file', () => {
  it('refuses invalid UTF-8 naming the byte offset, and keeps the current budget', async () => {
    const app = await freshApp();
    app.store.edit('typed', (d) => (d.title = 'Typed before opening'));
    const good = new TextEncoder().encode(JSON.stringify(EXAMPLES[0].document));
    const bytes = new Uint8Array([...good.subarray(0, 40), 0xff, ...good.subarray(40)]);
    await (app as unknown as { open(f: File): Promise<void> }).open(new File([bytes], 'bad-bytes.json'));
    const banner = app.shadowRoot!.querySelector('.banner')!.textContent!;
    expect(banner).to.contain('Could not open bad-bytes.json: bad-bytes.json: is not valid UTF-8 text: byte offset 40 (0xff)');
    expect(app.store.document.title).to.equal('Typed before opening');
    app.remove();
  });
});
