/**
 * The errors the real API reports, with its codes and (English) messages, so add-in code that
 * branches on `error.code` or shows `error.message` behaves as it would in Excel.
 */

export interface ShimDebugInfo {
  code: string;
  message: string;
  errorLocation?: string;
}

/** Stands in for OfficeExtension.Error: what a failed `context.sync()` rejects with. */
export class OfficeExtensionError extends Error {
  readonly code: string;
  readonly debugInfo: ShimDebugInfo;
  readonly traceMessages: string[] = [];
  readonly innerError: OfficeExtensionError | null = null;
  readonly httpStatusCode: number;

  constructor(code: string, message: string, errorLocation?: string, httpStatusCode = 400) {
    super(message);
    // The @types/office-js documentation gives this as the error's name.
    this.name = 'OfficeExtension.Error';
    this.code = code;
    this.httpStatusCode = httpStatusCode;
    this.debugInfo = errorLocation === undefined ? { code, message } : { code, message, errorLocation };
  }
}

export function itemNotFound(location: string): OfficeExtensionError {
  return new OfficeExtensionError('ItemNotFound', "The requested resource doesn't exist.", location, 404);
}

export function invalidArgument(location: string): OfficeExtensionError {
  return new OfficeExtensionError('InvalidArgument', 'The argument is invalid or missing or has an incorrect format.', location);
}

export function itemAlreadyExists(location: string): OfficeExtensionError {
  return new OfficeExtensionError('ItemAlreadyExists', 'The resource already exists.', location, 409);
}

// Messages from the table in "Error handling with the application-specific JavaScript APIs".
export function invalidOperation(location: string): OfficeExtensionError {
  return new OfficeExtensionError('InvalidOperation', 'The operation attempted is invalid on the object.', location);
}

export function invalidSelection(location: string): OfficeExtensionError {
  return new OfficeExtensionError('InvalidSelection', 'The current selection is invalid for this operation.', location);
}

export function cellEditError(code: 'InvalidOperation' | 'InvalidOperationInCellEditMode', location: string): OfficeExtensionError {
  if (code === 'InvalidOperation') return invalidOperation(location);
  return new OfficeExtensionError(
    code,
    "The operation isn't available while Excel is in Edit cell mode. Exit Edit mode by using the Enter or Tab keys, or by selecting another cell, and then try again.",
    location,
  );
}

const RESOURCE_LIMITS = 'See the Resource limits and performance optimization for Office Add-ins article for more information.';

export function requestPayloadTooLarge(): OfficeExtensionError {
  return new OfficeExtensionError(
    'RequestPayloadSizeLimitExceeded',
    `The request payload size has exceeded the limit. ${RESOURCE_LIMITS}`,
    'RequestContext.sync',
  );
}

export function responsePayloadTooLarge(location: string): OfficeExtensionError {
  return new OfficeExtensionError('ResponsePayloadSizeLimitExceeded', `The response payload size has exceeded the limit. ${RESOURCE_LIMITS}`, location);
}

export function generalException(location: string, cause: unknown): OfficeExtensionError {
  const detail = cause instanceof Error ? cause.message : String(cause);
  const error = new OfficeExtensionError('GeneralException', 'There was an internal error while processing the request.', location, 500);
  // The real host keeps internals out of the message; the preview keeps them in debugInfo so a
  // failure inside the workbook model can still be diagnosed.
  error.debugInfo.message = `${error.message} (preview workbook: ${detail})`;
  return error;
}

/** For members of the real API that the preview does not implement: say so plainly. */
export function notInPreview(member: string): OfficeExtensionError {
  return new OfficeExtensionError('ApiNotFound', `${member} is not available in the preview workbook.`, member, 404);
}

export function propertyNotLoaded(property: string, typeName: string): OfficeExtensionError {
  return new OfficeExtensionError(
    'PropertyNotLoaded',
    `The property '${property}' is not available. Before reading the property's value, call the load method on the containing object and call "context.sync()" on the associated request context.`,
    `${typeName}.${property}`,
  );
}
