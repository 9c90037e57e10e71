/**
 * Where a PLUMB call runs: in place at the live size and below, and wherever no Worker exists
 * (Node, these tests); the counting of a call's cells. Apart from formulaWorker.test.ts, whose
 * import marks every call as already off the main thread. Expectations worked by hand (common
 * practice (no source)); the browser side is test/preview/browser/longTasksAboveLiveSize.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { offThreadWhenLarge, OFF_THREAD_CELLS, rangeCells } from '../../../src/functions/offThread/offThread';

const u = undefined;
const response = [['Yield'], ...Array.from({ length: 30 }, (_, i) => [i])];
const predictors = [['Temp', 'Time'], ...Array.from({ length: 30 }, (_, i) => [i, -i])];

describe('where a call runs', () => {
  it('counts the cells of range arguments only', () => {
    expect(rangeCells([response, predictors, 0.95, 'HC3', null])).toBe(31 + 62);
  });

  it('runs in place where there is no Worker (Node), however many cells', () => {
    expect(typeof Worker).toBe('undefined');
    const big = Array.from({ length: OFF_THREAD_CELLS + 1 }, () => [1]);
    let ran = 0;
    const grid = offThreadWhenLarge('terms', [big], u, () => {
      ran++;
      return [['here']];
    });
    expect(grid).toEqual([['here']]);
    expect(ran).toBe(1);
  });
});

/** A stand-in for the browser's Worker: keeps what the page posts, and answers or fails on the test's word. */
class FakeWorker {
  static started: FakeWorker[] = [];
  onmessage: ((event: { data: unknown }) => void) | null = null;
  onerror: ((event: { message: string; preventDefault: () => void }) => void) | null = null;
  posted: { message: unknown; transfer: unknown[] }[] = [];
  terminated = false;
  constructor(readonly url: URL) {
    FakeWorker.started.push(this);
  }
  postMessage(message: unknown, transfer: unknown[]): void {
    this.posted.push({ message, transfer });
  }
  terminate(): void {
    this.terminated = true;
  }
}

describe('the page side of a large call', () => {
  const large = Array.from({ length: OFF_THREAD_CELLS + 1 }, (_, i) => [i]);
  const settle = () => new Promise((resolve) => setTimeout(resolve, 5));

  it('posts the function, its packed ranges and addresses, and resolves with the grid the worker answers', async () => {
    const previous = (globalThis as { Worker?: unknown }).Worker;
    (globalThis as { Worker?: unknown }).Worker = FakeWorker;
    try {
      const here = () => [['never here']];
      const result = offThreadWhenLarge(
        'residuals',
        [large, 0.9],
        { parameterAddresses: ['Data!A1:A100002', ''] } as CustomFunctions.Invocation,
        here,
      ) as unknown as Promise<unknown[][]>;
      expect(result).toBeInstanceOf(Promise);
      await settle();
      const worker = FakeWorker.started[0];
      expect(worker.url.pathname).toMatch(/formulaWorker\.ts$/);
      const request = worker.posted[0].message as { id: number; name: string; args: unknown[]; parameterAddresses: unknown[] };
      expect(request).toMatchObject({ name: 'residuals', parameterAddresses: ['Data!A1:A100002', ''] });
      expect(request.args[1]).toBe(0.9);
      expect(worker.posted[0].transfer.length).toBe(2);
      worker.onmessage?.({
        data: {
          id: request.id,
          grid: { widths: Int32Array.from([2, 2]), columns: [Float64Array.from([1, 3]), ['x', { errorInTransit: '#N/A', message: 'none' }]] },
        },
      });
      const grid = await result;
      expect(grid[0]).toEqual([1, 'x']);
      expect(grid[1][0]).toBe(3);
      // In Node the host's error value is cellError.ts's stand-in, with the same code and message.
      expect(grid[1][1]).toMatchObject({ code: '#N/A', message: 'none' });

      // A worker that fails rejects every call in flight with a message and is replaced at the next call.
      const failing = offThreadWhenLarge('terms', [large], undefined, here) as unknown as Promise<unknown[][]>;
      await settle();
      worker.onerror?.({ message: 'out of memory', preventDefault: () => undefined });
      await expect(failing).rejects.toMatchObject({ code: '#VALUE!', message: expect.stringContaining('out of memory') });
      expect(worker.terminated).toBe(true);
      void offThreadWhenLarge('terms', [large], undefined, here);
      await settle();
      expect(FakeWorker.started.length).toBe(2);
    } finally {
      (globalThis as { Worker?: unknown }).Worker = previous;
    }
  });
});
