import { expect } from '@open-wc/testing';
import { DocumentStore } from '../../web/state/document-store';
import { EXAMPLES } from '../../web/examples';

describe('the document store', () => {
  it('brings the file name back when undoing the opening of another file, and forward again on redo', () => {
    const store = new DocumentStore(EXAMPLES[0].document, 'mine.json');
    store.replace(EXAMPLES[1].document, EXAMPLES[1].fileName);
    expect(store.fileName).to.equal(EXAMPLES[1].fileName);
    store.undo();
    expect([store.fileName, store.document.title]).to.deep.equal(['mine.json', EXAMPLES[0].document.title]);
    store.redo();
    expect(store.fileName).to.equal(EXAMPLES[1].fileName);
  });

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
