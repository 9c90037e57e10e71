/** The CustomFunctions global: registration into the model, and the error a function throws. */
import type { CustomFunction, WorkbookModel } from '../workbook/types';

export { CustomFunctionsError, CustomFunctionsErrorCode } from '../workbook/customFunctionError';

export interface FunctionRegistrationHost {
  onFunctionRegistered?(id: string): void;
}

function isCustomFunction(value: unknown): value is CustomFunction {
  return typeof value === 'function';
}

/** Ids are matched without regard to case, as Excel does; the model keys them in upper case. */
export function createAssociate(model: WorkbookModel, host: FunctionRegistrationHost | undefined) {
  // The build's generated code calls associate(id, fn) once per function; the mappings form is unused.
  return function associate(id: string, fn: unknown): void {
    if (typeof id !== 'string' || id === '' || !isCustomFunction(fn)) {
      throw new TypeError(`CustomFunctions.associate needs an id and a function; got ${typeof id} and ${typeof fn}.`);
    }
    const upper = id.toUpperCase();
    model.registerFunction(upper, fn);
    host?.onFunctionRegistered?.(upper);
  };
}
