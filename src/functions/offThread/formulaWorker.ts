/**
 * The formula worker (see offThread.ts): runs a PLUMB function on the arguments the page posted
 * and posts back its grid, or the cell error it threw.
 */
import './noHostRegistration';
import { type CellError, toCellError } from '../cellError';
import * as cellFunctions from '../functions';
import { argumentIn, gridOut } from './gridsInTransit';
import { type FormulaAnswer, type FormulaRequest, runEveryCallHere } from './offThread';

runEveryCallHere();

type CellFunction = (...args: unknown[]) => unknown[][];

/** The answer to one request: what the function returned, or the error it threw, ready to post. */
export function answer(request: FormulaRequest): { answer: FormulaAnswer; transfer: ArrayBuffer[] } {
  const fn = (cellFunctions as Record<string, unknown>)[request.name];
  try {
    if (typeof fn !== 'function') throw new Error(`there is no cell function ${request.name}`);
    const invocation = { parameterAddresses: request.parameterAddresses };
    const { grid, transfer } = gridOut((fn as CellFunction)(...request.args.map(argumentIn), invocation));
    return { answer: { id: request.id, grid }, transfer };
  } catch (error) {
    // The functions throw cell errors already; anything else is worded as they word a failure.
    const cellError: CellError = typeof error === 'object' && error !== null && 'code' in error ? (error as CellError) : toCellError(error);
    return { answer: { id: request.id, error: { code: cellError.code, message: cellError.message } }, transfer: [] };
  }
}

const scope = globalThis as unknown as {
  onmessage: ((event: MessageEvent<FormulaRequest>) => void) | null;
  postMessage: (message: unknown, transfer: Transferable[]) => void;
};
scope.onmessage = (event) => {
  const { answer: reply, transfer } = answer(event.data);
  scope.postMessage(reply, transfer);
};
