import { expect } from '@open-wc/testing';
import { parseBudgetDocument, serializeBudgetDocument } from '../../../src/document';
import { computeView } from '../../../src/report/view-result';
import { isoDate } from '../../../src/edits/provenance-text';
import { chooseFile, deepQuery, logImport, runAndWait, settle, whiteNoiseLog } from './helpers';

/** The rows of the orchard example's gyro, by id. */
const gyroRows = (doc: { sensors: { id: string; sources: { id: string }[] }[] }) => doc.sensors.find((s) => s.id === 'gyro')!.sources;

describe('writing Allan terms into the grid', () => {
  it('overwrites the gyro white-noise row, adds a rate-random-walk row with provenance, and one undo reverts both', async () => {
    const { el, store, original } = await logImport(0);
    await chooseFile(el, whiteNoiseLog('bench-gyro.csv', 0.05, 100, 200));
    await runAndWait(el);
    const write = deepQuery(el, 'sl-log-write');
    const rrw = write.shadowRoot!.querySelector<HTMLInputElement>('#term-rate-random-walk')!;
    expect(rrw.checked, 'an upper bound starts unticked').to.equal(false);
    rrw.checked = true;
    rrw.dispatchEvent(new Event('change'));
    await settle(el);
    write.shadowRoot!.querySelector<HTMLButtonElement>('#write')!.click();
    await settle(el);

    const head = `fitted from bench-gyro.csv, ${isoDate(new Date())}, 20000 samples`;
    const arwTerm = el.allan!.result.analysis.terms.find((t) => t.id === 'random-walk' && t.method === 'slope')!;
    const rows = gyroRows(store.document);
    const arw = rows.find((r) => r.id === 'arw')!;
    expect(arw).to.include({ kind: 'white-noise', unit: 'deg/√h', assumed: false });
    expect(arw.value as number).to.be.closeTo(arwTerm.value, 1e-3 * arwTerm.value);
    expect(arw.provenance.startsWith(head)).to.equal(true);
    expect(arw.provenance).to.match(/slope read-off at τ = 1 s/);
    const added = rows.find((r) => r.kind === 'rate-random-walk')!;
    expect(added).to.include({ id: 'rrw', unit: 'deg/h/√h', assumed: false });
    expect(added.provenance).to.match(/upper bound/);
    expect(rows).to.have.length(gyroRows(original).length + 1);

    // The written document is a valid budget and computes without cell errors.
    expect(() => parseBudgetDocument(serializeBudgetDocument(store.document), 'written.json')).not.to.throw();
    const view = computeView(store.document);
    expect(view.blocked).to.equal(undefined);
    expect(view.cellErrors).to.deep.equal([]);
    expect(deepQuery(write, 'sl-log-written').shadowRoot!.textContent).to.match(/gyro\.arw\s+overwritten[\s\S]*gyro\.rrw\s+added/);

    store.undo();
    expect(store.document).to.deep.equal(original);
  });

  it('offers no terms to an accelerometer log, since no sensor of a budget takes them', async () => {
    const { el, store, original } = await logImport(0);
    await chooseFile(el, whiteNoiseLog('accel.csv', 0.01, 100, 20));
    const kind = deepQuery<HTMLSelectElement>(el, 'select#kind');
    kind.value = 'accelerometer';
    kind.dispatchEvent(new Event('change'));
    await settle(el);
    await runAndWait(el);
    expect(el.allan!.result.kind).to.equal('accelerometer');
    expect(deepQuery(el, 'sl-log-write').shadowRoot!.textContent).to.match(/reading only/);
    expect(store.document).to.deep.equal(original);
  });
});
