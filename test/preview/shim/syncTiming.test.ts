/**
 * Syncs take time: "Using the application-specific API model" says the APIs cannot interact
 * synchronously with the Office application, and sync() returns a promise resolved when the
 * application completes the queued actions. The preview processes each request after a
 * macrotask plus the configured delay; no test here measures time.
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { freshHost } from './harness';

afterEach(() => {
  vi.useRealTimers();
});

describe('sync timing', () => {
  it('applies queued writes only after a macrotask, not when sync() is called or in the next microtask', async () => {
    const { model } = freshHost();
    const context = new Excel.RequestContext();
    context.workbook.worksheets.getItem('Sheet1').getRange('A1').values = [[1]];
    const synced = context.sync();
    await Promise.resolve();
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 0 })).toBeNull();
    await synced;
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 0 })).toBe(1);
  });

  it('waits for the configured delay before the request is processed', async () => {
    vi.useFakeTimers();
    const { model } = freshHost({ syncDelayMs: 1_000 });
    const context = new Excel.RequestContext();
    context.workbook.worksheets.getItem('Sheet1').getRange('A1').values = [[2]];
    let settled = false;
    const synced = context.sync().then(() => {
      settled = true;
    });
    await vi.advanceTimersByTimeAsync(999);
    expect([settled, model.valueAt({ sheet: 'Sheet1', row: 0, column: 0 })]).toEqual([false, null]);
    await vi.advanceTimersByTimeAsync(1);
    await synced;
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 0 })).toBe(2);
  });

  it('has not written anything when a batch that was started but not awaited is left behind', async () => {
    const { model } = freshHost();
    const pending = Excel.run(async (context) => {
      context.workbook.worksheets.getItem('Sheet1').getRange('A1').values = [['block 1']];
      await context.sync();
    });
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 0 })).toBeNull();
    await pending;
    expect(model.valueAt({ sheet: 'Sheet1', row: 0, column: 0 })).toBe('block 1');
  });
});
