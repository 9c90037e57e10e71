/**
 * The one place that knows how a failure reaches a cell. In Excel (and the preview host) the
 * runtime provides CustomFunctions.Error; in Node, where tests call the functions directly, a
 * stand-in with the same `code` and `message` is thrown instead, so the module needs no Office
 * globals to load or run.
 */
import { EngineError } from '../engine';

export const VALUE_ERROR = '#VALUE!';

export class CellFunctionError extends Error {
  readonly code = VALUE_ERROR;
}

/** What a failing cell function throws: CustomFunctions.Error in a host, CellFunctionError in Node. */
export interface CellError {
  code: string;
  message?: string;
}

export function toCellError(error: unknown): CellError {
  const message =
    error instanceof EngineError
      ? error.message
      : `Plumbline could not compute this result (${error instanceof Error ? error.message : String(error)}). Please report it with the data that caused it.`;
  if (typeof CustomFunctions !== 'undefined' && typeof CustomFunctions.Error === 'function') {
    return new CustomFunctions.Error(CustomFunctions.ErrorCode.invalidValue, message);
  }
  return new CellFunctionError(message);
}

/** Runs a cell function body, turning any failure into the cell error above: never a partial result. */
export function guarded<T>(body: () => T): T {
  try {
    return body();
  } catch (error) {
    throw toCellError(error);
  }
}
