import { expect } from '@open-wc/testing';
import { freshApp, recomputed } from './helpers';
import type { SlApp } from '../../../web/components/sl-app';

/**
 * The page passes axe (axe-core through @open-wc/testing's chai-a11y-axe,
 * WCAG 2 A and AA rules) with no violations on every workbench tab and
 * every findings tab.
 */
function tabs(app: SlApp, component: string): HTMLButtonElement[] {
  const host = app.shadowRoot!.querySelector(component)!;
  return [...host.shadowRoot!.querySelectorAll<HTMLButtonElement>('[role="tab"]')];
}

describe('accessibility (axe)', () => {
  it('has no violations on any workbench tab or findings tab', async () => {
    const app = await freshApp();
    const workbench = tabs(app, 'sl-workbench');
    const findings = tabs(app, 'sl-findings');
    expect(workbench.length).to.be.greaterThan(0);
    expect(findings.length).to.be.greaterThan(0);
    for (const tab of [...workbench, ...findings]) {
      tab.click();
      await app.updateComplete;
      await recomputed(app);
      await new Promise((resolve) => setTimeout(resolve, 50));
      await expect(app, `tab ${tab.textContent?.trim()}`).to.be.accessible();
    }
  });
});
