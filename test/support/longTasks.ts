/**
 * Long tasks on the page's main thread, recorded by a PerformanceObserver of type "longtask"
 * (W3C Long Tasks API: every task of 50 ms or more) from the moment it is started, nothing
 * buffered from before.
 */
import type { Page } from 'playwright-core';

interface Recorder {
  durations: number[];
  observer: PerformanceObserver;
}

type RecordingWindow = Window & { longTaskRecorder?: Recorder };

export async function startLongTaskRecording(page: Page): Promise<void> {
  await page.evaluate(() => {
    const durations: number[] = [];
    const observer = new PerformanceObserver((list) => {
      for (const entry of list.getEntries()) durations.push(entry.duration);
    });
    observer.observe({ type: 'longtask', buffered: false });
    (window as RecordingWindow).longTaskRecorder = { durations, observer };
  });
}

/** Stops the recording once the page has had two frames and a pause to report, and returns each long task's duration in ms. */
export function stopLongTaskRecording(page: Page): Promise<number[]> {
  return page.evaluate(async () => {
    const recorder = (window as RecordingWindow).longTaskRecorder;
    if (recorder === undefined) throw new Error('No long-task recording was started.');
    await new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve)));
    await new Promise((resolve) => setTimeout(resolve, 100));
    for (const entry of recorder.observer.takeRecords()) recorder.durations.push(entry.duration);
    recorder.observer.disconnect();
    return recorder.durations;
  });
}

/** The bound on one task of the page's main thread (#15, target 6). */
export const LONGEST_TASK_MS = 200;

/** The tasks over the bound. */
export function tooLong(durations: readonly number[]): number[] {
  return durations.filter((ms) => ms > LONGEST_TASK_MS);
}

/** Every long task recorded, for the failure message. */
export function listed(durations: readonly number[]): string {
  return `long tasks (ms): ${durations.map((ms) => ms.toFixed(0)).join(', ') || 'none'}`;
}
