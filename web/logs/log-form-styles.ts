/**
 * Styles the sensor-log forms share: labelled selects in a grid of columns,
 * in the theme's variables.
 */
import { css } from 'lit';

/** Add after `editorStyles` in a log form's `static styles`. */
export const logFormStyles = css`
  :host { display: block; }
  .grid { display: grid; grid-template-columns: repeat(auto-fill, minmax(190px, 1fr)); gap: 6px 12px; margin: 6px 0; }
  label { display: grid; gap: 2px; font-size: 11px; color: var(--sl-ink-soft); }
  select, input[type='text'] { border-color: var(--sl-rule); background: var(--sl-panel); color: var(--sl-ink); }
`;
