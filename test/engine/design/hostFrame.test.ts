/**
 * A host's ranges read as it hands them over: all-numeric ranges in one pass give the frame the
 * CellValue read gives, and anything else goes to that general read (asCells), which words the
 * message. Each case is worked out by hand in its comments. Common practice (no source): a fast
 * path must agree with the general one wherever it answers, and leave every other case to it.
 */
import { describe, expect, it } from 'vitest';
import { buildModelFrame, type CellGrid, type CellValue, type FrameInput } from '../../../src/engine';
import { hostNumericFrame, type HostFrameInput } from '../../../src/engine/design/hostFrame';

/** A stand-in for a host's error object, read by its own rule. */
interface HostError {
  hostCode: string;
}
const hostError = (code: string): HostError => ({ hostCode: code });
const errorCodeOf = (value: object): string | undefined => ('hostCode' in value ? (value as HostError).hostCode : undefined);
const toCell = (value: unknown): CellValue => {
  if (typeof value === 'object' && value !== null) return { errorCode: errorCodeOf(value) ?? '#VALUE!' };
  return value as CellValue;
};
const toCells = (grid: readonly unknown[]): CellGrid => grid.map((row) => (row as unknown[]).map(toCell));

/** The host input over `grids`, counting how often the general read's CellValues are asked for. */
function hostInput(grids: { y: unknown[][]; x: unknown[][][]; weights?: unknown[][] }, extra: Partial<FrameInput> = {}) {
  const asked = { count: 0 };
  const cells = (): FrameInput => {
    asked.count++;
    return { y: toCells(grids.y), x: grids.x.map(toCells), weights: grids.weights && toCells(grids.weights), intercept: true, ...extra };
  };
  const input: HostFrameInput = { y: grids.y, x: grids.x, weights: grids.weights, intercept: true, ...extra, errorCodeOf, asCells: cells };
  return { input, asked, cells };
}

describe("a host's all-numeric ranges", () => {
  it('give the CellValue read’s frame in one pass, host errors read by the host’s rule', () => {
    // Rows 2–6 (origin row 4, so worksheet rows 5–9): row 3 has the host's #N/A in b, row 5 a
    // blank in weight; rows 2, 4 and 6 are used.
    const grids = {
      y: [['Out'], [1], [2], [3], [4], [5]],
      x: [
        [['a'], [10], [20], [30], [40], [50]],
        [['b'], [0.5], [hostError('#N/A')], [1.5], [2], [2.5]],
      ],
      weights: [['w'], [1], [2], [3], [undefined], [5]],
    };
    const { input, asked, cells } = hostInput(grids, { origins: { y: { row: 3, column: 0 } } });
    const frame = buildModelFrame(input);
    expect(asked.count).toBe(0);
    const general = buildModelFrame(cells());
    expect(frame).toEqual(general);
    expect(frame.skipped).toEqual([
      { row: 6, reason: '#N/A in b' },
      { row: 8, reason: 'blank in weight' },
    ]);
    expect(frame.usedRows).toEqual([5, 7, 9]);
    expect(frame.data.x).toEqual([
      [10, 0.5],
      [30, 1.5],
      [50, 2.5],
    ]);
    expect(frame.data.weights).toEqual([1, 3, 5]);
  });

  it('leave text, other errors, TRUE and rows that are no arrays of the right width to the general read', () => {
    const y = [['y'], [1], [2], [3]];
    const cases: { x: unknown[][]; message: string }[] = [
      // A column of text: categorical, which only the general read codes.
      { x: [['g'], ['p'], ['q'], ['p']], message: '' },
      { x: [['a'], [1], ['p'], [3]], message: 'predictors row 3, column 1 ("a") holds the text "p"' },
      { x: [['a'], [1], [hostError('#DIV/0!')], [3]], message: 'holds the error #DIV/0!' },
      { x: [['a'], [1], [{}], [3]], message: 'holds the error #VALUE!' },
      { x: [['a'], [1], [true], [3]], message: 'holds TRUE' },
      { x: [['a'], [1], [1, 2], [3]], message: 'predictors row 3 has 2 cells; row 1 has 1.' },
      // A numeric header under the response's text header.
      { x: [[7], [1], [2], [3]], message: 'response starts with a header but predictors row 1, column 1 holds 7' },
    ];
    for (const { x, message } of cases) {
      const { input, asked } = hostInput({ y, x: [x] });
      expect(hostNumericFrame(input)).toBeUndefined();
      if (message === '') expect(buildModelFrame(input).columns[0].kind).toBe('categorical');
      else expect(() => buildModelFrame(input)).toThrow(message);
      expect(asked.count).toBe(1);
    }
  });

  it('never throw, whatever the ranges hold', () => {
    const odd: HostFrameInput[] = [
      hostInput({ y: [], x: [[]] }).input,
      hostInput({ y: [[1, 2]], x: [[[1]]] }).input,
      { ...hostInput({ y: [['y'], [1], [2]], x: [[['a'], [1], [2]]] }).input, x: [[['a'], 5, [2]]] },
      { ...hostInput({ y: [['y'], [1], [2]], x: [[['a'], [1], [2]]] }).input, y: [['y'], 'ab', [2]] },
      hostInput({ y: [['y'], [1], [2]], x: [[['a'], [1]]] }).input,
      hostInput({ y: [['y'], [null], [null]], x: [[['a'], [1], [2]]] }).input,
    ];
    for (const input of odd) expect(hostNumericFrame(input)).toBeUndefined();
  });
});
