/**
 * The cell functions against outside sources, through the same any[][] interface Excel uses:
 * NIST StRD Longley and NoInt1 (certified values, read in place from ../shared/reference/strd),
 * and the delivery-time example of Montgomery, Peck & Vining, Introduction to Linear Regression
 * Analysis (Wiley), Examples 3.1–3.3: data and printed coefficient table from memory.
 */
import { describe, expect, it } from 'vitest';
import { covariance, estimates, fitStats, intervals, nestedF, predict, stdErrors, terms } from '../../src/functions/functions';
import { columns, column } from '../support/cells';
import { lre, readStrd, strdAvailable } from '../support/strd';

describe.skipIf(!strdAvailable())('NIST StRD through the cells (source: NIST StRD)', () => {
  it('Longley, with headers: TERMS, ESTIMATES, STDERRORS and FITSTATS carry the certified values', () => {
    const p = readStrd('Longley');
    const y = column('Employed', p.y);
    const x = columns(['x1', 'x2', 'x3', 'x4', 'x5', 'x6'], p.x);
    const table = terms(y, x);
    expect(table[0]).toEqual(['Term', 'Estimate', 'Std error', 't', 'p-value', 'CI low', 'CI high', 'CV %', 'Reading']);
    expect(table.map((r) => r[0])).toEqual(['Term', 'Intercept', 'x1', 'x2', 'x3', 'x4', 'x5', 'x6']);
    p.certified.parameters.forEach((c, i) => {
      expect(lre(table[i + 1][1] as number, c.estimate)).toBeGreaterThanOrEqual(13);
      expect(lre(table[i + 1][2] as number, c.standardDeviation)).toBeGreaterThanOrEqual(13);
    });
    const est = estimates(y, x);
    const se = stdErrors(y, x);
    p.certified.parameters.forEach((c, i) => {
      expect(lre(est[i][0] as number, c.estimate)).toBeGreaterThanOrEqual(13);
      expect(lre(se[i][0] as number, c.standardDeviation)).toBeGreaterThanOrEqual(13);
    });
    const stats = Object.fromEntries(fitStats(y, x).map(([k, v]) => [k, v]));
    expect(stats['Rows used']).toBe(16);
    expect(stats['Residual df']).toBe(p.certified.residual.df);
    expect(lre(stats['Sigma-hat'] as number, p.certified.residualSd)).toBeGreaterThanOrEqual(13);
    expect(lre(stats['R²'] as number, p.certified.rSquared)).toBeGreaterThanOrEqual(13);
    expect(lre(stats.RSS as number, p.certified.residual.ss)).toBeGreaterThanOrEqual(13);
    expect(lre(stats['F (all slopes zero)'] as number, p.certified.regression.f)).toBeGreaterThanOrEqual(10);
  });

  it('Filip, typed as x and =x^k columns: ESTIMATES and STDERRORS carry 13 certified digits', () => {
    // The cells hold x^k rounded to double, as a sheet's formulas would; the engine recognises
    // them as powers of x and solves with the exact powers.
    const p = readStrd('Filip');
    const y = column(undefined, p.y);
    const est = estimates(y, p.x);
    const se = stdErrors(y, p.x);
    p.certified.parameters.forEach((c, i) => {
      expect(lre(est[i][0] as number, c.estimate)).toBeGreaterThanOrEqual(13);
      expect(lre(se[i][0] as number, c.standardDeviation)).toBeGreaterThanOrEqual(13);
    });
  });

  it('Longley: COVARIANCE has the certified variances on its diagonal and INTERVALS are centred on the estimates', () => {
    const p = readStrd('Longley');
    const cov = covariance(column(undefined, p.y), p.x);
    expect(cov).toHaveLength(7);
    p.certified.parameters.forEach((c, i) => expect(lre(Math.sqrt(cov[i][i] as number), c.standardDeviation)).toBeGreaterThanOrEqual(11));
    const ci = intervals(column(undefined, p.y), p.x);
    p.certified.parameters.forEach((c, i) => {
      const mid = ((ci[i][0] as number) + (ci[i][1] as number)) / 2;
      expect(Math.abs(mid - c.estimate)).toBeLessThan(1e-9 * Math.abs(c.standardDeviation) * 10);
    });
  });

  it('NoInt1 with intercept FALSE: one term, uncentered R² as certified', () => {
    const p = readStrd('NoInt1');
    const table = terms(column(undefined, p.y), p.x, null, false);
    expect(table).toHaveLength(2);
    expect(table[1][0]).toBe('x1');
    expect(lre(table[1][1] as number, p.certified.parameters[0].estimate)).toBeGreaterThanOrEqual(11);
    expect(lre(table[1][2] as number, p.certified.parameters[0].standardDeviation)).toBeGreaterThanOrEqual(11);
    const stats = Object.fromEntries(fitStats(column(undefined, p.y), p.x, null, false));
    expect(lre(stats['R² (uncentered)'] as number, p.certified.rSquared)).toBeGreaterThanOrEqual(11);
    expect(stats.Parameters).toBe(1);
  });
});

