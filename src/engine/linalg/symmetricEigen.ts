/**
 * Eigenvalues of a dense real symmetric matrix: Householder reduction to tridiagonal form, then
 * the implicit QL iteration with Wilkinson's shift on the tridiagonal (Bowdler, Martin, Reinsch &
 * Wilkinson, "The QR and QL algorithms for symmetric matrices", Numer. Math. 11, 1968, procedure
 * tql1; Golub & Van Loan, Matrix Computations, §8.3). Both steps are orthogonal similarity
 * transformations, so every eigenvalue is found to within a small multiple of ε·‖A‖₂, whatever
 * the spread of the eigenvalues. Cost: (4/3)m³ for the reduction and O(m²) for the iteration.
 */

/** QL iterations allowed for one eigenvalue; two or three are typical, 30 never happens in practice. */
const MAX_ITERATIONS = 30;

/** `a` row-major m×m and symmetric (only its lower triangle is read); returns its eigenvalues, smallest first. */
export function symmetricEigenvalues(a: Float64Array, m: number): Float64Array {
  const { diagonal, offDiagonal } = tridiagonalize(a, m);
  return tridiagonalEigenvalues(diagonal, offDiagonal);
}

export interface Tridiagonal {
  diagonal: Float64Array;
  /** offDiagonal[i] couples rows i and i + 1; length m − 1. */
  offDiagonal: Float64Array;
}

/**
 * QᵀAQ = T by m − 2 reflectors H = I − τvvᵀ, each zeroing one column below the subdiagonal. The
 * trailing block is updated as A − vwᵀ − wvᵀ with w = τAv − (τ²/2)(vᵀAv)v, which keeps it
 * symmetric; only the lower triangle is stored and touched.
 */
export function tridiagonalize(input: Float64Array, m: number): Tridiagonal {
  const a = Float64Array.from(input);
  const v = new Float64Array(m);
  const w = new Float64Array(m);
  const diagonal = new Float64Array(m);
  const offDiagonal = new Float64Array(Math.max(0, m - 1));
  for (let k = 0; k < m - 2; k++) {
    // Column k below the diagonal: rows k+1..m−1.
    let scale = 0;
    for (let i = k + 1; i < m; i++) scale = Math.max(scale, Math.abs(a[i * m + k]));
    if (scale === 0) {
      offDiagonal[k] = 0;
      continue;
    }
    let norm2 = 0;
    for (let i = k + 1; i < m; i++) {
      v[i] = a[i * m + k] / scale;
      norm2 += v[i] * v[i];
    }
    const alpha = v[k + 1];
    const beta = alpha >= 0 ? -Math.sqrt(norm2) : Math.sqrt(norm2);
    // v = x − βe₁ (scaled), τ = 2/‖v‖² written as (β − α)/β after normalising v₁ = 1.
    const tau = (beta - alpha) / beta;
    const inv = 1 / (alpha - beta);
    v[k + 1] = 1;
    for (let i = k + 2; i < m; i++) v[i] *= inv;
    offDiagonal[k] = beta * scale;

    // w = τ·A₂₂v over the trailing block (rows and columns k+1..m−1), from the lower triangle.
    for (let i = k + 1; i < m; i++) w[i] = 0;
    for (let i = k + 1; i < m; i++) {
      const row = i * m;
      let sum = a[row + i] * v[i];
      for (let j = k + 1; j < i; j++) {
        sum += a[row + j] * v[j];
        w[j] += a[row + j] * v[i];
      }
      w[i] += sum;
    }
    let vw = 0;
    for (let i = k + 1; i < m; i++) {
      w[i] *= tau;
      vw += v[i] * w[i];
    }
    const half = 0.5 * tau * vw;
    for (let i = k + 1; i < m; i++) w[i] -= half * v[i];
    for (let i = k + 1; i < m; i++) {
      const row = i * m;
      for (let j = k + 1; j <= i; j++) a[row + j] -= v[i] * w[j] + w[i] * v[j];
    }
  }
  for (let i = 0; i < m; i++) diagonal[i] = a[i * m + i];
  if (m >= 2) offDiagonal[m - 2] = a[(m - 1) * m + (m - 2)];
  return { diagonal, offDiagonal };
}

/**
 * Eigenvalues of the symmetric tridiagonal matrix by implicit QL with Wilkinson's shift. An
 * off-diagonal entry is neglected once it is below ε times its two diagonal neighbours, which
 * splits the matrix; each block's top eigenvalue is then chased out by plane rotations.
 */
export function tridiagonalEigenvalues(diagonalIn: Float64Array, offDiagonalIn: Float64Array): Float64Array {
  const m = diagonalIn.length;
  const d = Float64Array.from(diagonalIn);
  // e[i] couples i and i + 1; e[m − 1] = 0 closes the last block.
  const e = new Float64Array(m);
  e.set(offDiagonalIn.subarray(0, Math.max(0, m - 1)));
  for (let l = 0; l < m; l++) {
    for (let iteration = 0; ; iteration++) {
      let end = l;
      while (end < m - 1 && Math.abs(e[end]) > Number.EPSILON * (Math.abs(d[end]) + Math.abs(d[end + 1]))) end++;
      if (end === l) break;
      if (iteration === MAX_ITERATIONS) throw new Error('tridiagonal QL did not converge');
      // Wilkinson's shift: the eigenvalue of the leading 2×2 closer to d[l].
      let g = (d[l + 1] - d[l]) / (2 * e[l]);
      let r = Math.hypot(g, 1);
      g = d[end] - d[l] + e[l] / (g + (g >= 0 ? r : -r));
      let s = 1;
      let c = 1;
      let p = 0;
      let i = end - 1;
      for (; i >= l; i--) {
        const f = s * e[i];
        const b = c * e[i];
        r = Math.hypot(f, g);
        e[i + 1] = r;
        if (r === 0) {
          // The rotation would divide by 0: the matrix has split at i; undo the shift and restart.
          d[i + 1] -= p;
          e[end] = 0;
          break;
        }
        s = f / r;
        c = g / r;
        g = d[i + 1] - p;
        r = (d[i] - g) * s + 2 * c * b;
        p = s * r;
        d[i + 1] = g + p;
        g = c * r - b;
      }
      if (i >= l) continue;
      d[l] -= p;
      e[l] = g;
      e[end] = 0;
    }
  }
  return d.sort();
}
