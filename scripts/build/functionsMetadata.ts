/**
 * Post-processing of the functions.json that custom-functions-metadata generates from the JSDoc.
 *
 * Excel does not call a custom function whose argument holds an error value unless the metadata
 * allows it ("Handle and return errors from your custom function", section "Errors as custom
 * function inputs"), and the JSDoc autogeneration never writes that permission. The docs' metadata
 * reference ("Manually create JSON metadata for custom functions", allowErrorForDataTypeAny) puts
 * it at the top level of the file, beside `functions`, and says it covers every parameter whose
 * type is `any` (or `any[][]`); a parameter with no `type` defaults to `any`. So the build sets the
 * flag and refuses any parameter the flag would not cover: a typed parameter (number, string,
 * boolean) would still keep its function from running when its cell holds `#N/A`.
 */

export const ALLOW_ERRORS_FLAG = 'allowErrorForDataTypeAny';

interface ParameterMetadata {
  name: string;
  type?: string;
}

interface FunctionMetadata {
  id: string;
  parameters: ParameterMetadata[];
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function readFunctions(metadata: Record<string, unknown>): FunctionMetadata[] {
  const list = metadata.functions;
  if (!Array.isArray(list) || list.length === 0) throw new Error('functions.json lists no functions');
  return list.map((entry: unknown, index) => {
    if (!isRecord(entry) || typeof entry.id !== 'string' || !Array.isArray(entry.parameters)) {
      throw new Error(`functions.json entry ${index} has no id or no parameters array`);
    }
    const parameters = entry.parameters.map((p: unknown) => {
      if (!isRecord(p) || typeof p.name !== 'string') throw new Error(`${entry.id}: a parameter has no name`);
      return { name: p.name, type: typeof p.type === 'string' ? p.type : undefined };
    });
    return { id: entry.id, parameters };
  });
}

/** The parameters (as `FUNCTION.parameter`) that the top-level flag does not cover. */
export function parametersNotAcceptingErrors(metadata: Record<string, unknown>): string[] {
  return readFunctions(metadata).flatMap((fn) =>
    fn.parameters.filter((p) => p.type !== undefined && p.type !== 'any').map((p) => `${fn.id}.${p.name} (${p.type})`),
  );
}

/**
 * The generated metadata with `allowErrorForDataTypeAny: true` at its top level, placed right
 * after the generator's own top-level flag, as in the docs' example. Everything else is kept.
 */
export function allowErrorsAsInput(generatedJson: string): string {
  const parsed: unknown = JSON.parse(generatedJson);
  if (!isRecord(parsed)) throw new Error('functions.json is not a JSON object');
  const uncovered = parametersNotAcceptingErrors(parsed);
  if (uncovered.length > 0) {
    throw new Error(
      `These parameters are typed, so Excel would not pass them error values even with ${ALLOW_ERRORS_FLAG}: ` +
        `${uncovered.join(', ')}. Declare them as any (a cell) or any[][] (a range) and convert in src/functions/cellInput.ts.`,
    );
  }
  const { functions, ...topLevelFlags } = parsed;
  const withFlag = { ...topLevelFlags, [ALLOW_ERRORS_FLAG]: true, functions };
  return JSON.stringify(withFlag, null, 4);
}
