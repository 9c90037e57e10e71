/**
 * Evaluates one parsed formula against the workbook, calling custom functions the way Excel
 * does: ranges as row-major 2-D arrays (blanks as "", errors as { code, message } objects),
 * omitted arguments as null, a thrown CustomFunctions.Error as the cell's error.
 */
import type { Expression } from './formula';
import type { CellError, CellValue, CustomFunction, RangeRef } from './types';

export type Dimensionality = 'scalar' | 'matrix';

export interface FunctionEntry {
  fn: CustomFunction;
  /** Per parameter; when unknown every range is passed whole. */
  parameters?: { dimensionality: Dimensionality; optional: boolean }[];
}

export interface EvaluationContext {
  valueAt(sheet: string, row: number, column: number): CellValue;
  hasSheet(name: string): boolean;
  lookup(name: string): FunctionEntry | undefined;
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
      if (!context.hasSheet(expression.range.sheet)) return { error: { error: '#REF!', message: `There is no sheet named ${expression.range.sheet}.` } };
      return { grid: readRange(expression.range, context, (v) => v) };
    }
    case 'call':
      return callFunction(expression, context);
  }
}

function readRange<T>(range: RangeRef, context: EvaluationContext, map: (v: CellValue) => T): T[][] {
  const rows: T[][] = [];
  for (let r = range.top; r <= range.bottom; r++) {
    const row: T[] = [];
    for (let c = range.left; c <= range.right; c++) row.push(map(context.valueAt(range.sheet, r, c)));
    rows.push(row);
  }
  return rows;
}

/** What a custom function receives for one cell. */
function argumentCell(value: CellValue): unknown {
  if (value === null) return '';
  if (isCellError(value)) return { code: value.error, message: value.message ?? '' };
  return value;
}

function callFunction(call: Extract<Expression, { kind: 'call' }>, context: EvaluationContext): FormulaResult | Promise<FormulaResult> {
  const entry = call.name.startsWith(NAMESPACE) ? context.lookup(call.name.slice(NAMESPACE.length)) : undefined;
  if (entry === undefined) return { error: { error: '#NAME?', message: `${call.name} is not a known function.` } };
  const parameters = entry.parameters;
  if (parameters !== undefined) {
    const required = parameters.filter((p) => !p.optional).length;
    if (call.args.length > parameters.length) {
      return { error: { error: '#VALUE!', message: `${call.name} takes at most ${parameters.length} arguments.` } };
    }
    if (call.args.length < required) {
      return { error: { error: '#VALUE!', message: `${call.name} needs at least ${required} arguments.` } };
    }
  }
  const args: unknown[] = [];
  for (let i = 0; i < Math.max(call.args.length, parameters?.length ?? 0); i++) {
    const arg = call.args[i] ?? null;
    const dimensionality = parameters?.[i]?.dimensionality ?? 'matrix';
    if (arg === null) {
      args.push(null);
      continue;
    }
    if (arg.kind === 'call') return { error: { error: '#VALUE!', message: 'Nested function calls are not supported in the preview.' } };
    if (arg.kind === 'reference') {
      if (!context.hasSheet(arg.range.sheet)) return { error: { error: '#REF!', message: `There is no sheet named ${arg.range.sheet}.` } };
      const grid = readRange(arg.range, context, argumentCell);
      args.push(dimensionality === 'scalar' ? grid[0][0] : grid);
    } else {
      args.push(dimensionality === 'scalar' ? arg.value : [[arg.value]]);
    }
  }
  try {
    const output = entry.fn(...args);
    return output instanceof Promise ? output.then(toResult, fromThrown) : toResult(output);
  } catch (thrown) {
    return fromThrown(thrown);
  }
}

function fromThrown(thrown: unknown): FormulaResult {
  if (typeof thrown === 'object' && thrown !== null && 'code' in thrown && typeof thrown.code === 'string') {
    const message = 'message' in thrown && typeof thrown.message === 'string' ? thrown.message : undefined;
    return { error: { error: thrown.code, message } };
  }
  return { error: { error: '#VALUE!', message: thrown instanceof Error ? thrown.message : String(thrown) } };
}

/** Mirrors Excel: null in a returned array shows as 0, an error object as its error. */
function resultCell(value: unknown): CellValue {
  if (value === null || value === undefined) return 0;
  if (typeof value === 'number') return Number.isFinite(value) ? value : { error: '#NUM!' };
  if (typeof value === 'string' || typeof value === 'boolean') return value;
  const thrown = fromThrown(value);
  return 'error' in thrown ? thrown.error : { error: '#VALUE!' };
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
