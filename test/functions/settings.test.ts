/**
 * The shared settings scheme: the same five trailing arguments, in the same order, in every
 * function. Expected values come from the engine tested elsewhere, plus identities that are
 * common practice (no source): a wider level widens intervals, equal weights change nothing.
 */
import { describe, expect, it } from 'vitest';
import { fitModel } from '../../src/engine';
import { compare, covariance, estimates, fitStats, intervals, nestedF, predict, residuals, stdErrors, terms } from '../../src/functions/functions';
import { thrownBy } from '../support/cells';
import { randomProblem } from '../support/random';

// Excel passes an omitted optional argument as null, which the declared TypeScript types
// (kept as any[][] so the metadata marks weights as a range) do not admit.
const OMITTED = null as unknown as undefined;
const { y, x } = randomProblem(71, 30, 3);
const yCells = y.map((v) => [v]);

describe('settings', () => {
  it('omitted, null and "" mean the default level and an estimated σ; 0 is the default level only', () => {
    const base = intervals(yCells, x);
    expect(intervals(yCells, x, null, null, null, OMITTED)).toEqual(base);
    expect(intervals(yCells, x, '', '', '', OMITTED)).toEqual(base);
    expect(intervals(yCells, x, 0, true, null)).toEqual(base);
    expect(intervals(yCells, x, [[0.95]])).toEqual(base);
  });

  // The noise_sd rule shared with the pane (src/engine/noiseSd.ts), in the pane's words
  // (src/presentation/noiseSd.ts): empty estimates σ; anything else must be a positive finite
  // number with a point as decimal separator. Common practice (no source).
  it('noise_sd refuses 0, negatives, text and a decimal comma, each saying why', () => {
    expect(thrownBy(() => terms(yCells, x, null, null, 0)).message).toBe(
      'noise_sd cannot be 0: noise-free measurements leave nothing to estimate. Leave noise_sd empty to estimate σ from the data.',
    );
    expect(thrownBy(() => terms(yCells, x, null, null, -1)).message).toBe('noise_sd is a standard deviation, so it must be positive; got -1.');
    expect(thrownBy(() => terms(yCells, x, null, null, 'abc')).message).toBe('noise_sd must be a number, such as 0.35, or left empty to estimate σ; got abc.');
    expect(thrownBy(() => terms(yCells, x, null, null, '0,35')).message).toBe('Use a point as the decimal separator in noise_sd: 0.35 rather than 0,35.');
    expect(terms(yCells, x, null, null, '0.35')).toEqual(terms(yCells, x, null, null, 0.35));
  });

  it('level widens the intervals of TERMS, INTERVALS and PREDICT alike', () => {
    const narrow = intervals(yCells, x, 0.8);
    const wide = intervals(yCells, x, 0.99);
    narrow.forEach((row, i) => {
      expect(wide[i][0] as number).toBeLessThan(row[0] as number);
      expect(wide[i][1] as number).toBeGreaterThan(row[1] as number);
    });
    expect(terms(yCells, x, 0.99)[1][5]).toBe(wide[0][0]);
    const [p80] = predict(yCells, x, [[0, 0, 0]], 0.8);
    const [p99] = predict(yCells, x, [[0, 0, 0]], 0.99);
    expect(p99[3] as number).toBeLessThan(p80[3] as number);
  });

  it('intercept FALSE drops the intercept row, in every function', () => {
    expect(estimates(yCells, x, null, false)).toHaveLength(3);
    expect(terms(yCells, x, null, false).map((r) => r[0])).toEqual(['Term', 'x1', 'x2', 'x3']);
    const engine = fitModel({ y, x }, { intercept: false });
    expect(estimates(yCells, x, null, false).map((r) => r[0])).toEqual(engine.terms.map((t) => t.estimate));
  });

  it('noise_sd switches TERMS to z and fixes the standard errors at σ·√diag((XᵀX)⁻¹)', () => {
    const table = terms(yCells, x, null, null, 2);
    expect(table[0][3]).toBe('z');
    const engine = fitModel({ y, x }, { knownSigma: 2 });
    expect(table.slice(1).map((r) => r[2])).toEqual(engine.terms.map((t) => t.standardError));
  });

  it('weights sit in the same (last) place in NESTEDF and PREDICT as in TERMS', () => {
    const w = y.map((_, i) => [1 + (i % 2)]);
    const weighted = fitModel({ y, x, weights: w.map((r) => r[0]) });
    expect(estimates(yCells, x, null, null, null, w).map((r) => r[0])).toEqual(weighted.terms.map((t) => t.estimate));
    const stats = Object.fromEntries(fitStats(yCells, x, null, null, null, w));
    expect(stats.RSS).toBe(weighted.rss);
    const nested = Object.fromEntries(
      nestedF(
        yCells,
        x.map((r) => r.slice(0, 2)),
        x.map((r) => [r[2]]),
        null,
        null,
        null,
        w,
      ),
    );
    const t = weighted.terms[3].statistic;
    expect(Math.abs((nested.F as number) - t * t)).toBeLessThan(1e-9 * t * t);
    const [row] = predict(yCells, x, [[1, 1, 1]], null, null, null, w);
    expect(row[0]).toBeCloseTo(
      weighted.terms.reduce((s, term) => s + term.estimate, 0),
      10,
    );
  });
});

