/**
 * The cells of one error-source row in the grid, as templates: each column's
 * editor with its accessible name, roving tabindex and event wiring. The grid
 * component (sl-source-grid) owns the state and the handlers.
 */
import { html, nothing, type TemplateResult } from 'lit';
import type { SensorEntry, SourceRow } from '../../src';
import type { ViewResult } from '../../src';
import { SENSOR_KINDS } from '../../src';
import { SOURCE_KINDS } from '../../src';
import type { CellCommitDetail } from '../components/sl-cell';
import type { UnitChangeDetail } from '../components/sl-unit-picker';
import { rowOption, SOURCE_COLUMNS, type SourceColumn } from './source-columns';
import { rowDimensions } from '../../src';
import { cellErrorAt, cellValueAt } from './view-lookup';

/** A row's field that has a unit picker. */
export type UnitField = 'value' | 'correlationTime' | 'rate';

/** What the cell templates need from the grid. */
export interface SourceCellContext {
  sensor: SensorEntry;
  sensorIndex: number;
  view?: ViewResult;
  /** tabindex of the cell at (row, col): 0 for the active cell, -1 otherwise. */
  tab(row: number, col: number): number;
  commit(row: number, key: SourceColumn['key'], e: CustomEvent<CellCommitDetail>): void;
  unit(row: number, field: UnitField, e: CustomEvent<UnitChangeDetail>): void;
  pick(row: number, key: 'kind' | 'option' | 'assumed', value: string | boolean): void;
}

const SHORT_KIND: Record<string, string> = { multipath: 'multipath' };

function kindSelect(ctx: SourceCellContext, row: SourceRow, r: number, c: number, name: string): TemplateResult {
  const kinds = SENSOR_KINDS[ctx.sensor.kind].sourceKinds;
  const foreign = kinds.includes(row.kind) ? [] : [row.kind];
  return html`<select class="f" aria-label=${`${name} kind`} tabindex=${ctx.tab(r, c)} title=${SOURCE_KINDS[row.kind]?.summary ?? ''}
    @change=${(e: Event) => ctx.pick(r, 'kind', (e.target as HTMLSelectElement).value)}>
    ${[...foreign, ...kinds].map((k) => html`<option .value=${k} ?selected=${k === row.kind}>${SHORT_KIND[k] ?? SOURCE_KINDS[k]?.label ?? `${k} (not for this sensor)`}</option>`)}
  </select>`;
}

function optionSelect(ctx: SourceCellContext, row: SourceRow, r: number, c: number, name: string): TemplateResult {
  const option = rowOption(ctx.sensor.kind, row)!;
  const current = (row[option.field] as string | undefined) ?? option.fallback;
  return html`<select class="f" aria-label=${`${name} ${option.label}`} tabindex=${ctx.tab(r, c)} title=${option.label}
    @change=${(e: Event) => ctx.pick(r, 'option', (e.target as HTMLSelectElement).value)}>
    ${option.choices.map((o) => html`<option .value=${o.value} ?selected=${o.value === current}>${o.label}</option>`)}
  </select>`;
}

function valueCell(ctx: SourceCellContext, r: number, c: number, key: SourceColumn['key'], content: SourceRow['value'] | undefined, label: string, path: string): TemplateResult {
  const optional = key !== 'value';
  return html`<sl-cell class="f" grid compact ?optional=${optional} .content=${content} label=${label} .tab=${ctx.tab(r, c)}
    placeholder=${optional ? '—' : ''} .evaluated=${cellValueAt(ctx.view, path)} .error=${cellErrorAt(ctx.view, path)?.message}
    @sl-commit=${(e: CustomEvent<CellCommitDetail>) => ctx.commit(r, key, e)}></sl-cell>`;
}

function unitPicker(ctx: SourceCellContext, row: SourceRow, r: number, c: number, field: UnitField, name: string): TemplateResult {
  const unit = field === 'value' ? row.unit : row[field]!.unit;
  const dims = field === 'value' ? rowDimensions(ctx.sensor.kind, row.kind) : field === 'rate' ? ['frequency' as const] : ['time' as const];
  const what = field === 'value' ? 'unit' : field === 'rate' ? 'rate unit' : 'correlation time unit';
  return html`<sl-unit-picker class="f" .unit=${unit} .dimensions=${dims} label=${`${name} ${what}`} .tab=${ctx.tab(r, c)}
    @sl-unit-change=${(e: CustomEvent<UnitChangeDetail>) => ctx.unit(r, field, e)}></sl-unit-picker>`;
}

/** The editor of column `c` in row `r`, or nothing when the row has no such cell. */
export function sourceCell(ctx: SourceCellContext, row: SourceRow, r: number, c: number): TemplateResult | typeof nothing {
  const name = `${ctx.sensor.id}.${row.id}`;
  const path = `sensors[${ctx.sensorIndex}].sources[${r}]`;
  const commit = (e: CustomEvent<CellCommitDetail>) => ctx.commit(r, SOURCE_COLUMNS[c].key, e);
  switch (SOURCE_COLUMNS[c].key) {
    case 'id':
      return html`<sl-cell class="f" grid text .content=${row.id} label=${`Row id of ${name}`} .tab=${ctx.tab(r, c)} @sl-commit=${commit}></sl-cell>`;
    case 'kind': return kindSelect(ctx, row, r, c, name);
    case 'value': return valueCell(ctx, r, c, 'value', row.value, `${name} magnitude`, `${path}.value`);
    case 'unit': return unitPicker(ctx, row, r, c, 'value', name);
    case 'tau': return valueCell(ctx, r, c, 'tau', row.correlationTime?.value, `${name} correlation time`, `${path}.correlationTime.value`);
    case 'tauUnit': return unitPicker(ctx, row, r, c, 'correlationTime', name);
    case 'rate': return valueCell(ctx, r, c, 'rate', row.rate?.value, `${name} rate override`, `${path}.rate.value`);
    case 'rateUnit': return unitPicker(ctx, row, r, c, 'rate', name);
    case 'option': return optionSelect(ctx, row, r, c, name);
    case 'provenance':
      return html`<sl-cell class="f" grid text .content=${row.provenance} label=${`${name} provenance`} placeholder="where the number came from"
        .tab=${ctx.tab(r, c)} @sl-commit=${commit}></sl-cell>`;
    case 'assumed':
      return html`<label class="assumed"><input type="checkbox" class="f" aria-label=${`${name} assumed`} .checked=${row.assumed} tabindex=${ctx.tab(r, c)}
        @change=${(e: Event) => ctx.pick(r, 'assumed', (e.target as HTMLInputElement).checked)} />assumed</label>`;
  }
}
