import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { InertialRow, ViewResult } from '../../src';
import { IMU_ROW_DIMENSIONS, IMU_ROW_KINDS, defaultUnit, uniqueId } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import { itemProblem } from '../grid/view-lookup';
import { editInertial, inertialDoc } from '../inertial/inertial-store';
import { quantityField } from '../inertial/quantity-field';
import type { CellCommitDetail } from './sl-cell';
import './sl-cell';
import './sl-quantity';

/** What the axis column accepts: `all` (or empty) for the three axes, or one body axis. */
const AXIS_CHOICES = ['all', 'x', 'y', 'z'];

type Instrument = NonNullable<InertialRow['instrument']>;
type ImuKind = (typeof IMU_ROW_KINDS)[number];

/**
 * The IMU's rows as a table: id, instrument (gyro or accelerometer), axis
 * (all, x, y, z; a row naming an axis replaces the all-axes row of its
 * instrument and kind there), kind, magnitude with its unit (the trade's
 * units for the instrument and kind), correlation time. Every change goes
 * through the store. A typed axis that is not all/x/y/z stays in its cell
 * with a message naming the field.
 */
@customElement('sl-imu-grid')
export class SlImuGrid extends LitElement {
  static override styles = [
    editorStyles,
    css`
      :host {
        display: block;
      }
      col.id {
        width: 10%;
      }
      col.inst {
        width: 18%;
      }
      col.axis {
        width: 7%;
      }
      col.kind {
        width: 18%;
      }
      col.time {
        width: 18%;
      }
      col.del {
        width: 30px;
      }
      td.problem-row {
        padding: 0 4px 4px;
      }
    `,
  ];

  @property({ attribute: false }) store!: DocumentStore;
  @property({ attribute: false }) view?: ViewResult;
  /** Document index of the IMU sensor. */
  @property({ type: Number }) sensor = 0;

  override render() {
    const s = inertialDoc(this.store).sensors[this.sensor];
    const base = `sensors[${this.sensor}]`;
    return html`
      <table aria-label=${`${s.id} rows`}>
        <colgroup>
          <col class="id" />
          <col class="inst" />
          <col class="axis" />
          <col class="kind" />
          <col />
          <col class="time" />
          <col class="del" />
        </colgroup>
        <thead>
          <tr>
            <th>row</th>
            <th>instrument</th>
            <th>axis</th>
            <th>kind</th>
            <th>magnitude</th>
            <th>correlation time</th>
            <th><span class="sr-only">delete</span></th>
          </tr>
        </thead>
        <tbody>
          ${s.sources.map((row, j) => this.row(row, `${base}.sources[${j}]`, j))}
        </tbody>
      </table>
      <div class="bar">
        <button @click=${() => this.add('gyro')}>Add gyro row</button>
        <button @click=${() => this.add('accelerometer')}>Add accelerometer row</button>
        <span class="hint"
          >axis: all, x (forward), y (right) or z (down); an axis row replaces the all-axes row of its kind there</span
        >
      </div>
    `;
  }

  private row(row: InertialRow, path: string, j: number) {
    const name = `${inertialDoc(this.store).sensors[this.sensor].id}.${row.id}`;
    const instrument: Instrument = row.instrument ?? 'gyro';
    const dims = IMU_ROW_DIMENSIONS[instrument]?.[row.kind as ImuKind] ?? [];
    const problem = itemProblem(this.view, path);
    return html`
      <tr data-row=${row.id}>
        <td>
          <sl-cell
            text
            .content=${row.id}
            label=${`${name} id`}
            @sl-commit=${(e: CustomEvent<CellCommitDetail>) => this.rename(e, j)}
          ></sl-cell>
        </td>
        <td>
          <select
            aria-label=${`${name} instrument`}
            @change=${(e: Event) => this.setInstrument(j, (e.target as HTMLSelectElement).value as Instrument)}
          >
            ${(['gyro', 'accelerometer'] as const).map((i) =>
                html`<option value=${i} ?selected=${i === instrument}>${i}</option>`)}
          </select>
        </td>
        <td>
          <sl-cell
            text
            class="axis"
            .content=${row.axis ?? 'all'}
            label=${`${name} axis`}
            @sl-commit=${(e: CustomEvent<CellCommitDetail>) => this.setAxis(e, j, path)}
          ></sl-cell>
        </td>
        <td>
          <select
            aria-label=${`${name} kind`}
            @change=${(e: Event) => this.setKind(j, (e.target as HTMLSelectElement).value as ImuKind)}
          >
            ${IMU_ROW_KINDS.map((k) => html`<option value=${k} ?selected=${k === row.kind}>${k}</option>`)}
          </select>
        </td>
        <td>
          <sl-quantity
            .store=${this.store}
            .view=${this.view}
            path=${path}
            label=${`${name} magnitude`}
            .dimensions=${dims}
          ></sl-quantity>
        </td>
        <td>
          ${
            row.kind === 'bias-instability' || row.correlationTime
              ? quantityField(this.store, this.view, `${path}.correlationTime`, `${name} correlation time`, ['time'], true)
              : nothing
          }
        </td>
        <td>
          <button
            class="icon"
            aria-label=${`Delete row ${name}`}
            title="Delete the row"
            @click=${() => this.removeRow(j)}
          >
            ×
          </button>
        </td>
      </tr>
      ${
        problem
          ? html`<tr>
              <td colspan="7" class="problem-row"><span class="problem" role="alert">${problem}</span></td>
            </tr>`
          : nothing
      }
    `;
  }

