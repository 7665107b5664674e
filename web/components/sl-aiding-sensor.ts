import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { AidingKind, InertialRow, OutageEntry, ViewResult } from '../../src';
import {
  AIDING_PAGE_SPECS,
  LEVER_ARM_KINDS,
  VERTICAL_SIGMA_KINDS,
  WINDOW_KINDS,
  defaultUnit,
  uniqueId,
} from '../../src';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import { blockedWithin, itemProblem } from '../grid/view-lookup';
import { editInertial, inertialDoc } from '../inertial/inertial-store';
import { quantityField } from '../inertial/quantity-field';
import './sl-quantity';

/**
 * One aiding sensor of a 3-D budget: its rate, the antenna lever arm (x
 * forward, y right, z down) where the kind takes one, its rows (magnitude,
 * a vertical σ where the kind has one, a correlation time for multipath),
 * its outages and, for zero-velocity updates, the windows in which it is
 * used. Problems the engine reports inside the sensor are shown in place.
 */
@customElement('sl-aiding-sensor')
export class SlAidingSensor extends LitElement {
  static override styles = [
    editorStyles,
    css`
      :host {
        display: block;
        border: 1px solid var(--sl-rule);
        border-radius: var(--sl-radius);
        padding: 4px 8px 6px;
        margin: 8px 0;
        background: var(--sl-panel);
      }
      header {
        display: flex;
        align-items: center;
        gap: 8px;
      }
      header strong {
        font-size: 13px;
      }
      header .rate {
        width: 150px;
      }
      header button {
        margin-left: auto;
      }
      .arm {
        display: grid;
        grid-template-columns: auto repeat(3, 1fr);
        gap: 4px;
        align-items: center;
        margin: 4px 0;
      }
      col.id {
        width: 16%;
      }
      col.kind {
        width: 18%;
      }
      col.del {
        width: 30px;
      }
    `,
  ];

  @property({ attribute: false }) store!: DocumentStore;
  @property({ attribute: false }) view?: ViewResult;
  /** Document index of the sensor. */
  @property({ type: Number }) sensor = 0;

  override render() {
    const s = inertialDoc(this.store).sensors[this.sensor];
    const kind = s.kind as AidingKind;
    const spec = AIDING_PAGE_SPECS[kind];
    const base = `sensors[${this.sensor}]`;
    const vertical = VERTICAL_SIGMA_KINDS.includes(kind);
    const q = (path: string, label: string, dims: string[], optional = false) =>
      quantityField(this.store, this.view, path, label, dims, optional);
    const timed = spec?.rows.multipath !== undefined;
    const armProblem = blockedWithin(this.view, `${base}.leverArm`);
    return html`
      <header>
        <strong>${s.id}</strong><span class="hint">${spec?.label ?? kind}</span>
        <span class="rate">${q(`${base}.rate`, `${s.id} rate`, ['frequency'])}</span>
        <button
          class="icon"
          aria-label=${`Remove sensor ${s.id}`}
          title="Remove the sensor"
          @click=${this.removeSensor}
        >
          ×
        </button>
      </header>
      ${
        LEVER_ARM_KINDS.includes(kind)
          ? html` <div class="arm" role="group" aria-label=${`${s.id} lever arm`}>
                <span class="hint">lever arm (body)</span>
                ${(['x', 'y', 'z'] as const).map((a) =>
                  q(`${base}.leverArm.${a}`, `${s.id} lever arm ${a}`, ['length']))}
              </div>
              ${armProblem ? html`<div class="problem" role="alert">${armProblem}</div>` : nothing}`
          : nothing
      }
      <table aria-label=${`${s.id} rows`}>
        <colgroup>
          <col class="id" />
          <col class="kind" />
          <col />
          ${vertical ? html`<col />` : nothing}${timed ? html`<col />` : nothing}
          <col class="del" />
        </colgroup>
        <thead>
          <tr>
            <th>row</th>
            <th>kind</th>
            <th>σ${vertical ? ' (horizontal)' : ''}</th>
            ${vertical ? html`<th>σ vertical</th>` : nothing} ${timed ? html`<th>correlation time</th>` : nothing}
            <th><span class="sr-only">delete</span></th>
          </tr>
        </thead>
        <tbody>
          ${s.sources.map((row, j) => this.row(row, `${base}.sources[${j}]`, j, kind))}
        </tbody>
      </table>
      <div class="bar">
        ${Object.keys(spec?.rows ?? {})
          .filter((k) => !s.sources.some((r) => r.kind === k))
          .map((k) => html` <button @click=${() => this.addRow(k as keyof typeof spec.rows)}>Add ${k} row</button>`)}
        <button @click=${() => this.addSpan('outages')}>Add outage</button>
        ${WINDOW_KINDS.includes(kind) ?
            html`<button @click=${() => this.addSpan('windows')}>Add window</button>` : nothing}
      </div>
      ${this.spans('outages', s.outages)} ${WINDOW_KINDS.includes(kind) ? this.spans('windows', s.windows) : nothing}
    `;
  }

