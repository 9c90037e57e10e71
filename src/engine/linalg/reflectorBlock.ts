import { ROW_TILE } from './rowTiles';

/** Reflectors gathered before they are applied together: 4 keeps W and T in registers' reach. */
export const BLOCK_SIZE = 4;

/**
 * Up to BLOCK_SIZE Householder reflectors H_a = I − τ_a v_a v_aᵀ in compact WY form,
 * H₁H₂⋯H_s = I − V·T·Vᵀ with T upper triangular (Schreiber & Van Loan 1989, "A storage-efficient
 * WY representation for products of Householder transformations"; LAPACK's dlarft, forward and
 * column-wise). Applying the block costs two sweeps over the target columns, one for W = VᵀC and
 * one for C −= V·(TᵀW), instead of two per reflector: on a million rows, where no column stays in
 * cache, that is what bounds the factorization.
 *
 * Each v_a is a column of `data` starting at offsets[a], zero above its row ks[a] and 1 there.
 *
 * One instance serves every factorization (attach, then detach). With a block made per fit, V8
 * dropped the optimized code of these methods at each full garbage collection that found no
 * instance alive (the instances' hidden class died with them), so the next fit ran its kernels
 * unoptimized until they were compiled again: 6 ms became 30–60 ms at 12,500 × 20 (seen here with
 * node --trace-opt, Node 20).
 */
export class ReflectorBlock {
  size = 0;
  readonly offsets = new Int32Array(BLOCK_SIZE);
  readonly ks = new Int32Array(BLOCK_SIZE);
  /** Row-major BLOCK_SIZE × BLOCK_SIZE. */
  readonly t = new Float64Array(BLOCK_SIZE * BLOCK_SIZE);
  /** v_aᵀx over rows > k of the column `prepareColumn` last handled. */
  private readonly columnDots = new Float64Array(BLOCK_SIZE);

  private data: Float64Array = new Float64Array(0);
  private rows = 0;

  /** Starts a factorization of the column-major `data` with `rows` rows, with no reflectors held. */
  attach(data: Float64Array, rows: number): this {
    this.data = data;
    this.rows = rows;
    this.clear();
    return this;
  }

  /** Lets go of the factorization's storage, so a finished fit's matrix is not kept alive here. */
  detach(): void {
    this.data = new Float64Array(0);
    this.rows = 0;
    this.clear();
  }

  /**
   * Adds H = I − τvvᵀ after the reflectors already held. v is at `offset`, from row k, made from
   * the column `prepareColumn` last brought up to date as v = x·inverse below row k (1 at k), so
   * Vᵀv for T's new column comes from the products gathered there, without another sweep.
   */
  add(offset: number, k: number, tau: number, inverse: number): void {
    const s = this.size;
    const { data, t, offsets, columnDots } = this;
    const dots = new Float64Array(s);
    for (let a = 0; a < s; a++) dots[a] = data[offsets[a] + k] + inverse * columnDots[a];
    // T's new column: −τ·T·(Vᵀv).
    for (let a = 0; a < s; a++) {
      let sum = 0;
      for (let b = a; b < s; b++) sum += t[a * BLOCK_SIZE + b] * dots[b];
      t[a * BLOCK_SIZE + s] = -tau * sum;
    }
    t[s * BLOCK_SIZE + s] = tau;
    offsets[s] = offset;
    this.ks[s] = k;
    this.size = s + 1;
  }

  /**
   * Applies the reflectors held to one column (the left-looking step) and returns the sum of
   * squares of its rows ≥ k, gathering on the same sweep v_aᵀx over rows > k for `add`: each tile
   * is updated and then summed while it is still in cache.
   */
  prepareColumn(column: number, k: number): number {
    const s = this.size;
    if (s === 0) return sumOfSquares(this.data, column * this.rows + k, column * this.rows + this.rows);
    if (s >= BLOCK_SIZE) throw new Error('a full block is applied before the next column is prepared');
    const { data, rows, t, offsets, columnDots } = this;
    const base = column * rows;
    // Up to three reflectors are pending here (a fourth completes the block, which is then applied
    // whole), taken together in each sweep. An absent one reads reflector 0 in the products, which
    // are then left unused, and is skipped in the update, so every number is what one sweep per
    // reflector gives.
    const v0 = offsets[0];
    const v1 = s > 1 ? offsets[1] : v0;
    const v2 = s > 2 ? offsets[2] : v0;
    const start = this.ks[0];
    let y0 = 0;
    let y1 = 0;
    let y2 = 0;
    for (let from = start; from < rows; from += ROW_TILE) {
      const to = Math.min(rows, from + ROW_TILE);
      let d0 = 0;
      let d1 = 0;
      let d2 = 0;
      for (let i = from; i < to; i++) {
        const x = data[base + i];
        d0 += data[v0 + i] * x;
        d1 += data[v1 + i] * x;
        d2 += data[v2 + i] * x;
      }
      y0 += d0;
      y1 += d1;
      y2 += d2;
    }
    // Y = Tᵀy, from the last entry up; entries past s stay 0.
    const y = [y0, y1, y2];
    for (let a = s - 1; a >= 0; a--) {
      let sum = 0;
      for (let b = 0; b <= a; b++) sum += t[b * BLOCK_SIZE + a] * y[b];
      y[a] = sum;
    }
    const w0 = y[0];
    const w1 = s > 1 ? y[1] : 0;
    const w2 = s > 2 ? y[2] : 0;
    let squares = 0;
    let c0 = 0;
    let c1 = 0;
    let c2 = 0;
    for (let from = start; from < rows; from += ROW_TILE) {
      const to = Math.min(rows, from + ROW_TILE);
      let e0 = 0;
      let e1 = 0;
      let e2 = 0;
      // Rows up to k are brought up to date only (k's own square counts); past k they also feed v_aᵀx.
      const head = Math.min(to, Math.max(from, k + 1));
      for (let i = from; i < head; i++) {
        let x = data[base + i];
        x -= data[v0 + i] * w0;
        if (s > 1) x -= data[v1 + i] * w1;
        if (s > 2) x -= data[v2 + i] * w2;
        data[base + i] = x;
        if (i >= k) squares += x * x;
      }
      for (let i = head; i < to; i++) {
        let x = data[base + i];
        x -= data[v0 + i] * w0;
        if (s > 1) x -= data[v1 + i] * w1;
        if (s > 2) x -= data[v2 + i] * w2;
        data[base + i] = x;
        squares += x * x;
        e0 += data[v0 + i] * x;
        e1 += data[v1 + i] * x;
        e2 += data[v2 + i] * x;
      }
      c0 += e0;
      c1 += e1;
      c2 += e2;
    }
    columnDots.fill(0);
    columnDots[0] = c0;
    if (s > 1) columnDots[1] = c1;
    if (s > 2) columnDots[2] = c2;
    return squares;
  }

