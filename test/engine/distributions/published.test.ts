import { describe, expect, it } from 'vitest';
import { fisherFQuantile, normalQuantile, normalUpperTail, studentTQuantile } from '../../../src/engine/distributions';

// Every value below is a printed table entry from the NIST/SEMATECH e-Handbook of Statistical
// Methods, recalled from memory (marked in each block); they are compared at the printed number of
// decimals, so a wrong digit in our code shows up as a failure.

describe('Student t critical values: NIST/SEMATECH e-Handbook 1.3.6.7.2 (from memory)', () => {
  // Columns are lower-tail probabilities 0.90, 0.95, 0.975, 0.99, 0.995; printed to 3 decimals.
  const levels = [0.9, 0.95, 0.975, 0.99, 0.995];
  const table: Record<number, number[]> = {
    1: [3.078, 6.314, 12.706, 31.821, 63.657], // NIST 1.3.6.7.2, ν = 1 row, from memory
    2: [1.886, 2.92, 4.303, 6.965, 9.925], // NIST 1.3.6.7.2, ν = 2 row, from memory
    3: [1.638, 2.353, 3.182, 4.541, 5.841], // NIST 1.3.6.7.2, ν = 3 row, from memory
    5: [1.476, 2.015, 2.571, 3.365, 4.032], // NIST 1.3.6.7.2, ν = 5 row, from memory
    10: [1.372, 1.812, 2.228, 2.764, 3.169], // NIST 1.3.6.7.2, ν = 10 row, from memory
    20: [1.325, 1.725, 2.086, 2.528, 2.845], // NIST 1.3.6.7.2, ν = 20 row, from memory
    30: [1.31, 1.697, 2.042, 2.457, 2.75], // NIST 1.3.6.7.2, ν = 30 row, from memory
    100: [1.29, 1.66, 1.984, 2.364, 2.626], // NIST 1.3.6.7.2, ν = 100 row, from memory
  };
  for (const [df, row] of Object.entries(table)) {
    it(`ν = ${df}`, () => {
      row.forEach((printed, i) => {
        expect(studentTQuantile(levels[i]!, Number(df))).toBeCloseTo(printed, 3);
        // The table is for upper critical values; the lower tail must mirror it exactly.
        expect(studentTQuantile(1 - levels[i]!, Number(df))).toBeCloseTo(-printed, 3);
      });
    });
  }
});

describe('F upper critical values: NIST/SEMATECH e-Handbook 1.3.6.7.3 (from memory)', () => {
  const cases: Array<[level: number, df1: number, df2: number, printed: number]> = [
    [0.95, 1, 10, 4.965], // NIST 1.3.6.7.3, 5 % table, from memory
    [0.95, 3, 20, 3.098], // NIST 1.3.6.7.3, 5 % table, from memory
    [0.95, 5, 10, 3.326], // NIST 1.3.6.7.3, 5 % table, from memory
    [0.95, 2, 10, 4.103], // NIST 1.3.6.7.3, 5 % table, from memory
    [0.95, 1, 1, 161.448], // NIST 1.3.6.7.3, 5 % table, from memory
    [0.95, 10, 10, 2.978], // NIST 1.3.6.7.3, 5 % table, from memory
    [0.95, 4, 30, 2.69], // NIST 1.3.6.7.3, 5 % table, from memory
    [0.99, 5, 10, 5.636], // NIST 1.3.6.7.3, 1 % table, from memory
    [0.99, 1, 10, 10.044], // NIST 1.3.6.7.3, 1 % table, from memory
    [0.99, 3, 20, 4.938], // NIST 1.3.6.7.3, 1 % table, from memory
    [0.99, 1, 1, 4052.181], // NIST 1.3.6.7.3, 1 % table, from memory
    [0.99, 2, 10, 7.559], // NIST 1.3.6.7.3, 1 % table, from memory
    [0.99, 10, 10, 4.849], // NIST 1.3.6.7.3, 1 % table, from memory
    [0.9, 1, 10, 3.285], // NIST 1.3.6.7.3, 10 % table, from memory
    [0.9, 3, 20, 2.38], // NIST 1.3.6.7.3, 10 % table, from memory
  ];
  for (const [level, df1, df2, printed] of cases) {
    it(`F_${level}(${df1}, ${df2}) = ${printed}`, () => {
      expect(fisherFQuantile(level, df1, df2)).toBeCloseTo(printed, 3);
    });
  }
});

describe('standard normal: NIST/SEMATECH e-Handbook 1.3.6.7.1 (from memory)', () => {
  it('area between 0 and z, printed to 5 decimals', () => {
    // Table entries Φ(z) − ½ for z = 0.5, 1, 1.96, 2, 3 (NIST 1.3.6.7.1, from memory).
    const rows: Array<[number, number]> = [
      [0.5, 0.19146],
      [1.0, 0.34134],
      [1.96, 0.475],
      [2.0, 0.47725],
      [3.0, 0.49865],
    ];
    for (const [z, area] of rows) expect(0.5 - normalUpperTail(z)).toBeCloseTo(area, 5);
  });

  it('two-sided critical values', () => {
    expect(normalQuantile(0.975)).toBeCloseTo(1.959964, 6); // 1.959964, NIST 1.3.6.7.1 / common tables, from memory
    expect(normalQuantile(0.95)).toBeCloseTo(1.645, 3); // 1.645, NIST t table ∞ row, from memory
    expect(normalQuantile(0.995)).toBeCloseTo(2.576, 3); // 2.576, NIST t table ∞ row, from memory
    expect(normalQuantile(0.999)).toBeCloseTo(3.09, 3); // 3.090, NIST t table ∞ row, from memory
  });

  it('the t quantile with infinite df is the normal one (NIST 1.3.6.7.2 ∞ row, from memory)', () => {
    expect(studentTQuantile(0.975, Number.POSITIVE_INFINITY)).toBeCloseTo(1.96, 3);
    expect(studentTQuantile(0.99, Number.POSITIVE_INFINITY)).toBeCloseTo(2.326, 3);
  });
});
