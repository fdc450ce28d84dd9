// An explicit dense basis inverse for the small master LPs of column generation (a few hundred rows).
// Product-form updates after each pivot, with a fresh Gauss-Jordan inversion now and then so
// rounding errors cannot pile up.

/** A sparse column: parallel arrays of row indexes and values. */
export interface SparseColumn {
  rows: ArrayLike<number>;
  vals: ArrayLike<number>;
}

export class DenseBasis {
  readonly m: number;
  inv: Float64Array;
  private readonly nz: Int32Array;

  constructor(m: number) {
    this.m = m;
    this.inv = new Float64Array(m * m);
    this.nz = new Int32Array(m);
    for (let i = 0; i < m; i++) this.inv[i * m + i] = 1;
  }

  /** B⁻¹ a */
  solve(col: SparseColumn, out: Float64Array): void {
    const { m, inv } = this;
    out.fill(0);
    for (let t = 0; t < col.rows.length; t++) {
      const r = col.rows[t];
      const v = col.vals[t];
      for (let k = 0; k < m; k++) out[k] += inv[k * m + r] * v;
    }
  }

  /** yᵀ = c_Bᵀ B⁻¹ */
  duals(costB: Float64Array, out: Float64Array): void {
    const { m, inv } = this;
    out.fill(0);
    for (let k = 0; k < m; k++) {
      const c = costB[k];
      if (c === 0) continue;
      const base = k * m;
      for (let r = 0; r < m; r++) out[r] += c * inv[base + r];
    }
  }

  /** Replaces basis position `p` given d = B⁻¹ a of the entering column. */
  pivot(p: number, d: Float64Array): void {
    const { m, inv } = this;
    const piv = d[p];
    const prow = p * m;
    // Rows of B⁻¹ stay sparse for pattern bases: update only where the pivot row is non-zero.
    const nz = this.nz;
    let count = 0;
    for (let r = 0; r < m; r++) {
      if (inv[prow + r] === 0) continue;
      inv[prow + r] /= piv;
      nz[count++] = r;
    }
    for (let k = 0; k < m; k++) {
      if (k === p) continue;
      const f = d[k];
      if (f === 0) continue;
      const base = k * m;
      for (let t = 0; t < count; t++) {
        const r = nz[t];
        inv[base + r] -= f * inv[prow + r];
      }
    }
  }

  /** Recomputes B⁻¹ from the basis columns; returns false when the basis is singular. */
  refactor(columns: SparseColumn[]): boolean {
    const { m } = this;
    const a = new Float64Array(m * m);
    for (let k = 0; k < m; k++) {
      const c = columns[k];
      for (let t = 0; t < c.rows.length; t++) a[c.rows[t] * m + k] = c.vals[t];
    }
    const inv = new Float64Array(m * m);
    for (let i = 0; i < m; i++) inv[i * m + i] = 1;
    for (let col = 0; col < m; col++) {
      let best = col;
      for (let r = col + 1; r < m; r++) if (Math.abs(a[r * m + col]) > Math.abs(a[best * m + col])) best = r;
      if (Math.abs(a[best * m + col]) < 1e-12) return false;
      if (best !== col) {
        swapRows(a, m, best, col);
        swapRows(inv, m, best, col);
      }
      const piv = a[col * m + col];
      for (let c = 0; c < m; c++) {
        a[col * m + c] /= piv;
        inv[col * m + c] /= piv;
      }
      for (let r = 0; r < m; r++) {
        if (r === col) continue;
        const f = a[r * m + col];
        if (f === 0) continue;
        for (let c = 0; c < m; c++) {
          a[r * m + c] -= f * a[col * m + c];
          inv[r * m + c] -= f * inv[col * m + c];
        }
      }
    }
    this.inv = inv;
    return true;
  }
}

function swapRows(a: Float64Array, m: number, i: number, j: number): void {
  for (let c = 0; c < m; c++) {
    const t = a[i * m + c];
    a[i * m + c] = a[j * m + c];
    a[j * m + c] = t;
  }
}
