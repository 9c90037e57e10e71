/**
 * The screens of single rows (src/presentation/thresholds.ts): leverage over 2p/n, a deleted
 * studentized residual beyond ±3, Cook's distance over 4/n (common practice, no source) and CHECKS'
 * unusual rows at Cook's distance above 1 (Cook & Weisberg 1982, from memory). The quantities they
 * read are checked in test/engine/infer; the data here are random, with one planted outlier and one
 * far-out row.
 */
import { describe, expect, it } from 'vitest';
import { assumptionChecks, residualDiagnostics } from '../../src/engine';
import { FLAG_TEXT, highLeverageCount, residualFlags, SCREENS_TEXT, screenCutoffs, unusualRows } from '../../src/presentation';
import { FLAG_TEXTS, flagBitsAt, type ResidualFlag } from '../../src/presentation/thresholds';
import { randomProblem } from '../support/random';

const { y, x } = randomProblem(12, 40, 2);
const planted = [...y];
planted[7] += 8;
const data = { y: planted, x: [...x.slice(0, 39), [6, -6]] };

describe('residual screens', () => {
  it('raises flags exactly past 2p/n, |t| = 3 and 4/n, and the count agrees with the rows', () => {
    const d = residualDiagnostics(data);
    expect(screenCutoffs(d)).toEqual({ leverage: 6 / 40, studentized: 3, cooksDistance: 0.1 });
    for (const row of d.rows) {
      expect(residualFlags(row, d).includes('high-leverage')).toBe(row.leverage > 6 / 40);
      expect(residualFlags(row, d).includes('outlier')).toBe(Math.abs(row.studentized) > 3);
      expect(residualFlags(row, d).includes('influential')).toBe(row.cooksDistance > 0.1);
    }
    expect(residualFlags(d.rows[7], d)).toContain('outlier');
    expect(residualFlags(d.rows[39], d)).toContain('high-leverage');
    expect(highLeverageCount(d)).toBe(d.rows.filter((r) => r.leverage > 6 / 40).length);
    expect(highLeverageCount(assumptionChecks(data))).toBe(highLeverageCount(d));
  });

  it("lists CHECKS' unusual rows: outliers at α and rows of Cook's distance above 1, most extreme first", () => {
    const checks = assumptionChecks(data);
    const unusual = unusualRows(checks);
    expect(unusual.length).toBeGreaterThan(0);
    expect(unusual[0]).toMatchObject({ index: 7, outlier: true });
    for (const u of unusual) {
      expect(u.outlier || u.cooksDistance > 1).toBe(true);
      expect(u.influential).toBe(u.cooksDistance > 1);
    }
    const left = checks.rows.filter((r) => !unusual.some((u) => u.index === r.index));
    for (const r of left) expect(r.outlier || r.cooksDistance > 1).toBe(false);
  });

  it('words each rule once, from the same numbers', () => {
    expect(FLAG_TEXT).toEqual({ 'high-leverage': 'high leverage (over 2p/n)', outlier: 'large residual (|t| over 3)', influential: "Cook's over 4/n" });
    expect(SCREENS_TEXT).toBe("high leverage: h > 2p/n; large residual: |studentized| > 3; Cook's over 4/n");
  });

  it('gives each row its flags as bits, and the Flag text of every combination', () => {
    const d = residualDiagnostics(data);
    const cutoffs = screenCutoffs(d);
    const order: ResidualFlag[] = ['high-leverage', 'outlier', 'influential'];
    for (const row of d.rows) {
      const bits = flagBitsAt(cutoffs, row.leverage, row.studentized, row.cooksDistance, row.undefinedBecause);
      expect(order.filter((_, k) => (bits & (1 << k)) !== 0)).toEqual(residualFlags(row, d));
    }
    expect(flagBitsAt(cutoffs, 0, Number.NaN, Number.NaN, 'rest-fit-exactly')).toBe(2);
    expect(FLAG_TEXTS).toEqual([
      '',
      'high leverage (over 2p/n)',
      'large residual (|t| over 3)',
      'high leverage (over 2p/n), large residual (|t| over 3)',
      "Cook's over 4/n",
      "high leverage (over 2p/n), Cook's over 4/n",
      "large residual (|t| over 3), Cook's over 4/n",
      "high leverage (over 2p/n), large residual (|t| over 3), Cook's over 4/n",
    ]);
  });
});