  private row(row: InertialRow, path: string, j: number, kind: AidingKind) {
    const s = inertialDoc(this.store).sensors[this.sensor];
    const name = `${s.id}.${row.id}`;
    const dim = AIDING_PAGE_SPECS[kind]?.rows[row.kind as keyof AidingPageRows] ?? 'length';
    const problem = itemProblem(this.view, path);
    return html`
      <tr data-row=${row.id}>
        <td>${row.id}</td>
        <td>${row.kind}</td>
        <td>
          <sl-quantity
            .store=${this.store}
            .view=${this.view}
            path=${path}
            label=${`${name} sigma`}
            .dimensions=${[dim]}
          ></sl-quantity>
        </td>
        ${
          VERTICAL_SIGMA_KINDS.includes(kind)
            ? html`<td>
                <sl-quantity
                  .store=${this.store}
                  .view=${this.view}
                  path=${`${path}.vertical`}
                  label=${`${name} vertical sigma`}
                  .dimensions=${[dim]}
                  optional
                ></sl-quantity>
              </td>`
            : nothing
        }
        ${
          AIDING_PAGE_SPECS[kind]?.rows.multipath !== undefined
            ? html`<td>
                ${
                  row.kind === 'multipath'
                    ? quantityField(this.store, this.view, `${path}.correlationTime`, `${name} correlation time`, ['time'], true)
                    : nothing
                }
              </td>`
            : nothing
        }
        <td><button class="icon" aria-label=${`Delete row ${name}`} @click=${() => this.removeRow(j)}>×</button></td>
      </tr>
      ${
        problem
          ? html`<tr>
              <td colspan="6"><span class="problem" role="alert">${problem}</span></td>
            </tr>`
          : nothing
      }
    `;
  }

  private spans(key: 'outages' | 'windows', list: OutageEntry[] | undefined) {
    if (!list?.length) return nothing;
    const s = inertialDoc(this.store).sensors[this.sensor];
    const base = `sensors[${this.sensor}].${key}`;
    const word = key === 'outages' ? 'outage' : 'window';
    return html` <table aria-label=${`${s.id} ${key}`}>
      <thead>
        <tr>
          <th>${word}</th>
          <th>start</th>
          <th>end</th>
          <th style="width:30px"><span class="sr-only">delete</span></th>
        </tr>
      </thead>
      <tbody>
        ${list.map((o, i) => {
          const problem = itemProblem(this.view, `${base}[${i}]`);
          return html` <tr>
              <td>${o.id ?? i + 1}</td>
              <td>
                <sl-quantity
                  .store=${this.store}
                  .view=${this.view}
                  path=${`${base}[${i}].start`}
                  label=${`${s.id} ${word} ${o.id ?? i + 1} start`}
                  .dimensions=${['time']}
                ></sl-quantity>
              </td>
              <td>
                <sl-quantity
                  .store=${this.store}
                  .view=${this.view}
                  path=${`${base}[${i}].end`}
                  label=${`${s.id} ${word} ${o.id ?? i + 1} end`}
                  .dimensions=${['time']}
                ></sl-quantity>
              </td>
              <td>
                <button
                  class="icon"
                  aria-label=${`Delete ${word} ${o.id ?? i + 1} of ${s.id}`}
                  @click=${() => this.removeSpan(key, i)}
                >
                  ×
                </button>
              </td>
            </tr>
            ${
              problem
                ? html`<tr>
                    <td colspan="4"><span class="problem" role="alert">${problem}</span></td>
                  </tr>`
                : nothing
            }`;
        })}
      </tbody>
    </table>`;
  }

  private addRow(kind: keyof AidingPageRows): void {
    const s = inertialDoc(this.store).sensors[this.sensor];
    const dim = AIDING_PAGE_SPECS[s.kind as AidingKind].rows[kind]!;
    editInertial(this.store, `add ${kind} row to ${s.id}`, (d) => {
      const rows = d.sensors[this.sensor].sources;
      const row = {
        id: uniqueId(
          kind === 'white-noise'
            ? 'white'
            : kind === 'turn-on-bias'
              ? 'bias'
              : kind === 'multipath'
                ? 'multipath'
                : 'sf',
          rows.map((r) => r.id),
        ),
        kind,
        value: 0,
        unit: defaultUnit([dim]),
        provenance: 'added on the page',
        assumed: true,
      } as InertialRow;
      if (kind === 'multipath') Object.assign(row, { multipathModel: 'folded' });
      rows.push(row);
    });
  }

  private removeRow(j: number): void {
    editInertial(this.store, `delete row ${inertialDoc(this.store).sensors[this.sensor].sources[j].id}`, (d) =>
      d.sensors[this.sensor].sources.splice(j, 1),
    );
  }

  private addSpan(key: 'outages' | 'windows'): void {
    editInertial(this.store, `add ${key === 'outages' ? 'an outage' : 'a window'}`, (d) => {
      const s = d.sensors[this.sensor];
      const list = (s[key] ??= []);
      list.push({
        id: uniqueId(
          key === 'outages' ? 'outage' : 'window',
          list.map((o) => o.id ?? ''),
        ),
        start: { value: 0, unit: 's' },
        end: { value: 10, unit: 's' },
      });
    });
  }

  private removeSpan(key: 'outages' | 'windows', i: number): void {
    editInertial(this.store, `delete ${key === 'outages' ? 'outage' : 'window'} ${i + 1}`, (d) => {
      const s = d.sensors[this.sensor];
      s[key]!.splice(i, 1);
      if (!s[key]!.length) delete s[key];
    });
  }

  private removeSensor(): void {
    editInertial(this.store, `remove sensor ${inertialDoc(this.store).sensors[this.sensor].id}`, (d) =>
      d.sensors.splice(this.sensor, 1),
    );
  }
}

type AidingPageRows = (typeof AIDING_PAGE_SPECS)[AidingKind]['rows'];

declare global {
  interface HTMLElementTagNameMap {
    'sl-aiding-sensor': SlAidingSensor;
  }
}
