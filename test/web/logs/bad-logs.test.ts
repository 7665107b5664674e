import { expect } from '@open-wc/testing';
import { chooseFile, deepQuery, logImport, normal, runAndWait, settle } from './helpers';

/** A short "time,gyro_z" log (line 1 the header) with line `line` replaced by `text`. */
function logWithLine(name: string, line: number, text: string): File {
  const next = normal(3);
  const lines = ['time,gyro_z'];
  for (let i = 0; i < 200; i++) lines.push(`${(i / 100).toFixed(2)},${(0.05 * next()).toFixed(6)}`);
  lines[line - 1] = text;
  return new File([lines.join('\n') + '\n'], name, { type: 'text/csv' });
}

/** The message the progress element shows for a failed job. */
const failure = (el: Element) => deepQuery(el, 'sl-log-progress').shadowRoot!.querySelector('[role="alert"]')?.textContent ?? '';

describe('a bad sensor log', () => {
  it('a non-numeric cell on line 7 is named by line and column, and the document stays as it was', async () => {
    const { el, store, original } = await logImport();
    await chooseFile(el, logWithLine('bad-cell.csv', 7, '0.05,abc'));
    await runAndWait(el);
    expect(el.jobs.status).to.equal('error');
    expect(failure(el)).to.match(/bad-cell\.csv line 7, column "gyro_z": "abc" is not a number/);
    expect(failure(el)).to.match(/Nothing in the budget changed/);
    expect(el.allan).to.equal(undefined);
    expect(el.shadowRoot!.querySelector('sl-log-write')).to.equal(null);
    expect(store.document).to.deep.equal(original);
    expect(store.canUndo).to.equal(false);
  });

  it('a row missing the value column is named by line and column', async () => {
    const { el, store, original } = await logImport();
    await chooseFile(el, logWithLine('short-row.csv', 5, '0.03'));
    await runAndWait(el);
    expect(failure(el)).to.match(/short-row\.csv line 5: the row has 1 field but column "gyro_z" is field 2/);
    expect(store.document).to.deep.equal(original);
  });

  it('a log whose header has only a time column says the value column is missing before reading on', async () => {
    const { el, store, original } = await logImport();
    await chooseFile(el, new File(['time\n0\n0.01\n0.02\n0.03\n'], 'time-only.csv'));
    deepQuery<HTMLButtonElement>(el, 'button#run').click();
    await settle(el);
    const form = deepQuery(el, 'sl-log-allan-form');
    expect(form.shadowRoot!.querySelector('[role="alert"]')!.textContent).to.match(/only the column "time", so there is no value column/);
    expect(el.jobs.status).to.equal('complete');
    expect(store.document).to.deep.equal(original);
  });

  it('a rate that is not a number is refused in the form with what to type', async () => {
    const { el } = await logImport();
    await chooseFile(el, new File(['gyro_z\n0.1\n0.2\n0.1\n0.3\n0.2\n'], 'no-time.csv'));
    const rate = deepQuery<HTMLInputElement>(el, 'input#rate');
    rate.value = 'fast';
    rate.dispatchEvent(new Event('input'));
    deepQuery<HTMLButtonElement>(el, 'button#run').click();
    await settle(el);
    expect(deepQuery(el, 'sl-log-allan-form').shadowRoot!.querySelector('[role="alert"]')!.textContent).to.match(/sample rate in Hz/);
  });

  it('an empty file is reported as a log without a header line', async () => {
    const { el } = await logImport();
    await chooseFile(el, new File(['# only a comment\n\n'], 'empty.csv'));
    expect(el.jobs.status).to.equal('error');
    expect(failure(el)).to.match(/empty\.csv line 1: no header line was found/);
  });
});
