/**
 * Cell functions over many cells run in a Web Worker, so that the page's main thread, which the
 * pane and every other formula share, is not held while a fit and its diagnostics are computed
 * (issue #15: no task over 200 ms; Excel restarts an add-in unresponsive for 5 s, "Resource
 * limits and performance optimization for Office Add-ins"). The function then returns a promise
 * of its grid, which Excel awaits while the cell shows #BUSY! ("Custom function sample using web
 * worker"; the preview host models it in workbook.ts). Small calls, and every call where no
 * Worker exists (Node: the tests and the bench), run where they are called.
 *
 * The worker (formulaWorker.ts) runs the very same function, on its own copy of the engine and
 * its cache: equal inputs give bit-for-bit equal results on either thread.
 */
import { errorValue, toCellError } from '../cellError';
import { argumentOut, type GridInTransit, gridIn } from './gridsInTransit';

/**
 * Cells in a call's range arguments past which it runs off the main thread. A live report's eight
 * formulas over the live size (250,000 numbers of predictors: 275,000 to 300,000 cells a call)
 * held the preview's thread for 260–390 ms in one recalculation when run in place on this
 * machine class, and 134–153 ms from the worker (test/preview/browser/longTasks.test.ts). At this
 * bound (5,000 rows × 20) a call's own work in place is a few milliseconds.
 */
export const OFF_THREAD_CELLS = 100_000;

/** What the page posts: the function's name, its arguments, and the invocation's parameter addresses. */
export interface FormulaRequest {
  id: number;
  name: string;
  args: unknown[];
  parameterAddresses: readonly unknown[] | undefined;
}

/** What the worker posts back: the grid, or the cell error the function threw. */
export type FormulaAnswer = { id: number; grid: GridInTransit } | { id: number; error: { code: string; message?: string } };

/** Set in the worker, where every call runs in place. */
let inWorker = false;

export function runEveryCallHere(): void {
  inWorker = true;
}

/** Cells in the arguments that are ranges (arrays of rows); a scalar counts as none. */
export function rangeCells(args: readonly unknown[]): number {
  let cells = 0;
  for (const argument of args) {
    if (!Array.isArray(argument)) continue;
    for (const row of argument as unknown[]) cells += Array.isArray(row) ? row.length : 1;
  }
  return cells;
}

interface Pending {
  resolve: (grid: unknown[][]) => void;
  reject: (error: unknown) => void;
}

let worker: Worker | undefined;
const pending = new Map<number, Pending>();
let nextId = 0;

function formulaWorker(): Worker {
  if (worker !== undefined) return worker;
  const started = new Worker(/* webpackChunkName: "formula-worker" */ new URL('./formulaWorker.ts', import.meta.url));
  started.onmessage = (event: MessageEvent<FormulaAnswer>) => {
    const answer = event.data;
    const waiting = pending.get(answer.id);
    if (waiting === undefined) return;
    pending.delete(answer.id);
    if ('grid' in answer) waiting.resolve(gridIn(answer.grid, errorValue));
    else waiting.reject(errorValue(answer.error.code, answer.error.message));
  };
  // A worker that fails to load or dies fails every call in flight with a message, never silently.
  started.onerror = (event) => {
    event.preventDefault();
    for (const waiting of pending.values())
      waiting.reject(errorValue('#VALUE!', `Plumbline's background calculation stopped (${event.message}). Recalculate to try again.`));
    pending.clear();
    // The next large call starts a fresh worker.
    started.terminate();
    worker = undefined;
  };
  worker = started;
  return started;
}

/**
 * `here()` where the call is small, or where it is already off the main thread or no Worker
 * exists; else the same function in the worker, as a promise. The promise is returned under the
 * grid's own type because the metadata generator declares a matrix result only for a function
 * typed `any[][]` (or a Promise of one): the function cannot be typed as either-or.
 */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- Excel's own result type for a grid
export function offThreadWhenLarge(name: string, args: unknown[], invocation: CustomFunctions.Invocation | undefined, here: () => any[][]): any[][] {
  if (inWorker || typeof Worker === 'undefined' || rangeCells(args) <= OFF_THREAD_CELLS) return here();
  const id = nextId++;
  const promise = new Promise<unknown[][]>((resolve, reject) => {
    pending.set(id, { resolve, reject });
    // Packed in a task of its own: the host's recalculation task, which calls every formula in
    // turn, then carries none of this call's work (a pass over its cells, about 15 ms a million).
    setTimeout(() => {
      try {
        const out = args.map(argumentOut);
        const request: FormulaRequest = { id, name, args: out.map((a) => a.value), parameterAddresses: invocation?.parameterAddresses };
        formulaWorker().postMessage(
          request,
          out.flatMap((a) => a.transfer),
        );
      } catch (error) {
        pending.delete(id);
        reject(toCellError(error));
      }
    }, 0);
  });
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- see above: Excel awaits the promise
  return promise as unknown as any[][];
}
