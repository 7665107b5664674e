/**
 * All the scalar measurements of one step boundary applied to a source's
 * share P_s as one block (docs/planar-model.md §6, §7).
 *
 * The total P is updated one scalar at a time, giving gains K_1 … K_q. A
 * source's fixed-gain recursion applies X <- A_i X A_iᵀ + K_i r_i K_iᵀ with
 * A_i = I − K_i h_iᵀ for i = 1 … q in turn. Multiplying out (by induction on
 * q), A_q ⋯ A_1 = I − B H with H the q rows h_iᵀ and the columns
 * B_i = A_q ⋯ A_{i+1} K_i (B_q = K_q), and the R terms sum to B R_s Bᵀ, so
 *   X⁺ = (I − B H) X (I − B H)ᵀ + B R_s Bᵀ = X − B Wᵀ − W Bᵀ,
 *   U = X Hᵀ, C = H U + R_s, W = U − ½ B C,
 * which is the same matrix as the q scalar updates (to round-off), in one
 * pass over the upper triangle with 2q multiply-adds per entry instead of q
 * passes with about six operations each. The Joseph form's symmetric
 * structure is kept by computing the upper triangle and mirroring it.
 */
export class BlockUpdate {
  /** Scalars held for the current boundary. */
  q = 0;
  private readonly hIdx: Int32Array[] = [];
  private readonly hVal: Float64Array[] = [];
  /** Gains K_i, then B, column i at [i * n, (i + 1) * n). */
  private b: Float64Array;
  private u: Float64Array;
  private w: Float64Array;
  private c: Float64Array;
  private dots: Float64Array;

  constructor(private readonly n: number) {
    this.b = new Float64Array(0);
    this.u = this.w = this.c = this.dots = this.b;
    this.grow(4);
  }

  /** Starts a new boundary. */
  clear(): void {
    this.q = 0;
  }

  /** Adds the i-th scalar: its sparse h and the total's gain K (copied). */
  add(hIdx: Int32Array, hVal: Float64Array, gain: Float64Array): void {
    if ((this.q + 1) * this.n > this.b.length) this.grow(2 * (this.q + 1));
    this.hIdx[this.q] = hIdx;
    this.hVal[this.q] = hVal;
    this.b.set(gain, this.q * this.n);
    this.q++;
  }

  /**
   * Turns the gains into B, call once after the last add: with the identity
   * A_q ⋯ A_{i+1} = I − Σ_{j>i} B_j h_jᵀ, B_i = K_i − Σ_{j>i} B_j (h_jᵀ K_i),
   * computed from i = q − 1 down so every B_j (j > i) is final when used.
   */
  finish(): void {
    const { n, q, b, dots } = this;
    for (let i = q - 2; i >= 0; i--) {
      const bi = i * n;
      for (let j = i + 1; j < q; j++) {
        const idx = this.hIdx[j], val = this.hVal[j];
        let hk = 0;
        for (let p = 0; p < idx.length; p++) hk += val[p] * b[bi + idx[p]];
        dots[j] = hk;
      }
      for (let j = i + 1; j < q; j++) {
        const hk = dots[j], bj = j * n;
        if (hk !== 0) for (let e = 0; e < n; e++) b[bi + e] -= b[bj + e] * hk;
      }
    }
  }

  /**
   * X <- X − B Wᵀ − W Bᵀ for the n x n matrix at `offset` (see the file's
   * comment), with `rOf(i)` the share's own R of the i-th scalar.
   */
  apply(x: Float64Array, offset: number, rOf: Float64Array): void {
    const { n, q, b, u, w, c } = this;
    // U = X Hᵀ, column a at [a * n, (a + 1) * n).
    for (let a = 0; a < q; a++) {
      const idx = this.hIdx[a], val = this.hVal[a], ua = a * n;
      for (let i = 0; i < n; i++) {
        let s = 0;
        const row = offset + i * n;
        for (let p = 0; p < idx.length; p++) s += x[row + idx[p]] * val[p];
        u[ua + i] = s;
      }
    }
    // C = H U + R_s, upper triangle mirrored.
    for (let a = 0; a < q; a++) {
      const idx = this.hIdx[a], val = this.hVal[a];
      for (let bb = a; bb < q; bb++) {
        let s = 0;
        for (let p = 0; p < idx.length; p++) s += val[p] * u[bb * n + idx[p]];
        if (bb === a) s += rOf[a];
        c[a * q + bb] = s;
        c[bb * q + a] = s;
      }
    }
    // W = U − ½ B C.
    for (let a = 0; a < q; a++) {
      const wa = a * n;
      for (let i = 0; i < n; i++) {
        let s = 0;
        for (let bb = 0; bb < q; bb++) s += b[bb * n + i] * c[bb * q + a];
        w[wa + i] = u[wa + i] - 0.5 * s;
      }
    }
    if (q === 1) {
      for (let i = 0; i < n; i++) {
        const bi = b[i], wi = w[i], row = offset + i * n;
        for (let j = i; j < n; j++) {
          const v = x[row + j] - (bi * w[j] + wi * b[j]);
          x[row + j] = v;
          x[offset + j * n + i] = v;
        }
      }
      return;
    }
    for (let i = 0; i < n; i++) {
      const row = offset + i * n;
      for (let j = i; j < n; j++) {
        let s = 0;
        for (let a = 0, e = 0; a < q; a++, e += n) s += b[e + i] * w[e + j] + w[e + i] * b[e + j];
        const v = x[row + j] - s;
        x[row + j] = v;
        x[offset + j * n + i] = v;
      }
    }
  }

  private grow(columns: number): void {
    const n = this.n;
    const b = new Float64Array(columns * n);
    b.set(this.b.subarray(0, this.q * n));
    this.b = b;
    this.u = new Float64Array(columns * n);
    this.w = new Float64Array(columns * n);
    this.c = new Float64Array(columns * columns);
    this.dots = new Float64Array(columns);
  }
}
