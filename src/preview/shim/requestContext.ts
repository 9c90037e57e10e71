/**
 * The request context: one queue of operations per context, sent at `sync()` and run in order
 * when the request reaches the host, a macrotask (and the configured delay) later. Reads,
 * writes and object look-ups all go through the queue so that they fail, and take effect, at
 * the same point in the batch as they would in Excel; an operation that throws stops the batch
 * and leaves the ones before it applied. A request whose written data exceed the payload limit
 * is refused whole; a response that grows past it fails at the read that crosses it.
 */
import type { WorkbookModel } from '../workbook/types';
import { defaultSettings, payloadBytes, payloadLimit, type ShimSettings } from './hostSettings';
import { cellEditError, generalException, itemNotFound, OfficeExtensionError, requestPayloadTooLarge, responsePayloadTooLarge } from './officeErrors';
import { ShimWorkbook } from './workbook';

/**
 * A sheet as the proxies of one context know it. Proxies share the handle rather than a name so
 * that a sheet deleted through the shim is gone for every proxy of it, as object identity has it
 * in Excel, even when a new sheet of the same name is added later.
 */
export interface SheetHandle {
  readonly name: string;
  deleted: boolean;
}

interface QueuedOperation {
  location: string;
  run(): void;
  /** What the operation sends: the JSON size of the data it writes. */
  requestBytes: number;
}

function delay(ms: number): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, ms));
}

export class ShimRequestContext {
  readonly workbook: ShimWorkbook;
  private queue: QueuedOperation[] = [];
  private readonly handles: SheetHandle[] = [];
  private responseBytes = 0;
  /** Set by Excel.run({ delayForCellEdit: true }, …): syncs wait for cell editing to end instead of failing. */
  delayForCellEdit = false;

  constructor(
    readonly model: WorkbookModel,
    readonly settings: ShimSettings = defaultSettings(),
  ) {
    this.workbook = new ShimWorkbook(this);
  }

  enqueue(location: string, run: () => void, written?: unknown): void {
    this.queue.push({ location, run, requestBytes: written === undefined ? 0 : payloadBytes(written) });
  }

  /** Called for every property a load reads, so the response is measured as it is built. */
  countResponse(value: unknown, location: string): void {
    this.responseBytes += payloadBytes(value);
    if (this.responseBytes > payloadLimit(this.settings)) throw responsePayloadTooLarge(location);
  }

  /**
   * Takes the queue at once, so later calls queue for the next sync exactly as they would while
   * a real request is in flight, and settles after the request has been processed.
   */
  sync(): Promise<void> {
    const operations = this.queue;
    this.queue = [];
    const requestBytes = operations.reduce((sum, operation) => sum + operation.requestBytes, 0);
    return this.send(operations, requestBytes);
  }

  private async send(operations: readonly QueuedOperation[], requestBytes: number): Promise<void> {
    await delay(this.settings.syncDelayMs);
    // Nothing queued, nothing sent (from memory: Office.js makes no round trip for an empty
    // sync, such as Excel.run's final one after a batch that synced its own work).
    if (operations.length === 0) return;
    if (requestBytes > payloadLimit(this.settings)) throw requestPayloadTooLarge();
    await this.leaveCellEdit();
    this.responseBytes = 0;
    for (const operation of operations) {
      try {
        operation.run();
      } catch (error) {
        throw error instanceof OfficeExtensionError ? error : generalException(operation.location, error);
      }
    }
  }

  /** "Delay execution while cell is being edited": fail at once, or wait until the edit is committed or cancelled. */
  private async leaveCellEdit(): Promise<void> {
    if (!this.model.cellEditMode()) return;
    if (!this.delayForCellEdit) throw cellEditError(this.settings.cellEditErrorCode, 'RequestContext.sync');
    await new Promise<void>((resolve) => {
      const stop = this.model.subscribe(() => {
        if (this.model.cellEditMode()) return;
        stop();
        resolve();
      });
    });
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
