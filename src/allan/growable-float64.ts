/**
 * A Float64Array that grows by doubling, so that a log of unknown length is
 * read in linear time and at most twice its final memory (8 bytes a value).
 */

/** An append-only list of doubles. */
export class GrowableFloat64Array {
  private data: Float64Array;
  private size = 0;

  /** @param initialCapacity values to reserve at first (≥ 1). */
  constructor(initialCapacity = 1024) {
    this.data = new Float64Array(Math.max(1, Math.floor(initialCapacity)));
  }

  /** Number of values appended. */
  get length(): number {
    return this.size;
  }

  /** Appends one value. Throws RangeError only when memory runs out. */
  push(value: number): void {
    if (this.size === this.data.length) {
      const bigger = new Float64Array(this.data.length * 2);
      bigger.set(this.data);
      this.data = bigger;
    }
    this.data[this.size++] = value;
  }

  /** The value at `index` (0 ≤ index < length), unchecked. */
  at(index: number): number {
    return this.data[index];
  }

  /**
   * The values as an exactly sized Float64Array. Copies once, so the
   * reserve is released; call it when reading is done. Throws nothing.
   */
  toFloat64Array(): Float64Array {
    return this.data.slice(0, this.size);
  }
}
