/**
 * Shared set-up for the shim suites: a fresh preview workbook with the shim installed over it,
 * and a way to get the OfficeExtension.Error a batch rejects with.
 */
import type { ShimSettings } from '../../../src/preview/shim/hostSettings';
import { installOfficeShim } from '../../../src/preview/shim/install';
import { createWorkbook, type PreviewWorkbook } from '../../../src/preview/workbook/workbook';

export function freshWorkbook(onFunctionRegistered?: (id: string) => void): PreviewWorkbook {
  const model = createWorkbook();
  installOfficeShim(model, onFunctionRegistered ? { onFunctionRegistered } : undefined);
  return model;
}

/** A fresh workbook and the shim's live settings (sync delay, payload limit, cell-edit error code). */
export function freshHost(settings?: Partial<ShimSettings>): { model: PreviewWorkbook; settings: ShimSettings } {
  const model = createWorkbook();
  return { model, settings: installOfficeShim(model, { settings }) };
}

/** Lets pending timers and promises run, so a test can see that something has not settled yet. */
export async function afterPendingWork(rounds = 5): Promise<void> {
  for (let i = 0; i < rounds; i++) await new Promise((resolve) => setTimeout(resolve, 0));
}

/** The error a promise rejects with, checked to be the OfficeExtension.Error the API promises. */
export async function officeError(promise: Promise<unknown>): Promise<OfficeExtension.Error> {
  let thrown: unknown;
  try {
    await promise;
  } catch (error) {
    thrown = error;
  }
  if (thrown === undefined) throw new Error('Expected the promise to reject.');
  if (!(thrown instanceof OfficeExtension.Error)) throw new Error(`Expected an OfficeExtension.Error, got ${String(thrown)}.`);
  return thrown;
}

/** The error a synchronous read throws, for properties read too early. */
export function thrownOfficeError(read: () => unknown): OfficeExtension.Error {
  try {
    read();
  } catch (error) {
    if (error instanceof OfficeExtension.Error) return error;
    throw new Error(`Expected an OfficeExtension.Error, got ${String(error)}.`, { cause: error });
  }
  throw new Error('Expected the read to throw.');
}

export const NOT_LOADED = (property: string): string =>
  `The property '${property}' is not available. Before reading the property's value, call the load method on the containing object and call "context.sync()" on the associated request context.`;
