/**
 * The report's one stylesheet, inlined into the HTML file: plain type for
 * screen and paper, and print rules that keep table rows, charts and
 * headings whole across page breaks (table headers repeat on each page).
 * Black on white throughout, so it prints in black and white.
 */
export const REPORT_CSS = `
:root { color: #111; background: #fff; font: 14px/1.45 system-ui, "DejaVu Sans", sans-serif; }
body { max-width: 1100px; margin: 0 auto; padding: 24px; }
h1 { font-size: 1.7em; margin: 0 0 4px; }
h2 { font-size: 1.3em; margin: 1.6em 0 0.5em; border-bottom: 1.5px solid #111; padding-bottom: 2px; }
.subtitle { color: #333; font-size: 0.85em; word-break: break-all; margin: 0 0 1em; }
.caution { border: 2px solid #111; padding: 8px 12px; margin: 12px 0; font-weight: 600; }
nav ol { columns: 2; margin: 0.5em 0 1em; }
table { border-collapse: collapse; width: 100%; margin: 0.6em 0 1.2em; font-size: 0.86em; }
caption { text-align: left; font-weight: 600; padding: 4px 0; caption-side: top; }
th, td { border: 1px solid #888; padding: 3px 6px; vertical-align: top; text-align: left; white-space: pre-line; overflow-wrap: break-word; }
th { background: #eee; }
td.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
dl { display: grid; grid-template-columns: max-content 1fr; gap: 2px 14px; margin: 0.6em 0; }
dt { font-weight: 600; }
dd { margin: 0; overflow-wrap: anywhere; }
figure { margin: 0.8em 0 1.4em; }
figure svg { width: 100%; height: auto; max-width: 720px; display: block; }
figcaption { font-size: 0.85em; color: #333; }
@page { size: A4; margin: 14mm 12mm; }
@media print {
  :root { font-size: 10.5pt; }
  body { max-width: none; padding: 0; }
  h2 { break-after: avoid; }
  h2, caption { break-inside: avoid; }
  thead { display: table-header-group; }
  tr, figure, dl, .caution { break-inside: avoid; }
  table { break-inside: auto; }
}
`;
