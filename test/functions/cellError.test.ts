/**
 * The one adapter that builds errors for cells. "Handle and return errors from your custom
 * function": a function returns an error through CustomFunctions.Error with an ErrorCode;
 * custom messages are only available with #VALUE! and #N/A; #NAME? and #REF! are supported as
 * input errors but not as output errors. Checked with a stand-in for the runtime's global, whose
 * ErrorCode values are those of @types/custom-functions-runtime.
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { errorValue, toCellError } from '../../src/functions/cellError';
import { EngineError } from '../../src/engine';

class StandInError {
  constructor(
    readonly code: string,
    readonly message?: string,
  ) {}
}

const ErrorCode = {
  invalidValue: '#VALUE!',
  notAvailable: '#N/A',
  divisionByZero: '#DIV/0!',
  invalidNumber: '#NUM!',
  nullReference: '#NULL!',
  invalidName: '#NAME?',
  invalidReference: '#REF!',
};

afterEach(() => vi.unstubAllGlobals());

describe.each([
  ['in Node (no runtime)', () => undefined, false],
  ['with the runtime global', () => vi.stubGlobal('CustomFunctions', { Error: StandInError, ErrorCode }), true],
])('cell errors %s', (_, install, fromRuntime) => {
  it('a failure is #VALUE! with its message', () => {
    install();
    const error = toCellError(new EngineError('bad-value', 'predictors cell Data!C5 holds the error #DIV/0!.'));
    expect(error.code).toBe('#VALUE!');
    expect(error.message).toBe('predictors cell Data!C5 holds the error #DIV/0!.');
  });

  it('an error value keeps a returnable code and carries no message', () => {
    install();
    for (const code of ['#N/A', '#DIV/0!', '#NUM!', '#NULL!', '#VALUE!']) {
      const error = errorValue(code);
      expect(error instanceof StandInError).toBe(fromRuntime);
      expect(error.code).toBe(code);
      expect(error.message ?? '').toBe('');
    }
  });

  it('an input-only error becomes #VALUE! with a message naming the original', () => {
    install();
    for (const code of ['#REF!', '#NAME?', '#SPILL!', '#CALC!']) {
      const error = errorValue(code);
      expect(error.code).toBe('#VALUE!');
      expect(error.message).toContain(code);
    }
  });
});
