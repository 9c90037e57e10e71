import { normalQuantile } from '../distributions';
import { ascendingOrder, ascendingOrderFrom } from './ascendingOrder';
import type { ResidualDiagnostics } from './influence';

/** The points of a normal Q–Q plot, sorted by studentized residual, one entry per point in each array. */
export interface NormalScores {
  /** The standard normal quantile at each rank's plotting position. */
  normalQuantile: Float64Array;
  studentized: Float64Array;
  /** Index into the diagnostics' rows. */
  rowIndex: Int32Array;
}

/**
 * Points of a normal Q–Q plot of the studentized residuals: the sorted residuals against the
 * normal quantiles at Blom's (1958) plotting positions (i − 3/8)/(m + 1/4). Rows whose studentized
 * residual is undefined are left out, so m may be less than n. Equal residuals keep their rows' order.
 */
export function normalScores(diagnostics: ResidualDiagnostics): NormalScores {
  const all = diagnostics.studentized;
  let defined = 0;
  for (let i = 0; i < all.length; i++) if (Number.isFinite(all[i])) defined++;
  const rows = new Int32Array(defined);
  for (let i = 0, k = 0; i < all.length; i++) if (Number.isFinite(all[i])) rows[k++] = i;
  // Usually every row is a point, and the residuals are sorted where they are.
  const values = defined === all.length ? all : new Float64Array(defined);
  if (values !== all) for (let k = 0; k < defined; k++) values[k] = all[rows[k]];
  const rank = lastRank === undefined ? ascendingOrder(values) : ascendingOrderFrom(values, lastRank);
  lastRank = rank;
  const studentized = new Float64Array(defined);
  const rowIndex = new Int32Array(defined);
  for (let k = 0; k < defined; k++) {
    studentized[k] = values[rank[k]];
    rowIndex[k] = rows[rank[k]];
  }
  return { normalQuantile: blomQuantiles(defined), studentized, rowIndex };
}

/**
 * The last sort's order: after an edit of the data the residuals of the next fit are mostly in the
 * same order, so it is a near-sorted start (ascendingOrderFrom). Not to be written into.
 */
let lastRank: Int32Array | undefined;

/** The last m asked for and its quantiles: every QQPOINTS of a range of the same size reads the same ones. */
let lastQuantiles: { m: number; quantiles: Float64Array } | undefined;

/** Forgets the last order and quantiles: for timing QQPOINTS cold, and to free their memory. */
export function resetNormalScores(): void {
  lastRank = undefined;
  lastQuantiles = undefined;
}

/**
 * Φ⁻¹((i − 3/8)/(m + 1/4)) for i = 1 … m. The positions are symmetric about ½, so the upper half is
 * the lower half negated: the quantile of 1 − p is −Φ⁻¹(p), here without the rounding of 1 − p.
 */
function blomQuantiles(m: number): Float64Array {
  if (lastQuantiles?.m === m) return lastQuantiles.quantiles;
  const quantiles = new Float64Array(m);
  for (let i = 0; i < Math.ceil(m / 2); i++) {
    const q = normalQuantile((i + 1 - 0.375) / (m + 0.25));
    quantiles[i] = q;
    quantiles[m - 1 - i] = -q;
  }
  // An odd m's middle position is exactly ½.
  if (m % 2 === 1) quantiles[(m - 1) / 2] = 0;
  lastQuantiles = { m, quantiles };
  return quantiles;
}
