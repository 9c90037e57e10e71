/**
 * The worker has no CustomFunctions: the build appends CustomFunctions.associate calls to
 * functions.ts (custom-functions-metadata-plugin), which the worker imports to run the very same
 * functions. Registration belongs to the page, so here it does nothing. Imported first by
 * formulaWorker.ts, before functions.ts is evaluated. Without CustomFunctions.Error the functions
 * throw their Node stand-in, CellFunctionError, which formulaWorker.ts turns into a message.
 */
(globalThis as { CustomFunctions?: unknown }).CustomFunctions = { associate: (): void => undefined };
