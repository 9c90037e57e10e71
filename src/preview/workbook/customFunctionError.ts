/**
 * CustomFunctions.Error, defined beside the model because the model hands error arguments to
 * functions in this shape; the shim installs the same class as the global, so `instanceof` holds.
 */

export const CustomFunctionsErrorCode = {
  invalidValue: '#VALUE!',
  notAvailable: '#N/A',
  divisionByZero: '#DIV/0!',
  invalidNumber: '#NUM!',
  nullReference: '#NULL!',
  invalidName: '#NAME?',
  invalidReference: '#REF!',
} as const;

/** What a cell function throws (or puts in a returned array) to show an error; the model reads `code` and `message`. */
export class CustomFunctionsError extends Error {
  readonly code: string;

  constructor(code: string = CustomFunctionsErrorCode.invalidValue, message?: string) {
    super(message);
    this.name = 'CustomFunctions.Error';
    this.code = code;
  }
}