  private rows(d = inertialDoc(this.store)): InertialRow[] {
    return d.sensors[this.sensor].sources;
  }

  private setAxis(e: CustomEvent<CellCommitDetail>, j: number, path: string): void {
    if (!e.detail.changed) return;
    const typed = String(e.detail.content ?? '')
      .trim()
      .toLowerCase();
    if (!AXIS_CHOICES.includes(typed) && typed !== '') {
      e.detail.reject(`${path}.axis: "${String(e.detail.content)}" is not an axis; type x, y, z or all`);
      return;
    }
    editInertial(this.store, `set axis of ${this.rows()[j].id} to ${typed || 'all'}`, (d) => {
      const row = this.rows(d)[j];
      if (typed === 'all' || typed === '') delete row.axis;
      else row.axis = typed as 'x' | 'y' | 'z';
    });
  }

  private setInstrument(j: number, instrument: Instrument): void {
    editInertial(this.store, `set instrument of ${this.rows()[j].id} to ${instrument}`, (d) => {
      const row = this.rows(d)[j];
      row.instrument = instrument;
      const dims = IMU_ROW_DIMENSIONS[instrument][row.kind as ImuKind];
      if (dims) row.unit = defaultUnit(dims);
    });
  }

  private setKind(j: number, kind: ImuKind): void {
    editInertial(this.store, `set kind of ${this.rows()[j].id} to ${kind}`, (d) => {
      const row = this.rows(d)[j];
      row.kind = kind;
      row.unit = defaultUnit(IMU_ROW_DIMENSIONS[row.instrument ?? 'gyro'][kind]);
      if (kind === 'bias-instability' && !row.correlationTime) row.correlationTime = { value: 100, unit: 's' };
      if (kind !== 'bias-instability') delete row.correlationTime;
    });
  }

  private rename(e: CustomEvent<CellCommitDetail>, j: number): void {
    const id = String(e.detail.content ?? '').trim();
    if (!e.detail.changed) return;
    const taken = this.rows()
      .filter((_r, i) => i !== j)
      .map((r) => r.id);
    if (!/^[A-Za-z_][A-Za-z0-9_]*$/.test(id))
      return e.detail.reject('a row id is letters, digits and _, starting with a letter');
    if (taken.includes(id)) return e.detail.reject(`"${id}" is used by another row of this sensor`);
    editInertial(this.store, `rename row ${this.rows()[j].id} to ${id}`, (d) => (this.rows(d)[j].id = id));
  }

  private add(instrument: Instrument): void {
    const stem = instrument === 'gyro' ? 'gyroRow' : 'accelRow';
    editInertial(this.store, `add ${instrument} row`, (d) => {
      const rows = this.rows(d);
      rows.push({
        id: uniqueId(
          stem,
          rows.map((r) => r.id),
        ),
        kind: 'turn-on-bias',
        instrument,
        value: 0,
        unit: defaultUnit(IMU_ROW_DIMENSIONS[instrument]['turn-on-bias']),
        provenance: 'added on the page',
        assumed: true,
      } as InertialRow);
    });
  }

  private removeRow(j: number): void {
    editInertial(this.store, `delete row ${this.rows()[j].id}`, (d) => this.rows(d).splice(j, 1));
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-imu-grid': SlImuGrid;
  }
}
