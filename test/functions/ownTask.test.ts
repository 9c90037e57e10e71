// The cell functions' work queue (src/functions/ownTask.ts): each piece of work runs after the
// call has returned, in a task of its own, in call order, and a failure reaches the caller as the
// very error thrown. Task order is that of the HTML event loop (common practice, no source).
import { describe, expect, it } from 'vitest';
import { onItsOwnTask } from '../../src/functions/ownTask';

describe('onItsOwnTask', () => {
  it('returns before the work runs, then settles with its result', async () => {
    const ran: string[] = [];
    const pending = onItsOwnTask(() => {
      ran.push('work');
      return 42;
    });
    ran.push('returned');
    expect(ran).toEqual(['returned']);
    await expect(pending).resolves.toBe(42);
    expect(ran).toEqual(['returned', 'work']);
  });

  it('runs queued work in call order, each after the microtasks queued before it', async () => {
    const ran: string[] = [];
    const first = onItsOwnTask(() => {
      ran.push('first');
      // A microtask queued by the first piece runs before the second piece: they are separate tasks.
      void Promise.resolve().then(() => ran.push('first’s microtask'));
    });
    const second = onItsOwnTask(() => ran.push('second'));
    await Promise.all([first, second]);
    expect(ran).toEqual(['first', 'first’s microtask', 'second']);
  });

  it('rejects with the error the work threw, and the queue goes on', async () => {
    const failure = new Error('bad cell');
    const failing = onItsOwnTask(() => {
      throw failure;
    });
    const next = onItsOwnTask(() => 'still runs');
    await expect(failing).rejects.toBe(failure);
    await expect(next).resolves.toBe('still runs');
  });
});
