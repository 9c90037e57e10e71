/**
 * A formula whose fit is cached: recalculating it over the same cells returns the very grid of
 * the first call, and any one changed cell refits. Common practice (no source): a content-
 * addressed cache hits on equal content and misses on any difference. Fit counts come from the
 * cache's own counter, so each assertion fails if a formula refits or wrongly reuses a fit.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { modelCache } from '../../src/engine';
import { fitStats, residuals, terms } from '../../src/functions/functions';
import { randomProblem } from '../support/random';

const { y, x } = randomProblem(33, 60, 3);
// Blanks, "" and #N/A (as CustomFunctions.Error) leave rows out, as a worksheet's gaps would.
const notAvailable = { code: '#N/A', message: '' };
const yCells: unknown[][] = [['Yield'], ...y.map((v, i) => [i === 7 ? null : v])];
const xCells: unknown[][] = [['a', 'b', 'c'], ...x.map((row, i) => (i === 11 ? [row[0], '', row[2]] : i === 20 ? [row[0], row[1], notAvailable] : row))];
const invocation = { parameterAddresses: ['Data!A1:A61', 'Data!B1:D61'] } as CustomFunctions.Invocation;
const copy = (grid: unknown[][]): unknown[][] => grid.map((row) => [...row]);

beforeEach(() => modelCache.reset());

describe('a cached formula', () => {
  it('returns the same grids on a second call over equal cells, with one fit', () => {
    const first = [
      terms(yCells, xCells, undefined, undefined, undefined, undefined, undefined, invocation),
      fitStats(yCells, xCells, undefined, undefined, undefined, undefined, undefined, invocation),
    ];
    const again = [
      terms(copy(yCells), copy(xCells), undefined, undefined, undefined, undefined, undefined, invocation),
      fitStats(copy(yCells), copy(xCells), undefined, undefined, undefined, undefined, undefined, invocation),
    ];
    expect(again).toEqual(first);
    expect(modelCache.stats()).toMatchObject({ fits: 1, hits: 3 });
  });

  it('gives the residual rows their worksheet rows, the skipped ones left out, from the cache too', () => {
    const first = residuals(yCells, xCells, undefined, undefined, undefined, undefined, undefined, invocation);
    const again = residuals(copy(yCells), copy(xCells), undefined, undefined, undefined, undefined, undefined, invocation);
    expect(again).toEqual(first);
    // 60 rows less the three with a blank, "" or #N/A; data start on worksheet row 2.
    const rows = again.slice(1).map((row) => row[0]);
    expect(rows).toHaveLength(57);
    expect(rows).not.toContain(9);
    expect(rows).not.toContain(13);
    expect(rows).not.toContain(22);
    expect(rows[0]).toBe(2);
  });

  it('misses on any one changed cell: a response, a predictor, or a blank filled in', () => {
    const base = terms(yCells, xCells);
    const editedY = copy(yCells);
    editedY[30][0] = (editedY[30][0] as number) + 1e-9;
    const editedX = copy(xCells);
    editedX[45][1] = (editedX[45][1] as number) * 2;
    const filled = copy(yCells);
    filled[8][0] = 1;
    const grids = [terms(editedY, xCells), terms(yCells, editedX), terms(filled, xCells)];
    expect(modelCache.stats()).toMatchObject({ fits: 4, hits: 0 });
    for (const grid of grids) expect(grid).not.toEqual(base);
  });
});