  clear(): void {
    this.size = 0;
    this.t.fill(0);
  }

  /**
   * Columns first … first+count−1 of `data` ← H_s⋯H₁·C = (I − V·Tᵀ·Vᵀ)·C, the reflectors taken in
   * the order they were added. Rows above the first reflector's k are untouched (every v is zero there).
   */
  applyTo(first: number, count: number): void {
    const s = this.size;
    if (s === 0 || count <= 0) return;
    const { data, rows, t, offsets } = this;
    const start = this.ks[0];
    const w = new Float64Array(s * count);
    for (let from = start; from < rows; from += ROW_TILE) {
      const to = Math.min(rows, from + ROW_TILE);
      let c = 0;
      // Two columns per sweep when the block is full: each v entry loaded serves eight multiply-adds.
      if (s === BLOCK_SIZE) {
        const v0 = offsets[0];
        const v1 = offsets[1];
        const v2 = offsets[2];
        const v3 = offsets[3];
        for (; c + 1 < count; c += 2) {
          const base = (first + c) * rows;
          const next = base + rows;
          let s0 = 0;
          let s1 = 0;
          let s2 = 0;
          let s3 = 0;
          let u0 = 0;
          let u1 = 0;
          let u2 = 0;
          let u3 = 0;
          for (let i = from; i < to; i++) {
            const x = data[base + i];
            const z = data[next + i];
            const a0 = data[v0 + i];
            const a1 = data[v1 + i];
            const a2 = data[v2 + i];
            const a3 = data[v3 + i];
            s0 += a0 * x;
            s1 += a1 * x;
            s2 += a2 * x;
            s3 += a3 * x;
            u0 += a0 * z;
            u1 += a1 * z;
            u2 += a2 * z;
            u3 += a3 * z;
          }
          w[c] += s0;
          w[count + c] += s1;
          w[2 * count + c] += s2;
          w[3 * count + c] += s3;
          w[c + 1] += u0;
          w[count + c + 1] += u1;
          w[2 * count + c + 1] += u2;
          w[3 * count + c + 1] += u3;
        }
      }
      for (; c < count; c++) {
        const base = (first + c) * rows;
        for (let a = 0; a < s; a++) {
          const va = offsets[a];
          let dot = 0;
          for (let i = from; i < to; i++) dot += data[va + i] * data[base + i];
          w[a * count + c] += dot;
        }
      }
    }
    // Y = TᵀW, in place from the last row up (row a of Y needs rows ≤ a of W).
    for (let a = s - 1; a >= 0; a--) {
      for (let c = 0; c < count; c++) {
        let sum = 0;
        for (let b = 0; b <= a; b++) sum += t[b * BLOCK_SIZE + a] * w[b * count + c];
        w[a * count + c] = sum;
      }
    }
    for (let from = start; from < rows; from += ROW_TILE) {
      const to = Math.min(rows, from + ROW_TILE);
      let c = 0;
      if (s === BLOCK_SIZE) {
        const v0 = offsets[0];
        const v1 = offsets[1];
        const v2 = offsets[2];
        const v3 = offsets[3];
        for (; c + 1 < count; c += 2) {
          const base = (first + c) * rows;
          const next = base + rows;
          const y0 = w[c];
          const y1 = w[count + c];
          const y2 = w[2 * count + c];
          const y3 = w[3 * count + c];
          const z0 = w[c + 1];
          const z1 = w[count + c + 1];
          const z2 = w[2 * count + c + 1];
          const z3 = w[3 * count + c + 1];
          for (let i = from; i < to; i++) {
            const a0 = data[v0 + i];
            const a1 = data[v1 + i];
            const a2 = data[v2 + i];
            const a3 = data[v3 + i];
            data[base + i] -= a0 * y0 + a1 * y1 + a2 * y2 + a3 * y3;
            data[next + i] -= a0 * z0 + a1 * z1 + a2 * z2 + a3 * z3;
          }
        }
      }
      for (; c < count; c++) {
        const base = (first + c) * rows;
        for (let a = 0; a < s; a++) {
          const va = offsets[a];
          const y = w[a * count + c];
          for (let i = from; i < to; i++) data[base + i] -= data[va + i] * y;
        }
      }
    }
  }
}

function sumOfSquares(data: Float64Array, from: number, to: number): number {
  let sum = 0;
  for (let i = from; i < to; i++) sum += data[i] * data[i];
  return sum;
}
