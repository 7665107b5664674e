import { expect } from '@open-wc/testing';
import { freshApp, recomputed } from './helpers';
import { deepQuery } from '../workbench/helpers';
import type { SlApp } from '../../../web/components/sl-app';
import { FINDINGS_TABS } from '../../../web/components/sl-findings';
// The page's theme (its colours are CSS variables), as web/index.html links it.
import '../../../web/styles/theme.css';

/**
 * The page passes axe (axe-core through @open-wc/testing's chai-a11y-axe,
 * WCAG 2 A and AA rules) with no violations on every workbench tab and
 * every findings tab.
 */
const WORKBENCH_TABS = ['Suite', 'Mission', 'Named values', 'Requirements', 'Sensor logs'];

function tab(app: SlApp, component: string, label: string): HTMLButtonElement {
  const host = app.shadowRoot!.querySelector(component)!;
  const found = [...host.shadowRoot!.querySelectorAll<HTMLButtonElement>('[role="tab"]')].find((t) => t.textContent!.trim() === label);
  if (!found) throw new Error(`no tab "${label}" in ${component}`);
  return found;
}

/** The labels of every tab a component shows. */
function tabLabels(app: SlApp, component: string): string[] {
  const host = app.shadowRoot!.querySelector(component)!;
  return [...host.shadowRoot!.querySelectorAll('[role="tab"]')].map((t) => t.textContent!.trim());
}

describe('accessibility (axe)', function () {
  this.timeout(120_000);

  it('checks every tab the page shows (a new tab joins the list below)', async () => {
    const app = await freshApp();
    expect(tabLabels(app, 'sl-workbench')).to.deep.equal(WORKBENCH_TABS);
    expect(tabLabels(app, 'sl-findings')).to.deep.equal(FINDINGS_TABS.map(([, label]) => label));
  });

  it("gives each cell on a grid row's second line a header (provenance, assumed) in the same table", async () => {
    const app = await freshApp();
    const table = deepQuery(deepQuery(app, 'sl-source-grid').shadowRoot!, 'table');
    const lines = [...table.querySelectorAll('tbody tr.second')];
    expect(lines.length).to.be.greaterThan(0);
    for (const line of lines) {
      // Each header's text, looked up by the ids in the cell's headers attribute.
      const named = [...line.querySelectorAll('td')].map((td) =>
        (td.getAttribute('headers') ?? '').split(' ').filter(Boolean).map((id) => table.querySelector(`th[id="${id}"]`)?.textContent?.trim()));
      expect(named).to.deep.equal([['Provenance'], ['Assumed']]);
    }
  });

  const cases: [string, string][] = [
    ...WORKBENCH_TABS.map((label): [string, string] => ['sl-workbench', label]),
    ...FINDINGS_TABS.map(([, label]): [string, string] => ['sl-findings', label]),
  ];
  for (const [component, label] of cases) {
    it(`has no violations with the ${component === 'sl-workbench' ? 'workbench' : 'findings'} tab "${label}" open`, async () => {
      // A fresh page per tab: the fixture is removed after each test.
      const app = await freshApp();
      tab(app, component, label).click();
      await app.updateComplete;
      await recomputed(app);
      await expect(app).to.be.accessible();
    });
  }
});
