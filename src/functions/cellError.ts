/**
 * The one place that knows how a failure reaches a cell. In Excel (and the preview host) the
 * runtime provides CustomFunctions.Error; in Node, where tests call the functions directly, a
 * stand-in with the same `code` and `message` is thrown instead, so the module needs no Office
 * globals to load or run.
 */
import { EngineError } from '../engine';

export const VALUE_ERROR = '#VALUE!';

export class CellFunctionError extends Error {
  constructor(
    message: string,
    readonly code: string = VALUE_ERROR,
  ) {
    super(message);
  }
}

/** What a failing cell function throws: CustomFunctions.Error in a host, CellFunctionError in Node. */
export interface CellError {
  code: string;
  message?: string;
}

/** Longer than this, a message no longer fits a cell's error tip and buries what to fix. */
export const MESSAGE_LIMIT = 500;

/**
 * Messages quote the user's own headers, levels and texts, which can be any length (a header cell
 * may hold 100,000 characters): long quotations are cut, then the whole message if still too long.
 */
function readable(message: string): string {
  const quoted = message.replace(/"([^"]{61,})"/g, (_, text: string) => `"${text.slice(0, 40)}…"`);
  return quoted.length > MESSAGE_LIMIT ? `${quoted.slice(0, MESSAGE_LIMIT - 1)}…` : quoted;
}

/**
 * The error codes a custom function may return, by their CustomFunctions.ErrorCode names ("Handle
 * and return errors from your custom function": #NAME? and #REF! are input errors only).
 */
const RETURNABLE_CODES = {
  '#VALUE!': 'invalidValue',
  '#N/A': 'notAvailable',
  '#DIV/0!': 'divisionByZero',
  '#NUM!': 'invalidNumber',
  '#NULL!': 'nullReference',
} as const;
type ReturnableCode = keyof typeof RETURNABLE_CODES;

function isReturnable(code: string): code is ReturnableCode {
  return Object.prototype.hasOwnProperty.call(RETURNABLE_CODES, code);
}

/** The same page: custom messages are only available with #VALUE! and #N/A. */
const MESSAGE_CODES = new Set(['#VALUE!', '#N/A']);

function cellError(code: ReturnableCode, message: string | undefined): CellError {
  const shown = MESSAGE_CODES.has(code) ? message : undefined;
  if (typeof CustomFunctions !== 'undefined' && typeof CustomFunctions.Error === 'function') {
    return new CustomFunctions.Error(CustomFunctions.ErrorCode[RETURNABLE_CODES[code]], shown);
  }
  return new CellFunctionError(shown ?? '', code);
}

export function toCellError(error: unknown): CellError {
  const message = readable(
    error instanceof EngineError
      ? error.message
      : `Plumbline could not compute this result (${error instanceof Error ? error.message : String(error)}). Please report it with the data that caused it.`,
  );
  return cellError(VALUE_ERROR, message);
}

/**
 * An error value to put inside a returned array, standing for an input cell's error: the same
 * code (and message, where the code may carry one) where a function may return it, else #VALUE!
 * with a message naming the original code.
 */
export function errorValue(code: string, message?: string): CellError {
  if (isReturnable(code)) return cellError(code, message);
  return cellError(VALUE_ERROR, `The cell holds ${code}, which a custom function cannot pass on.`);
}

/** Runs a cell function body, turning any failure into the cell error above: never a partial result. */
export function guarded<T>(body: () => T): T {
  try {
    return body();
  } catch (error) {
    throw toCellError(error);
  }
}
