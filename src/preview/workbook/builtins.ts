/**
 * The few worksheet functions and the one operator Plumbline's reports write (the charts' guide
 * cells, taskpane/model/reportCharts.ts), with the rules Microsoft Support's function pages give:
 *
 * - MIN and MAX ("MIN function", "MAX function"): in a reference only numbers are used; empty
 *   cells, logical values and text are ignored; with no numbers the result is 0; an error value
 *   causes an error (an error inside a reference too: common practice (no source)).
 * - COUNT ("COUNT function"): in a reference only numbers are counted; empty cells, logical values,
 *   text and error values are not.
 * - `/` ("Calculation operators and precedence in Excel"): a blank cell is 0; dividing by zero is
 *   #DIV/0! ("How to correct a #DIV/0! error").
 *
 * Where Excel would convert (text or TRUE typed as an argument, "3" in a cell under `/`) or spill
 * (a range under `/`), the preview refuses with #VALUE! and says why, so nothing comes to rely on it.
 */
import type { Expression } from './formula';
import type { CellError, CellValue } from './types';

export type BuiltinResult = { value: CellValue } | { error: CellError };

type Operand = { value: CellValue } | { error: CellError } | { cells: CellValue[] };

/** What the built-ins need of the evaluator: an argument's value, or its cells when it is a reference. */
export type OperandOf = (expression: Expression) => Operand | Promise<Operand>;

const previewRefuses = (what: string): { error: CellError } => ({ error: { error: '#VALUE!', message: `The preview does not ${what}.` } });

function isError(value: CellValue): value is CellError {
  return typeof value === 'object' && value !== null;
}

/** The numbers MIN, MAX and COUNT take from each argument, or the error that stops them. */
function numbersOf(operands: Operand[], errorsStop: boolean): number[] | { error: CellError } {
  const numbers: number[] = [];
  for (const operand of operands) {
    if ('error' in operand) return operand;
    const cells = 'cells' in operand ? operand.cells : [operand.value];
    if (!('cells' in operand) && typeof operand.value !== 'number' && !isError(operand.value)) {
      return previewRefuses('convert text or logical values typed as arguments');
    }
    for (const cell of cells) {
      if (typeof cell === 'number') numbers.push(cell);
      else if (isError(cell) && errorsStop) return { error: cell };
    }
  }
  return numbers;
}

function extreme(operands: Operand[], pick: (a: number, b: number) => number): BuiltinResult {
  const numbers = numbersOf(operands, true);
  if (!Array.isArray(numbers)) return numbers;
  // A loop, not a spread: a spread over a long column would overflow the stack.
  let result: number | undefined;
  for (const n of numbers) result = result === undefined ? n : pick(result, n);
  return { value: result ?? 0 };
}

const BUILTINS = new Map<string, (operands: Operand[]) => BuiltinResult>([
  ['MIN', (operands) => extreme(operands, Math.min)],
  ['MAX', (operands) => extreme(operands, Math.max)],
  [
    'COUNT',
    (operands) => {
      const numbers = numbersOf(operands, false);
      return Array.isArray(numbers) ? { value: numbers.length } : numbers;
    },
  ],
]);

export function isBuiltin(name: string): boolean {
  return BUILTINS.has(name);
}

function settle<T>(operands: (Operand | Promise<Operand>)[], then: (settled: Operand[]) => T): T | Promise<T> {
  return operands.some((o) => o instanceof Promise) ? Promise.all(operands).then(then) : then(operands as Operand[]);
}

export function callBuiltin(name: string, args: readonly (Expression | null)[], operandOf: OperandOf): BuiltinResult | Promise<BuiltinResult> {
  if (args.length === 0 || args.includes(null)) return previewRefuses(`take ${name} with an empty argument`);
  const builtin = BUILTINS.get(name);
  if (builtin === undefined) return { error: { error: '#NAME?', message: `${name} is not a known function.` } };
  return settle(
    args.map((a) => operandOf(a as Expression)),
    builtin,
  );
}

/** One value for an operator: a single cell (blank as 0) or a value; never a range. */
function scalarOf(operand: Operand): { value: number } | { error: CellError } {
  if ('error' in operand) return operand;
  if ('cells' in operand && operand.cells.length !== 1) return previewRefuses('spill a calculation over a range');
  const value = 'cells' in operand ? (operand.cells[0] ?? 0) : operand.value;
  if (isError(value)) return { error: value };
  if (typeof value !== 'number') return previewRefuses('convert text or logical values in a calculation');
  return { value };
}

export function divide(dividend: Operand | Promise<Operand>, divisor: Operand | Promise<Operand>): BuiltinResult | Promise<BuiltinResult> {
  return settle([dividend, divisor], ([a, b]) => {
    const top = scalarOf(a);
    if ('error' in top) return top;
    const bottom = scalarOf(b);
    if ('error' in bottom) return bottom;
    if (bottom.value === 0) return { error: { error: '#DIV/0!' } };
    const quotient = top.value / bottom.value;
    return Number.isFinite(quotient) ? { value: quotient } : { error: { error: '#NUM!' } };
  });
}
