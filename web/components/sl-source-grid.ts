import { LitElement, css, html, nothing, type PropertyValues } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import { ifDefined } from 'lit/directives/if-defined.js';
import type { BudgetDocument, SensorEntry, SourceRow } from '../../src';
import type { SourceKind } from '../../src';
import type { ViewResult } from '../../src';
import { SENSOR_KINDS } from '../../src';
import { SOURCE_KINDS } from '../../src';
import type { DocumentStore } from '../state/document-store';
import type { GridMove, GridPosition } from '../grid/grid-navigation';
import { editorStyles } from '../grid/editor-styles';
import { PASTE_COLUMNS } from '../grid/paste-rows';
import { presentColumns, SOURCE_COLUMNS } from '../grid/source-columns';
import { sourceCell } from '../grid/source-cells';
import { GridController } from '../grid/grid-controller';
import { blockedWithin, errorsWithin, isOmitted } from '../grid/view-lookup';
import './sl-paste-report';
import './sl-tuning-line';

const FIELD_LABEL: Record<string, string> = { value: 'Magnitude', correlationTime: 'Correlation time', rate: 'Rate override' };
/** Columns on a row's first line; the rest (provenance, assumed) sit on its second. */
const FIRST_LINE = SOURCE_COLUMNS.findIndex((c) => c.key === 'provenance');
/** Header cells of the second line (visually hidden: the line's cells say what they hold), as [id, column, span]. */
const SECOND_LINE_HEADERS: [string, number, number][] = [['head-provenance', FIRST_LINE, FIRST_LINE - 1], ['head-assumed', FIRST_LINE + 1, 1]];
/** The unit an empty correlation time or rate override gets when typed into, shown beside it. */
const UNIT_HINT: Record<string, string> = { tauUnit: 's', rateUnit: 'Hz' };
// Kind, magnitude, unit and form hold the longest texts ("bias instability", formulas, "deg/s/√Hz", "Allan floor");
// the correlation-time unit, rate and rate unit hold a few characters each.
const WIDTHS = ['7%', '19%', '17%', '14%', '8%', '6.5%', '6.5%', '6.5%', '15.5%'];

/**
 * The selected sensor's error sources as a grid: one row per source, a
 * line of numbers (id, kind, magnitude and unit, correlation time, rate
 * override, the kind's option) and a line of provenance and the assumed
 * flag. Spreadsheet keys: arrows, Enter, Tab, Escape, typing to edit,
 * Alt+Up/Down to move a row, Ctrl+C / Ctrl+V of tab-separated rows.
 * Every change goes through the store, so undo covers it.
 *
 * @fires sl-note - { message } after edits worth a word (a conversion, a paste)
 */
