/**
 * The formula worker's side, run in Node: a request names a PLUMB function and carries its
 * arguments; the answer is that function's own grid, or its cell error by code and message. The
 * expectations are the same functions called directly (src/functions/functions.ts), so the two
 * threads cannot disagree (common practice (no source)).
 */
import { describe, expect, it } from 'vitest';
import { answer } from '../../../src/functions/offThread/formulaWorker';
import { argumentOut, gridIn } from '../../../src/functions/offThread/gridsInTransit';
import { terms } from '../../../src/functions/functions';
import { randomProblem } from '../../support/random';

const { y, x } = randomProblem(23, 30, 2);
const response = [['Yield'], ...y.map((v) => [v])];
const predictors = [['Temp', 'Time'], ...x.map((r) => [...r])];
const u = undefined;
const asSent = (args: unknown[]) => args.map((a) => structuredClone(argumentOut(a).value));
const errorValue = (code: string, message?: string) => ({ code, message });

describe('formula worker', () => {
  it('answers TERMS with the grid TERMS gives where it is called, addresses and all', () => {
    const parameterAddresses = ['Data!A1:A31', 'Data!B1:C31'];
    const reply = answer({ id: 7, name: 'terms', args: asSent([response, predictors, u, u, u, u, u]), parameterAddresses });
    expect(reply.answer.id).toBe(7);
    if (!('grid' in reply.answer)) throw new Error('expected a grid');
    expect(gridIn(reply.answer.grid, errorValue)).toEqual(terms(response, predictors, u, u, u, u, u, { parameterAddresses } as CustomFunctions.Invocation));
  });

  it('answers a cell error with its code and message, and an unknown function as a failure', () => {
    const reply = answer({ id: 1, name: 'terms', args: asSent([response.slice(0, 2), predictors.slice(0, 2), u, u, u, u, u]), parameterAddresses: undefined });
    expect(reply.answer).toMatchObject({ id: 1, error: { code: '#VALUE!', message: expect.stringContaining('rows') } });
    expect(answer({ id: 2, name: 'nothing', args: [], parameterAddresses: undefined }).answer).toMatchObject({
      error: { code: '#VALUE!', message: expect.stringContaining('there is no cell function nothing') },
    });
  });
});