describe('delivery-time example (Montgomery, Peck & Vining, Examples 3.1–3.3; from memory)', () => {
  const time = [
    16.68, 11.5, 12.03, 14.88, 13.75, 18.11, 8, 17.83, 79.24, 21.5, 40.33, 21, 13.5, 19.75, 24, 29, 15.35, 19, 9.5, 35.1, 17.9, 52.32, 18.75, 19.83, 10.75,
  ];
  const cases = [7, 3, 3, 4, 6, 7, 2, 7, 30, 5, 16, 10, 4, 6, 9, 10, 6, 7, 3, 17, 10, 26, 9, 8, 4];
  const distance = [560, 220, 340, 80, 150, 330, 110, 210, 1460, 605, 688, 215, 255, 462, 448, 776, 200, 132, 36, 770, 140, 810, 450, 635, 150];
  const y = column('Delivery time', time);
  const x = columns(
    ['Cases', 'Distance'],
    cases.map((c, i) => [c, distance[i]]),
  );

  it('reproduces the printed coefficient table: estimates, standard errors and t values', () => {
    const table = terms(y, x);
    const printed = [
      ['Intercept', 2.34123, 1.09673, 2.13],
      ['Cases', 1.61591, 0.17073, 9.46],
      ['Distance', 0.01438, 0.00361, 3.98],
    ] as const;
    printed.forEach(([name, b, se, t], i) => {
      const row = table[i + 1];
      expect(row[0]).toBe(name);
      expect(row[1] as number).toBeCloseTo(b, 5);
      expect(row[2] as number).toBeCloseTo(se, 5);
      expect(row[3] as number).toBeCloseTo(t, 2);
      expect(row[8]).toBe('clear of zero');
    });
  });

  it('reproduces the printed fit summary: R² 0.9596, adjusted R² 0.9559, F 261.24, σ̂² ≈ 10.62', () => {
    const stats = Object.fromEntries(fitStats(y, x));
    expect(stats['R²'] as number).toBeCloseTo(0.9596, 4);
    expect(stats['Adjusted R²'] as number).toBeCloseTo(0.9559, 4);
    expect(stats['F (all slopes zero)'] as number).toBeCloseTo(261.24, 2);
    expect((stats['Sigma-hat'] as number) ** 2).toBeCloseTo(10.62, 2);
    expect(stats['p-value of F'] as number).toBeLessThan(1e-10);
  });

  it('NESTEDF of Distance given Cases equals the square of its t (3.98² ≈ 15.85)', () => {
    const result = Object.fromEntries(nestedF(y, column('Cases', cases), column('Distance', distance)));
    expect(result.F as number).toBeCloseTo(3.981313 ** 2, 3);
    expect(result['df added']).toBe(1);
    expect(result['df residual']).toBe(22);
    expect(result.Reading).toBe('added terms help');
  });

  it('PREDICT at 8 cases and 275 ft gives the printed estimate and intervals, with a header row', () => {
    // Examples 3.9–3.12 of the same text (from memory): ŷ = 19.22, mean 95% CI 17.66 to 20.78
    // (the text rounds intermediate results, hence the 0.02 tolerance), new-value 95% PI 12.28 to 26.16.
    const out = predict(y, x, [
      ['Cases', 'Distance'],
      [8, 275],
    ]);
    expect(out[0]).toEqual(['Prediction', 'Mean low', 'Mean high', 'New low', 'New high', 'Extrapolation']);
    const [estimate, meanLow, meanHigh, newLow, newHigh] = out[1] as number[];
    // Inside both ranges (2–30 cases, 36–1460 ft) and an ordinary mix of them: no note.
    expect(out[1][5]).toBe('');
    expect(estimate).toBeCloseTo(19.22, 2);
    expect(Math.abs(meanLow - 17.66)).toBeLessThan(0.02);
    expect(Math.abs(meanHigh - 20.78)).toBeLessThan(0.02);
    expect(newLow).toBeCloseTo(12.28, 2);
    expect(newHigh).toBeCloseTo(26.16, 2);
  });
});
