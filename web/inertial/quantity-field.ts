/**
 * Shared pieces of the 3-D editors and findings: one `{ value, unit }` field
 * of the document (an sl-quantity on the store), and the tab bar's styles.
 */
import { css, html } from 'lit';
import type { DimensionName, ViewResult } from '../../src';
import type { DocumentStore } from '../state/document-store';
import '../components/sl-quantity';

/** An sl-quantity editing the cell at `path` through `store`, with the view's value and error. */
export function quantityField(
  store: DocumentStore, view: ViewResult | undefined, path: string, label: string, dims: readonly DimensionName[] | readonly string[], optional = false,
) {
  return html`<sl-quantity .store=${store} .view=${view} path=${path} label=${label} .dimensions=${dims}
    ?optional=${optional}></sl-quantity>`;
}

/** The tab bar of the 3-D workbench and findings (as the planar ones look). */
export const tabBarStyles = css`
  [role='tablist'] {
    display: flex; gap: 2px; border-bottom: 2px solid var(--sl-ink); position: sticky; top: 0;
    background: var(--sl-paper); padding-top: 8px; z-index: 2;
  }
  [role='tab'] {
    font: inherit; font-size: 13px; border: 1px solid var(--sl-rule); border-bottom: none;
    border-radius: var(--sl-radius) var(--sl-radius) 0 0; padding: 5px 14px; background: var(--sl-paper); color: var(--sl-ink);
    cursor: pointer;
  }
  [role='tab'][aria-selected='true'] { background: var(--sl-ink); color: var(--sl-paper); border-color: var(--sl-ink); }
`;
