/**
 * How a PLUMB call is spelled inside an xlsx file. Excel saves a JavaScript custom function's
 * call under the prefix `_xldudf_`, with the namespace's dot as an underscore
 * (`PLUMB.ESTIMATES(` is stored as `_xldudf_PLUMB_ESTIMATES(`), and on opening resolves only that
 * spelling to the add-in's function: a plain `PLUMB.ESTIMATES(` in the file stays #NAME? (a
 * Microsoft engineer in OfficeDev/Excel-Custom-Functions issue 108: "For Javascript Custom
 * Functions, we by default save out with a different prefix _xldudf").
 */
const TYPED_CALL = /\bPLUMB\.([A-Z][A-Z0-9]*)\(/g;
const STORED_CALL = /\b_xldudf_PLUMB_([A-Z][A-Z0-9]*)\(/gi;

export function toStoredFormula(typed: string): string {
  return typed.replace(TYPED_CALL, (_, name: string) => `_xldudf_PLUMB_${name}(`);
}

export function toTypedFormula(stored: string): string {
  return stored.replace(STORED_CALL, (_, name: string) => `PLUMB.${name.toUpperCase()}(`);
}
