/**
 * What the preview learns from functions.json, as Excel does: the shape of every parameter,
 * whether it may receive error values, and whether the function wants its arguments' addresses.
 * Field names and defaults follow "Manually create JSON metadata for custom functions".
 */

export interface ParameterShape {
  dimensionality: 'scalar' | 'matrix';
  optional: boolean;
  /** Only the last parameter may repeat; each argument given for it becomes one array element. */
  repeating?: boolean;
  /** The top-level allowErrorForDataTypeAny is set and the parameter's type is "any". */
  acceptsErrors?: boolean;
}

export interface FunctionShape {
  id: string;
  parameters: ParameterShape[];
  /** options.requiresParameterAddresses: the invocation argument carries parameterAddresses. */
  requiresParameterAddresses?: boolean;
}

interface ParameterMetadata {
  type?: unknown;
  dimensionality?: unknown;
  optional?: unknown;
  repeating?: unknown;
}

interface FunctionMetadata {
  id?: unknown;
  parameters?: unknown;
  options?: { requiresParameterAddresses?: unknown };
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * The docs: allowErrorForDataTypeAny is a top-level property (default false) and lets every
 * parameter of type "any" receive errors; a parameter's type defaults to "any" and its
 * dimensionality to "scalar"; repeating parameters are optional by definition.
 */
export function shapesFromMetadata(metadata: unknown): FunctionShape[] {
  if (!isRecord(metadata) || !Array.isArray(metadata.functions)) throw new Error('functions.json has no "functions" array.');
  const errorsAllowed = metadata.allowErrorForDataTypeAny === true;
  return (metadata.functions as FunctionMetadata[]).map((f) => {
    if (typeof f.id !== 'string') throw new Error('A function in functions.json has no id.');
    const parameters = Array.isArray(f.parameters) ? (f.parameters as ParameterMetadata[]) : [];
    return {
      id: f.id,
      requiresParameterAddresses: f.options?.requiresParameterAddresses === true,
      parameters: parameters.map((p) => ({
        dimensionality: p.dimensionality === 'matrix' ? 'matrix' : 'scalar',
        optional: p.optional === true || p.repeating === true,
        repeating: p.repeating === true,
        acceptsErrors: errorsAllowed && (p.type === undefined || p.type === 'any'),
      })),
    };
  });
}
