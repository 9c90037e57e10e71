/**
 * Every failure the engine reports on purpose. Callers (cell functions, the pane) map the code
 * to their own presentation; the message is already written for the person at the keyboard.
 */
export type EngineErrorCode =
  'shape' | 'non-finite' | 'bad-weight' | 'bad-setting' | 'no-residual-df' | 'nothing-added' | 'bad-value' | 'unknown-level' | 'no-rows';

export class EngineError extends Error {
  readonly code: EngineErrorCode;

  constructor(code: EngineErrorCode, message: string) {
    super(message);
    this.name = 'EngineError';
    this.code = code;
  }
}
