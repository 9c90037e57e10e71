/**
 * Axis ticks for the preview's charts. Expectations are worked by hand from the rule the module
 * states: steps of 1, 2 or 5 times a power of ten, about five of them, covering the data.
 */
import { describe, expect, it } from 'vitest';
import { automaticExtent, axisTicks, extent, hasZeroLine, linearScale, niceTicks, tickLabel } from '../../../src/preview/ui/chartScale';

describe('niceTicks', () => {
  it.each([
    [12, 24, [10, 15, 20, 25]],
    [16.4, 23.7, [16, 18, 20, 22, 24]],
    [-0.8, 1.3, [-1, -0.5, 0, 0.5, 1, 1.5]],
    [0.0012, 0.0049, [0.001, 0.002, 0.003, 0.004, 0.005]],
    [0, 100, [0, 20, 40, 60, 80, 100]],
  ])('covers %s to %s with %j', (lo, hi, values) => {
    expect(niceTicks(lo, hi).values).toEqual(values);
  });

  it('gives a single value and no data an axis of their own', () => {
    expect(niceTicks(5, 5)).toMatchObject({ min: 4.4, max: 5.6, step: 0.2 });
    expect(niceTicks(0, 0)).toMatchObject({ min: -1, max: 1 });
    expect(niceTicks(Infinity, -Infinity)).toMatchObject({ min: 0, max: 1 });
  });

  it('always reaches past the data on both sides', () => {
    for (const [lo, hi] of [
      [3.3, 97.1],
      [-41, -2],
      [1e6, 1.7e6],
      [0.31, 0.32],
    ]) {
      const t = niceTicks(lo, hi);
      expect(t.min).toBeLessThanOrEqual(lo);
      expect(t.max).toBeGreaterThanOrEqual(hi);
      expect(t.values.length).toBeGreaterThanOrEqual(3);
      expect(t.values.length).toBeLessThanOrEqual(11);
    }
  });
});

describe('labels, scale and zero line', () => {
  it('labels with the decimals the step needs and shows zero without a sign', () => {
    expect(tickLabel(0.5, 0.5)).toBe('0.5');
    expect(tickLabel(20, 2)).toBe('20');
    expect(tickLabel(0.003, 0.001)).toBe('0.003');
    expect(tickLabel(-1e-17, 0.5)).toBe('0.0');
  });

  it('maps the domain onto pixels, downwards for a Y axis', () => {
    const y = linearScale(0, 10, 200, 0);
    expect(y(0)).toBe(200);
    expect(y(10)).toBe(0);
    expect(y(2.5)).toBe(150);
  });

  it('draws a zero line only when the axis reaches zero', () => {
    expect(hasZeroLine(niceTicks(-0.8, 1.3))).toBe(true);
    expect(hasZeroLine(niceTicks(16.4, 23.7))).toBe(false);
  });

  it('finds the extent of many values', () => {
    expect(extent(Array.from({ length: 200_000 }, (_, i) => i - 7))).toEqual([-7, 199_992]);
    expect(extent([])).toEqual([Infinity, -Infinity]);
  });
});

// Excel's automatic scale: Microsoft's knowledge-base article "How Chart Axis Limits Are
// Determined", as restated by Peltier, "How Excel Calculates Automatic Chart Axis Limits" (2012):
// with every value above zero the axis starts at 0 unless the lowest is at least 5/6 of the highest.
describe('automaticExtent', () => {
  it.each([
    [40, 60, [0, 60]],
    [50, 60, [50, 60]],
    [-60, -40, [-60, 0]],
    [-60, -50, [-60, -50]],
    [-3, 4, [-3, 4]],
  ])('takes %s to %s to %j', (lo, hi, expected) => {
    expect(automaticExtent(lo, hi)).toEqual(expected);
  });
});

describe('axisTicks', () => {
  it('stretches an automatic axis of values far from zero down to 0, as Excel does', () => {
    expect(axisTicks({ minimum: null, maximum: null }, 40, 60)).toMatchObject({ min: 0, max: 60 });
  });

  // From memory: Excel counts major units from a fixed minimum.
  it('ends a fixed axis exactly at its bounds, with ticks counted from the minimum', () => {
    expect(axisTicks({ minimum: 35, maximum: 65 }, 40, 60)).toEqual({ min: 35, max: 65, step: 10, values: [35, 45, 55, 65] });
    // Step 5: about five ticks over 38.5 to 60.
    expect(axisTicks({ minimum: 38.5, maximum: null }, 40, 60)).toMatchObject({ min: 38.5, max: 60, values: [38.5, 43.5, 48.5, 53.5, 58.5] });
  });
});
