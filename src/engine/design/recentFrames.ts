/**
 * The frames of the latest all-numeric reads of a host's ranges, each under what besides the
 * cells decides it (the ranges' shape, the names, the first row's number, the intercept). A read
 * of ranges like these compares its cells with that frame's numbers as it goes and, when every
 * cell agrees, gives back the frame itself: equal ranges read again (every formula of a report
 * reads the same ranges) build nothing, and the fit cache finds their fit by the data object.
 */
import { LruCache } from '../cache/lruCache';
import type { ModelFrame } from './modelFrame';
import type { NumericCells } from './numericCells';

export interface RecentFrame {
  cells: NumericCells;
  frame: ModelFrame;
}

/** Enough for the distinct reads of a few reports; bytes count the packed numbers and the arrays built from them. */
const MAX_FRAMES = 8;
const MAX_BYTES = 64 * 1024 * 1024;

const recent = new LruCache<string, RecentFrame>(MAX_FRAMES, MAX_BYTES);

export function recentFrame(signature: string): RecentFrame | undefined {
  return recent.get(signature);
}

export function rememberFrame(signature: string, read: RecentFrame): void {
  const { y, x, weights } = read.cells;
  const numbers = y.length + x.length + (weights?.length ?? 0);
  // Packed, then again as plain arrays once a stage builds them, with about 64 bytes a row's array.
  recent.set(signature, read, 16 * numbers + 64 * y.length);
}
