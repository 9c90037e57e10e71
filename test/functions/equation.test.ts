/**
 * PLUMB.EQUATION: the fitted equation as text. Source: F. J. Anscombe, "Graphs in Statistical
 * Analysis", The American Statistician 27(1), 17–21 (1973): the first data set (from memory, as
 * in test/engine/fitModel.anscombe.test.ts) gives ŷ = 3.00 + 0.500x, slope SE 0.118; the
 * intercept's SE, 1.12, follows from its printed sums of squares. Rounding to about three
 * significant digits of the standard error is the project's rule (common practice (no source)):
 * SE 1.12 → 2 decimals, 0.118 → 3.
 */
import { describe, expect, it } from 'vitest';
import { equation } from '../../src/functions/functions';
import { column, thrownBy } from '../support/cells';

const x = [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5];
const y = [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68];

describe('PLUMB.EQUATION', () => {
  it("writes Anscombe's first set as 3.00 + 0.500·x, with the names from the headers", () => {
    expect(equation(column('Yield', y), column('Grind size', x))).toEqual([['Fitted [Yield] = 3.00 + 0.500·[Grind size]']]);
  });

  it('follows the intercept setting: through zero the slope is Σxy/Σx² = 0.7968 (SE 0.0496, 4 decimals)', () => {
    // Regression through the origin, b = Σxy/Σx², SE = √(RSS/(n − 1)/Σx²): common practice (no source).
    expect(equation(column('Yield', y), column('Grind size', x), null, false)).toEqual([['Fitted [Yield] = 0.7968·[Grind size]']]);
  });

  it('writes negative coefficients with a minus sign, the first one included', () => {
    expect(
      equation(
        column(
          'Yield',
          y.map((v) => -v),
        ),
        column('Grind size', x),
      ),
    ).toEqual([['Fitted [Yield] = −3.00 − 0.500·[Grind size]']]);
  });

  it('refuses bad settings as every PLUMB function does', () => {
    expect(thrownBy(() => equation(column('Yield', y), column('Grind size', x), null, null, -1)).code).toBe('#VALUE!');
  });
});
