import { expect } from '@open-wc/testing';
import { deepQueryAll, settle } from '../workbench/helpers';
import { droneApp } from './helpers';
// The page's theme (its colours are CSS variables), as web/index.html links it.
import '../../../web/styles/theme.css';

/** The 3-D view passes axe (WCAG 2 A and AA rules, through @open-wc/testing) on each of its tabs. */
describe('accessibility of the 3-D view (axe)', function () {
  this.timeout(240_000);

  it('has no violations on any workbench or findings tab of the 3-D example', async () => {
    const app = await droneApp();
    await expect(app).to.be.accessible();
    for (const host of ['sl-inertial-workbench', 'sl-inertial-findings']) {
      const tabs = deepQueryAll<HTMLButtonElement>(app, `${host} [role="tab"]`);
      for (const tab of tabs.slice(1)) {
        tab.click();
        await settle(app);
        await expect(app).to.be.accessible();
      }
    }
  });
});
