import { LitElement, css, html } from 'lit';
import { customElement, property, query } from 'lit/decorators.js';
import type { DimensionName } from '../../src';
import { unitGroups } from '../../src';

/** Detail of `sl-unit-change`. */
export interface UnitChangeDetail {
  /** The unit picked. */
  unit: string;
  /** The unit before. */
  from: string;
}

/**
 * A unit picker offering the units of the given dimensions, grouped by
 * dimension; the current unit stays in the list even when unusual. It only
 * reports the pick: the owner converts the value (web/grid/change-unit.ts).
 *
 * @fires sl-unit-change - {@link UnitChangeDetail} when another unit is picked
 */
@customElement('sl-unit-picker')
export class SlUnitPicker extends LitElement {
  static override styles = css`
    :host { display: block; min-width: 0; }
    select { box-sizing: border-box; width: 100%; font: 12px var(--sl-mono); color: var(--sl-ink); background: transparent;
      border: 1px solid transparent; border-radius: var(--sl-radius); padding: 2px 1px; }
    select:hover { border-color: var(--sl-rule); }
    select:focus { outline: 2px solid var(--sl-accent); outline-offset: -1px; background: var(--sl-panel); }
  `;

  /** The current unit text. */
  @property() unit = '';
  /** Dimensions whose units are offered (src/units DIMENSION_NAMES). */
  @property({ attribute: false }) dimensions: DimensionName[] = [];
  /** Accessible name ("gyro.arw unit"). */
  @property() label = 'Unit';
  /** tabindex of the select (grids rove it). */
  @property({ type: Number }) tab = 0;

  @query('select') private select?: HTMLSelectElement;

  override render() {
    return html`
      <select aria-label=${this.label} tabindex=${this.tab} title=${this.unit} @change=${this.picked}>
        ${unitGroups(this.dimensions, this.unit).map((g) => html`
          <optgroup label=${g.label}>${g.units.map((u) => html`<option .value=${u} ?selected=${u === this.unit}>${u}</option>`)}</optgroup>`)}
      </select>
    `;
  }

  protected override updated(): void {
    // The owner may refuse a pick; the select always shows the unit it was given.
    if (this.select && this.select.value !== this.unit) this.select.value = this.unit;
  }

  /** Focuses the select (grids call this to move the active cell). */
  override focus(options?: FocusOptions): void {
    this.select?.focus(options);
  }

  /** Opens the list (Enter in a grid), where the browser supports it. */
  open(): void {
    try {
      this.select?.showPicker?.();
    } catch {
      // showPicker needs a user gesture; without one the select simply stays closed.
    }
  }

  private picked(): void {
    const unit = this.select!.value;
    if (unit === this.unit) return;
    const from = this.unit;
    this.select!.value = from; // until the owner's edit comes back as a new `unit`
    this.dispatchEvent(new CustomEvent<UnitChangeDetail>('sl-unit-change', { detail: { unit, from }, bubbles: true }));
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-unit-picker': SlUnitPicker;
  }
}
