import { expect } from '@open-wc/testing';
import { resetMouse, sendMouse } from '@web/test-runner-commands';
import { freshApp } from './helpers';
import '../../../web/styles/theme.css';

/** Relative luminance of an `rgb(r, g, b)` colour (WCAG 2.1, "relative luminance", published). */
function luminance(rgb: string): number {
  const [r, g, b] = rgb
    .match(/\d+(\.\d+)?/g)!
    .slice(0, 3)
    .map((c) => {
      const s = Number(c) / 255;
      return s <= 0.03928 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
    });
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

/** The colour painted behind `el`: its own background or the nearest opaque one above it. */
function background(el: Element): string {
  for (let e: Element | null = el; e; e = e.parentElement ?? (e.getRootNode() as ShadowRoot).host ?? null) {
    const c = getComputedStyle(e).backgroundColor;
    if (c && !/rgba\(.*,\s*0\)$/.test(c) && c !== 'transparent') return c;
  }
  return 'rgb(255, 255, 255)';
}

describe('a selected tab under the mouse', () => {
  afterEach(() => resetMouse());

  for (const host of ['sl-workbench', 'sl-findings']) {
    it(`keeps text contrast of at least 4.5:1 in ${host} (WCAG 2.1 SC 1.4.3, published)`, async () => {
      const app = await freshApp();
      const tab = app
        .shadowRoot!.querySelector(host)!
        .shadowRoot!.querySelector<HTMLElement>('[role="tab"][aria-selected="true"]')!;
      const box = tab.getBoundingClientRect();
      await sendMouse({
        type: 'move',
        position: [Math.round(box.x + box.width / 2), Math.round(box.y + box.height / 2)],
      });
      expect(tab.matches(':hover'), 'the mouse is over the tab').to.equal(true);
      const [a, b] = [luminance(getComputedStyle(tab).color), luminance(background(tab))].sort((x, y) => y - x);
      expect((a + 0.05) / (b + 0.05)).to.be.at.least(4.5);
    });
  }
});
