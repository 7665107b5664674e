import { expect } from '@open-wc/testing';
import { sendKeys } from '@web/test-runner-commands';
import { cell, deepQuery, deepQueryAll, recompute, settle, workbench } from './helpers';

const ORCHARD = 0, ANNOTATED = 3;

describe('the filter as tuned beside each row of the grid', () => {
  it('shows each row\'s design on a budget that has one, and a typed tuned value is one undoable edit the analysis reads', async () => {
    const { el, store } = await workbench(ANNOTATED);
    const picks = deepQueryAll<HTMLSelectElement>(el, 'select[aria-label="gyro.bi state model in the filter"]');
    expect(picks.length).to.equal(1);
    expect(picks[0].value).to.equal('random-walk');
    expect(deepQuery<HTMLInputElement>(el, 'input[aria-label="gyro.sf left out of the filter"]').checked).to.equal(true);
    const { input } = cell(el, 'gyro.arw value the filter is tuned with');
    input.focus();
    await sendKeys({ type: '0.5' });
    await sendKeys({ press: 'Enter' });
    await settle(el);
    const row = store.document.sensors[0].sources[0];
    expect(row.tuning).to.deep.equal({ value: { value: 0.5, unit: row.unit } });
    expect(store.undoLabel).to.equal('tune gyro.arw in the filter (value)');
    await recompute(el, store);
    expect(Object.keys(el.view!.result!.filterDesign!.tuning)).to.include('gyro.arw');
    store.undo();
    await settle(el);
    expect(store.document.sensors[0].sources[0].tuning).to.equal(undefined);
  });

  it('is hidden on a budget without a design until toggled; leaving a row out gives the page a filter design, and ticking it back removes the design', async () => {
    const { el, store } = await workbench(ORCHARD);
    expect(deepQueryAll(el, 'sl-tuning-line').length).to.equal(0);
    const toggle = deepQuery<HTMLButtonElement>(el, 'button.tuning-toggle');
    expect(toggle.getAttribute('aria-pressed')).to.equal('false');
    toggle.click();
    await settle(el);
    expect(deepQueryAll(el, 'sl-tuning-line').length).to.equal(store.document.sensors[0].sources.length);
    const leftOut = () => deepQuery<HTMLInputElement>(el, 'input[aria-label="gyro.bias left out of the filter"]');
    leftOut().click();
    await settle(el);
    expect(store.document.sensors[0].sources[2].tuning).to.deep.equal({ leftOut: true });
    await recompute(el, store);
    const design = el.view!.result!.filterDesign!;
    expect(Object.keys(design.tuning)).to.deep.equal(['gyro.bias']);
    // Leaving a state out never beats the optimum (Gelb, Applied Optimal Estimation, 1974, §7.2).
    design.actual.requirements.forEach((r, i) => expect(r.worst).to.be.at.least(el.view!.result!.requirements[i].worst * (1 - 1e-9)));
    leftOut().click();
    await settle(el);
    expect('tuning' in store.document.sensors[0].sources[2]).to.equal(false);
  });

  it('refuses an inflation that is not above zero in place, keeping the text and changing nothing', async () => {
    const { el, store } = await workbench(ORCHARD);
    deepQuery<HTMLButtonElement>(el, 'button.tuning-toggle').click();
    await settle(el);
    const { cell: c, input } = cell(el, 'gyro.arw filter-only inflation of its variances');
    input.focus();
    await sendKeys({ type: '-2' });
    await sendKeys({ press: 'Enter' });
    await settle(el);
    expect(store.canUndo).to.equal(false);
    expect(input.value).to.equal('-2');
    expect(c.shadowRoot!.querySelector('[role="alert"]')!.textContent).to.contain('above zero');
    input.select();
    await sendKeys({ type: '4' });
    await sendKeys({ press: 'Enter' });
    await settle(el);
    expect(store.document.sensors[0].sources[0].tuning).to.deep.equal({ inflation: 4 });
  });
});