@customElement('sl-source-grid')
export class SlSourceGrid extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; }
    table { min-width: 580px; }
    tbody.row > tr > td { border-bottom: none; }
    tbody.row { border-bottom: 1px solid var(--sl-rule); }
    tbody.row.active { background: var(--sl-accent-soft); }
    tbody.row.selected { background: #e9f3f5; }
    tr.second td { padding-bottom: 4px; }
    tr.second-head th { padding: 0; border: 0; height: 0; }
    .sr-only { position: absolute; width: 1px; height: 1px; overflow: hidden; clip: rect(0 0 0 0); white-space: nowrap; }
    td.na { background: repeating-linear-gradient(135deg, transparent 0 4px, var(--sl-paper) 4px 6px); }
    td.unit-hint { font: 12px var(--sl-mono); color: var(--sl-ink-soft); padding-top: 5px; }
    tr.messages td { padding: 2px 6px 5px; }
    tr.tuning td { padding: 0 6px 5px; }
    button[aria-pressed='true'] { background: var(--sl-accent-soft); }
    label.assumed { display: flex; align-items: center; gap: 3px; font-size: 11px; color: var(--sl-ink-soft); }
    .kinds { max-width: 150px; }
  `];

  /** The open document's store; every edit goes through it. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The document shown (the store's current one); a new object re-renders. */
  @property({ attribute: false }) doc?: BudgetDocument;
  /** The latest view: evaluated numbers, cell errors, items left out. */
  @property({ attribute: false }) view?: ViewResult;
  /** Index of the sensor whose rows are shown. */
  @property({ type: Number }) sensorIndex = 0;

  @state() private addKind?: SourceKind;
  /** Whether the "filter as tuned" line shows under each row; undefined: shown when the document has a filter design. */
  @state() private tuningShown?: boolean;
  /** Keyboard, focus, clipboard and the edits behind them. */
  readonly grid = new GridController(this);

  /** The sensor shown, if the index is valid. */
  get sensor(): SensorEntry | undefined {
    return (this.store?.document ?? this.doc)?.sensors[this.sensorIndex];
  }

  /** Which cells each row has, by column index. */
  present(): boolean[][] {
    const s = this.sensor;
    return s ? s.sources.map((row) => presentColumns(s.kind, row)) : [];
  }

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('sensorIndex')) this.grid.reset();
    this.grid.clamp();
  }

  override render() {
    const s = this.sensor;
    if (!s) return nothing;
    const kinds = SENSOR_KINDS[s.kind].sourceKinds;
    const addKind = this.addKind && kinds.includes(this.addKind) ? this.addKind : kinds[0];
    const { row } = this.grid.active;
    const none = s.sources.length === 0;
    return html`
      <div class="bar" role="toolbar" aria-label=${`Rows of ${s.id}`}>
        <select class="kinds" aria-label="Kind of the new row" @change=${(e: Event) => (this.addKind = (e.target as HTMLSelectElement).value as SourceKind)}>
          ${kinds.map((k) => html`<option .value=${k} ?selected=${k === addKind}>${SOURCE_KINDS[k].label}</option>`)}
        </select>
        <button @click=${() => this.grid.addRow(addKind)}>Add row</button>
        <button ?disabled=${none || row === 0} title="Alt+Up" @click=${() => this.grid.moveRow(-1)}>Move up</button>
        <button ?disabled=${none || row >= s.sources.length - 1} title="Alt+Down" @click=${() => this.grid.moveRow(1)}>Move down</button>
        <button ?disabled=${none} @click=${() => this.grid.deleteRow()}>Delete row</button>
        <button class="tuning-toggle" aria-pressed=${String(this.showsTuning())} title="The filter's design beside each row: the value it is tuned with, left out, inflation, state model"
          @click=${() => (this.tuningShown = !this.showsTuning())}>Filter as tuned</button>
      </div>
      <div class="hint" id="paste-hint">Paste rows from a spreadsheet (Ctrl+V on the grid), tab-separated in this order: ${PASTE_COLUMNS.join(' · ')}. Ctrl+C copies the active rows the same way.</div>
      <table role="grid" aria-label=${`Error sources of ${s.id}`} aria-describedby="paste-hint" @keydown=${this.grid.keydown} @focusin=${this.grid.focusin}>
        <colgroup>${WIDTHS.map((w) => html`<col style=${`width:${w}`} />`)}</colgroup>
        <thead><tr>${SOURCE_COLUMNS.slice(0, FIRST_LINE).map((c) => html`<th scope="col" title=${c.title}>${c.label}</th>`)}</tr>
          <tr class="second-head">${SECOND_LINE_HEADERS.map(([id, c, span]) => html`<th id=${id} scope="col" colspan=${span}><span class="sr-only">${SOURCE_COLUMNS[c].label}</span></th>`)}</tr></thead>
        ${s.sources.map((r, i) => this.renderRow(s, r, i))}
      </table>
      ${none ? html`<p class="empty">No rows yet: add one above, or paste rows copied from a spreadsheet here.</p>` : nothing}
      ${this.grid.pasteResult ? html`<sl-paste-report .result=${this.grid.pasteResult} @sl-paste-retry=${(e: CustomEvent<{ text: string }>) => this.grid.paste(e.detail.text)}
        @sl-dismiss=${() => this.grid.dismissPaste()}></sl-paste-report>` : nothing}
    `;
  }

  private renderRow(s: SensorEntry, row: SourceRow, r: number) {
    const present = presentColumns(s.kind, row);
    const ctx = this.grid.cellContext(s, this.sensorIndex, this.view);
    const hint = (c: number) => (present[c - 1] ? UNIT_HINT[SOURCE_COLUMNS[c].key] : undefined);
    const td = (c: number, span = 1, headers?: string) => present[c]
      ? html`<td data-row=${r} data-col=${c} colspan=${span} headers=${ifDefined(headers)}>${sourceCell(ctx, row, r, c)}</td>`
      : html`<td class=${hint(c) ? 'unit-hint' : 'na'} colspan=${span} headers=${ifDefined(headers)}>${hint(c) ?? ''}</td>`;
    const cls = `row${r === this.grid.active.row ? ' active' : ''}${this.grid.isSelected(r) ? ' selected' : ''}`;
    return html`<tbody class=${cls}>
      <tr aria-selected=${this.grid.isSelected(r) ? 'true' : 'false'}>${SOURCE_COLUMNS.slice(0, FIRST_LINE).map((_, c) => td(c))}</tr>
      <tr class="second">${SECOND_LINE_HEADERS.map(([id, c, span]) => td(c, span, id))}</tr>
      ${this.showsTuning() ? html`<tr class="tuning"><td colspan=${FIRST_LINE}><sl-tuning-line .store=${this.store} .sensor=${s} .sensorIndex=${this.sensorIndex}
        .rowIndex=${r} .view=${this.view}></sl-tuning-line></td></tr>` : nothing}
      ${this.renderMessages(r)}
    </tbody>`;
  }

  /** True when the "filter as tuned" line shows: as the user toggled it, else when some row of the document carries a design. */
  showsTuning(): boolean {
    const doc = this.store?.document ?? this.doc;
    return this.tuningShown ?? (doc?.sensors.some((s) => s.sources.some((row) => row.tuning !== undefined)) ?? false);
  }

  private renderMessages(r: number) {
    const base = `sensors[${this.sensorIndex}].sources[${r}]`;
    const errors = errorsWithin(this.view, base);
    const blocked = blockedWithin(this.view, base);
    const omitted = isOmitted(this.view, base);
    if (!errors.length && !blocked && !omitted) return nothing;
    return html`<tr class="messages"><td colspan=${FIRST_LINE}>
      ${errors.map((e) => html`<div class="problem"><strong>${FIELD_LABEL[e.location.field] ?? e.location.field}:</strong> ${e.message}</div>`)}
      ${blocked ? html`<div class="blocked" role="alert">${blocked}</div>` : nothing}
      ${omitted ? html`<div class="omitted">This row is left out of the analysis until its cells are fixed.</div>` : nothing}
    </td></tr>`;
  }

  protected override updated(): void {
    this.grid.focusIfWanted();
  }

  /** Moves the active cell as a key would and focuses it (for tests and tooling). */
  moveActive(move: GridMove): GridPosition | undefined {
    return this.grid.move(move);
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-source-grid': SlSourceGrid;
  }
}
