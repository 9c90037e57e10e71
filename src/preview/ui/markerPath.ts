/**
 * Every marker of a scatter series as one SVG path: a zero-length subpath stroked with round caps
 * draws a dot as wide as the stroke (SVG 1.1, "Painting", stroke-linecap on zero-length subpaths;
 * from memory), so a series of 12,500 points is one element to update after a recalculation
 * instead of 12,500.
 */
import type { PlottedPoint } from '../workbook/chartData';

export function markerPath(points: readonly PlottedPoint[], x: (value: number) => number, y: (value: number) => number): string {
  const parts: string[] = [];
  for (const p of points) parts.push(`M${x(p.x)} ${y(p.y)}h0`);
  return parts.join('');
}

/** The marker centres a path of markerPath's holds, in order: for reading a drawn chart back. */
export function markerCentres(path: string): { cx: number; cy: number }[] {
  return [...path.matchAll(/M(\S+) (\S+?)h0/g)].map((m) => ({ cx: Number(m[1]), cy: Number(m[2]) }));
}
