/**
 * Styles the workbench's components share: compact tables of cells,
 * buttons, notes and messages, all in the theme's variables
 * (web/styles/theme.css), sized for the left part of a 1280 px page.
 */
import { css } from 'lit';

/** Tables, controls and messages of the editors; add to a component's `static styles`. */
export const editorStyles = css`
  :host { font-family: var(--sl-font); color: var(--sl-ink); font-size: 13px; }
  h3 { font-size: 13px; margin: 14px 0 6px; color: var(--sl-ink-soft); text-transform: uppercase; letter-spacing: 0.04em; }
  table { border-collapse: collapse; width: 100%; table-layout: fixed; background: var(--sl-panel); }
  th { text-align: left; font-weight: 600; font-size: 11px; color: var(--sl-ink-soft); padding: 3px 4px; border-bottom: 1px solid var(--sl-rule-strong, var(--sl-rule)); }
  td { padding: 2px 3px; border-bottom: 1px solid var(--sl-rule); vertical-align: top; }
  input, select, textarea, button { font: inherit; font-size: 12px; color: inherit; }
  input[type='text'], select, textarea { box-sizing: border-box; width: 100%; border: 1px solid transparent; border-radius: var(--sl-radius); background: transparent; padding: 2px 3px; }
  input[type='text']:hover, select:hover { border-color: var(--sl-rule); }
  input[type='text']:focus, select:focus, textarea:focus { border-color: var(--sl-accent); background: var(--sl-panel); }
  button { background: var(--sl-panel); border: 1px solid var(--sl-rule-strong, var(--sl-rule)); border-radius: var(--sl-radius); padding: 2px 8px; cursor: pointer; }
  button:hover:not(:disabled) { border-color: var(--sl-accent); color: var(--sl-accent); }
  button:disabled { opacity: 0.45; cursor: default; }
  button.icon { padding: 1px 5px; min-width: 22px; }
  .bar { display: flex; flex-wrap: wrap; align-items: center; gap: 6px; margin: 6px 0; }
  .hint { color: var(--sl-ink-soft); font-size: 11px; }
  .empty { color: var(--sl-ink-soft); font-style: italic; padding: 6px 4px; }
  .blocked { background: var(--sl-error-bg); color: var(--sl-fail); border-left: 3px solid var(--sl-fail); padding: 3px 6px; font-size: 12px; }
  .omitted { background: var(--sl-warn-bg); color: var(--sl-warn-ink, var(--sl-ink)); padding: 2px 6px; font-size: 11px; }
  .problem { color: var(--sl-fail); font-size: 11px; }
  .sr-only { position: absolute; width: 1px; height: 1px; overflow: hidden; clip: rect(0 0 0 0); white-space: nowrap; }
  label.inline { display: inline-flex; align-items: center; gap: 4px; }
`;