describe('robust, the fifth setting, in the same place in every function', () => {
  const xBase = x.map((r) => r.slice(0, 2));
  const xAdded = x.map((r) => [r[2]]);
  // Every function, called with only robust set (after four unset settings): the data arguments
  // differ, the settings tail does not.
  const calls: Record<string, (robust: unknown) => unknown[][]> = {
    TERMS: (r) => terms(yCells, x, null, null, null, OMITTED, r),
    ESTIMATES: (r) => estimates(yCells, x, null, null, null, OMITTED, r),
    STDERRORS: (r) => stdErrors(yCells, x, null, null, null, OMITTED, r),
    INTERVALS: (r) => intervals(yCells, x, null, null, null, OMITTED, r),
    COVARIANCE: (r) => covariance(yCells, x, null, null, null, OMITTED, r),
    FITSTATS: (r) => fitStats(yCells, x, null, null, null, OMITTED, r),
    NESTEDF: (r) => nestedF(yCells, xBase, xAdded, null, null, null, OMITTED, r),
    PREDICT: (r) => predict(yCells, x, [[0, 0, 0]], null, null, null, OMITTED, r),
    RESIDUALS: (r) => residuals(yCells, x, null, null, null, OMITTED, r),
    COMPARE: (r) =>
      compare(
        yCells,
        x,
        [
          [1, 1, 1],
          [1, 0, 0],
        ],
        null,
        null,
        null,
        OMITTED,
        r,
      ),
  };
  const honouring = new Set(['TERMS', 'STDERRORS', 'INTERVALS', 'COVARIANCE']);

  it.each(Object.keys(calls))('%s reads robust as its fifth setting', (id) => {
    const call = calls[id];
    expect(thrownBy(() => call('HC2')).message).toMatch(/^robust must be FALSE/);
    expect(call(false)).toEqual(call(null));
    if (honouring.has(id)) expect(call(true)).not.toEqual(call(false));
    else expect(call(true)).toEqual(call(false));
  });

  it('robust TRUE in TERMS, STDERRORS and INTERVALS gives the engine’s HC3 numbers', () => {
    const engine = fitModel({ y, x }, { covariance: 'HC3' });
    expect(stdErrors(yCells, x, null, null, null, OMITTED, true).map((r) => r[0])).toEqual(engine.terms.map((t) => t.standardError));
    expect(
      terms(yCells, x, null, null, null, OMITTED, true)
        .slice(1)
        .map((r) => r[5]),
    ).toEqual(engine.terms.map((t) => t.ciLow));
  });
});
