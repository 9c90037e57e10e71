/**
 * Runs each cell function's work in a task of its own on the page's main thread.
 *
 * In the shared runtime the functions run on the same thread as the task pane, and while one runs
 * nothing else does ("Custom function sample using web worker", OfficeDev/Office-Add-in-samples:
 * "custom functions block the UI of your Office Add-in when they run"). A recalculation calls every
 * dirty formula one after another, so a report's formulas computed on the spot add up to one long
 * task. Instead each call returns a promise at once, which Excel waits for before it shows the
 * result ("Receive and handle data with custom functions", learn.microsoft.com), and its work
 * waits in a queue; the queue runs one
 * piece of work per task, in call order, so the page paints and handles input between formulas and
 * no task holds more than one formula's work.
 */

type Job = () => void;

const queue: Job[] = [];
let draining = false;

/**
 * A new task, not a microtask: a microtask would run before the page could do anything else.
 * Node (the tests and the bench) has setImmediate; a browser posts to itself through a
 * MessageChannel, which unlike a chain of setTimeout calls is never clamped to 4 ms.
 */
const nextTask: (run: () => void) => void = (() => {
  const immediate = (globalThis as { setImmediate?: (run: () => void) => unknown }).setImmediate;
  if (immediate !== undefined) return (run) => void immediate(run);
  const channel = new MessageChannel();
  let pending: (() => void) | undefined;
  channel.port1.onmessage = () => pending?.();
  return (run) => {
    pending = run;
    channel.port2.postMessage(null);
  };
})();

function runNext(): void {
  const job = queue.shift();
  if (queue.length > 0) nextTask(runNext);
  else draining = false;
  job?.();
}

/** `work`'s result (or its error) in a later task of its own, after the work queued before it. */
export function onItsOwnTask<T>(work: () => T): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    queue.push(() => {
      try {
        resolve(work());
      } catch (error) {
        // The cell error as thrown (CustomFunctions.Error in a host), so Excel shows its code and message.
        reject(error);
      }
    });
    if (!draining) {
      draining = true;
      nextTask(runNext);
    }
  });
}
