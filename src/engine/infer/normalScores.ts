import { normalQuantile } from '../distributions';
import type { ResidualDiagnostics } from './influence';

export interface NormalScorePoint {
  /** The standard normal quantile at this rank's plotting position. */
  normalQuantile: number;
  studentized: number;
  /** Index into the diagnostics' rows. */
  rowIndex: number;
}

/**
 * Points of a normal Q–Q plot of the studentized residuals: the sorted residuals against the
 * normal quantiles at Blom's (1958) plotting positions (i − 3/8)/(m + 1/4). Rows whose studentized
 * residual is undefined are left out, so m may be less than n.
 */
export function normalScores(diagnostics: ResidualDiagnostics): NormalScorePoint[] {
  const points = diagnostics.rows
    .map((row, rowIndex) => ({ studentized: row.studentized, rowIndex }))
    .filter((p) => Number.isFinite(p.studentized))
    .sort((a, b) => a.studentized - b.studentized);
  const m = points.length;
  return points.map((p, i) => ({ ...p, normalQuantile: normalQuantile((i + 1 - 0.375) / (m + 0.25)) }));
}
