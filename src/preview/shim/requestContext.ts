/**
 * The request context: one queue of operations per context, run in order at `sync()`. Reads,
 * writes and object look-ups all go through the queue so that they fail, and take effect, at
 * the same point in the batch as they would in Excel; an operation that throws stops the batch
 * and leaves the ones before it applied.
 */
import type { WorkbookModel } from '../workbook/types';
import { generalException, itemNotFound, OfficeExtensionError } from './officeErrors';
import { ShimWorkbook } from './workbook';

/**
 * A sheet as the proxies of one context know it. Proxies share the handle rather than a name so
 * that a rename made through the shim moves every proxy with it, as object identity does in Excel.
 */
export interface SheetHandle {
  name: string;
  deleted: boolean;
}

interface QueuedOperation {
  location: string;
  run(): void;
}

export class ShimRequestContext {
  readonly workbook: ShimWorkbook;
  private queue: QueuedOperation[] = [];
  private readonly handles: SheetHandle[] = [];

  constructor(readonly model: WorkbookModel) {
    this.workbook = new ShimWorkbook(this);
  }

  enqueue(location: string, run: () => void): void {
    this.queue.push({ location, run });
  }

  get hasPendingOperations(): boolean {
    return this.queue.length > 0;
  }

  /**
   * Runs the queue synchronously and settles afterwards, so later calls queue for the next sync
   * exactly as they would while a real request is in flight.
   */
  sync<T>(passThroughValue?: T): Promise<T> {
    const operations = this.queue;
    this.queue = [];
    for (const operation of operations) {
      try {
        operation.run();
      } catch (error) {
        return Promise.reject(error instanceof OfficeExtensionError ? error : generalException(operation.location, error));
      }
    }
    return Promise.resolve(passThroughValue as T);
  }

  /** Excel matches sheet names without regard to case. */
  findSheet(name: string): SheetHandle | undefined {
    const wanted = name.toLocaleUpperCase();
    const actual = this.model.sheetNames().find((candidate) => candidate.toLocaleUpperCase() === wanted);
    return actual === undefined ? undefined : this.handleFor(actual);
  }

  handleFor(actualName: string): SheetHandle {
    const existing = this.handles.find((handle) => !handle.deleted && handle.name === actualName);
    if (existing) return existing;
    const handle: SheetHandle = { name: actualName, deleted: false };
    this.handles.push(handle);
    return handle;
  }

  /** The sheet's current name, or ItemNotFound when it was deleted (here or in the grid). */
  liveSheet(handle: SheetHandle, location: string): string {
    if (handle.deleted || !this.model.hasSheet(handle.name)) throw itemNotFound(location);
    return handle.name;
  }
}
