import { expect } from '@open-wc/testing';
import { DocumentStore } from '../../web/state/document-store';
import { EXAMPLES } from '../../web/examples';

describe('the document store', () => {
  it('undoes and redoes every edit', () => {
    const store = new DocumentStore(EXAMPLES[0].document, 'x.json');
    const before = store.document.sensors[0].sources[0].value;
    store.setCell('sensors[0].sources[0].value', '=2*3');
    expect(store.document.sensors[0].sources[0].value).to.equal('=2*3');
    store.undo();
    expect(store.document.sensors[0].sources[0].value).to.equal(before);
    store.redo();
    expect(store.document.sensors[0].sources[0].value).to.equal('=2*3');
  });

  it('fires change after each edit', () => {
    const store = new DocumentStore(EXAMPLES[0].document, 'x.json');
    let labels: string[] = [];
    store.addEventListener('change', (e) => labels.push((e as CustomEvent).detail.label));
    store.edit('rename', (d) => (d.title = 'renamed'));
    store.undo();
    expect(labels).to.deep.equal(['rename', 'undo rename']);
    labels = [];
  });
});
