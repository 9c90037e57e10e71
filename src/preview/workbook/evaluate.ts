/**
 * Evaluates one parsed formula against the workbook. A plain reference shows the cells it
 * refers to, with blanks as 0 as in Excel; a custom function gets the arguments Excel would
 * give it (functionArguments.ts), and its result or thrown CustomFunctions.Error becomes the
 * cell's value or error.
 */
import { callBuiltin, divide, isBuiltin, type BuiltinResult, type OperandOf } from './builtins';
import { CustomFunctionsError } from './customFunctionError';
import { buildArguments, type CalculationBehaviour, type SheetCells } from './functionArguments';
import type { FunctionShape } from './functionMetadata';
import type { Expression } from './formula';
import type { CellError, CellValue, CustomFunction } from './types';

export interface FunctionEntry {
  fn: CustomFunction;
  /** From functions.json; when unknown every argument is passed as a range, with no invocation. */
  shape?: FunctionShape;
}

export interface EvaluationContext {
  valueAt(sheet: string, row: number, column: number): CellValue;
  hasSheet(name: string): boolean;
  sheetCells(name: string): SheetCells | undefined;
  lookup(name: string): FunctionEntry | undefined;
  behaviour: CalculationBehaviour;
}

/** A formula's result: a grid to spill from its cell, or an error. */
export type FormulaResult = { grid: CellValue[][] } | { error: CellError };

export const NAMESPACE = 'PLUMB.';

export function isCellError(value: unknown): value is CellError {
  return typeof value === 'object' && value !== null && 'error' in value;
}

export function evaluate(expression: Expression, context: EvaluationContext): FormulaResult | Promise<FormulaResult> {
  switch (expression.kind) {
    case 'number':
    case 'text':
    case 'boolean':
      return { grid: [[expression.value]] };
    case 'reference': {
      const range = expression.range;
      if (!context.hasSheet(range.sheet)) return { error: { error: '#REF!', message: `There is no sheet named ${range.sheet}.` } };
      // "=B2" on an empty B2 shows 0, in a single cell and in a spilled range alike (common practice (no source)).
      const grid: CellValue[][] = [];
      for (let r = range.top; r <= range.bottom; r++) {
        const row: CellValue[] = [];
        for (let c = range.left; c <= range.right; c++) row.push(context.valueAt(range.sheet, r, c) ?? 0);
        grid.push(row);
      }
      return { grid };
    }
    case 'call':
      return isBuiltin(expression.name) ? fromBuiltin(callBuiltin(expression.name, expression.args, operands(context))) : callFunction(expression, context);
    case 'divide': {
      const operandOf = operands(context);
      return fromBuiltin(divide(operandOf(expression.dividend), operandOf(expression.divisor)));
    }
  }
}

/** A built-in's argument: a reference's cells as they are (blanks stay blank), else one value. */
function operands(context: EvaluationContext): OperandOf {
  const operandOf: OperandOf = (expression) => {
    if (expression.kind === 'reference') {
      const range = expression.range;
      if (!context.hasSheet(range.sheet)) return { error: { error: '#REF!', message: `There is no sheet named ${range.sheet}.` } };
      const cells: CellValue[] = [];
      for (let r = range.top; r <= range.bottom; r++) for (let c = range.left; c <= range.right; c++) cells.push(context.valueAt(range.sheet, r, c));
      return { cells };
    }
    const settled = (result: FormulaResult) => {
      if ('error' in result) return result;
      if (result.grid.length !== 1 || result.grid[0].length !== 1)
        return { error: { error: '#VALUE!', message: 'The preview does not calculate over a spilled result.' } };
      return { value: result.grid[0][0] };
    };
    const result = evaluate(expression, context);
    return result instanceof Promise ? result.then(settled) : settled(result);
  };
  return operandOf;
}

function fromBuiltin(result: BuiltinResult | Promise<BuiltinResult>): FormulaResult | Promise<FormulaResult> {
  const toFormula = (r: BuiltinResult): FormulaResult => ('error' in r ? r : { grid: [[r.value]] });
  return result instanceof Promise ? result.then(toFormula) : toFormula(result);
}

function callFunction(call: Extract<Expression, { kind: 'call' }>, context: EvaluationContext): FormulaResult | Promise<FormulaResult> {
  const entry = call.name.startsWith(NAMESPACE) ? context.lookup(call.name.slice(NAMESPACE.length)) : undefined;
  if (entry === undefined) return { error: { error: '#NAME?', message: `${call.name} is not a known function.` } };
  const built = buildArguments(call.name, call.args, entry.shape, context, context.behaviour);
  if ('error' in built) return built;
  try {
    const output = entry.fn(...built.values);
    return output instanceof Promise ? output.then(toResult, fromThrown) : toResult(output);
  } catch (thrown) {
    return fromThrown(thrown);
  }
}

/** "Handle and return errors from your custom function": custom messages show only with #VALUE! and #N/A. */
const WITH_MESSAGE = new Set(['#VALUE!', '#N/A']);
/** The same page: #NAME? and #REF! are input errors only, not output errors. */
const NOT_OUTPUT = new Set(['#NAME?', '#REF!']);

/**
 * Only a CustomFunctions.Error carries an error code to the cell; anything else thrown is an
 * unhandled exception, which Excel shows as #VALUE! with no message (same page).
 */
function errorFrom(thrown: unknown): CellError {
  if (!(thrown instanceof CustomFunctionsError)) return { error: '#VALUE!' };
  if (NOT_OUTPUT.has(thrown.code)) return { error: '#VALUE!' };
  return thrown.message !== '' && WITH_MESSAGE.has(thrown.code) ? { error: thrown.code, message: thrown.message } : { error: thrown.code };
}

function fromThrown(thrown: unknown): FormulaResult {
  return { error: errorFrom(thrown) };
}

/** A null inside a returned array shows as 0 (OfficeDev/office-js issue 1503, by design); an error object as its error. */
function resultCell(value: unknown): CellValue {
  if (value === null || value === undefined) return 0;
  if (typeof value === 'number') return Number.isFinite(value) ? value : { error: '#NUM!' };
  if (typeof value === 'string' || typeof value === 'boolean') return value;
  return errorFrom(value);
}

function toResult(output: unknown): FormulaResult {
  if (Array.isArray(output)) {
    if (output.length === 0 || !output.every((row) => Array.isArray(row) && row.length === output[0].length && row.length > 0)) {
      return { error: { error: '#VALUE!', message: 'The function returned a ragged or empty array.' } };
    }
    return { grid: output.map((row: unknown[]) => row.map(resultCell)) };
  }
  return { grid: [[resultCell(output)]] };
}
