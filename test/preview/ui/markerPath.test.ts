/**
 * Scatter markers drawn as one path: each point becomes a zero-length subpath at its pixel centre,
 * read back in order (common practice (no source): the expectations are worked by hand).
 */
import { describe, expect, it } from 'vitest';
import { markerCentres, markerPath } from '../../../src/preview/ui/markerPath';

describe('marker path', () => {
  it('draws one dot per point at its scaled centre, and reads the centres back', () => {
    const path = markerPath(
      [
        { x: 1, y: 2 },
        { x: 3, y: -0.5 },
      ],
      (v) => 10 * v,
      (v) => 100 - v,
    );
    expect(path).toBe('M10 98h0M30 100.5h0');
    expect(markerCentres(path)).toEqual([
      { cx: 10, cy: 98 },
      { cx: 30, cy: 100.5 },
    ]);
  });

  it('draws nothing for no points', () => {
    expect(
      markerPath(
        [],
        (v) => v,
        (v) => v,
      ),
    ).toBe('');
    expect(markerCentres('')).toEqual([]);
  });
});
