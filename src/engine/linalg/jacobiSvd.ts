/**
 * Singular values of a small dense matrix by one-sided Jacobi (Hestenes 1958; Demmel & Veselić,
 * "Jacobi's method is more accurate than QR", SIAM J. Matrix Anal. Appl. 13, 1992): plane
 * rotations applied to pairs of columns until every pair is orthogonal to working precision; the
 * singular values are then the column norms. It is meant for the q×q R factor of a QR, so each
 * sweep is O(q³), and it keeps small singular values to high relative accuracy, which a
 * condition number needs.
 */

/** Sweeps after which the iteration is abandoned; convergence is quadratic and takes ~10 in practice. */
const MAX_SWEEPS = 60;

/** `a` row-major rows × cols with rows ≥ cols; returns its cols singular values, largest first. */
export function singularValues(a: Float64Array, rows: number, cols: number): number[] {
  // Column-major copy so that each rotation sweeps two contiguous columns.
  const u = new Float64Array(rows * cols);
  for (let i = 0; i < rows; i++) for (let j = 0; j < cols; j++) u[j * rows + i] = a[i * cols + j];

  for (let sweep = 0; sweep < MAX_SWEEPS; sweep++) {
    let rotated = false;
    for (let p = 0; p < cols - 1; p++) {
      for (let q = p + 1; q < cols; q++) {
        if (rotatePair(u, rows, p, q)) rotated = true;
      }
    }
    if (!rotated) break;
  }

  const values: number[] = [];
  for (let j = 0; j < cols; j++) {
    let s = 0;
    for (let i = 0; i < rows; i++) s += u[j * rows + i] ** 2;
    values.push(Math.sqrt(s));
  }
  return values.sort((x, y) => y - x);
}

/**
 * Rotates columns p and q to make them orthogonal (Rutishauser's formulas, the smaller root of
 * the tangent equation for stability). Returns false when they already are, to working precision
 * relative to their norms, which is the stopping test of the whole iteration.
 */
function rotatePair(u: Float64Array, rows: number, p: number, q: number): boolean {
  let alpha = 0;
  let beta = 0;
  let gamma = 0;
  for (let i = 0; i < rows; i++) {
    const x = u[p * rows + i];
    const y = u[q * rows + i];
    alpha += x * x;
    beta += y * y;
    gamma += x * y;
  }
  if (gamma === 0 || Math.abs(gamma) <= Number.EPSILON * Math.sqrt(alpha * beta)) return false;
  const zeta = (beta - alpha) / (2 * gamma);
  const t = (zeta >= 0 ? 1 : -1) / (Math.abs(zeta) + Math.hypot(1, zeta));
  const c = 1 / Math.hypot(1, t);
  const s = c * t;
  for (let i = 0; i < rows; i++) {
    const x = u[p * rows + i];
    const y = u[q * rows + i];
    u[p * rows + i] = c * x - s * y;
    u[q * rows + i] = s * x + c * y;
  }
  return true;
}
