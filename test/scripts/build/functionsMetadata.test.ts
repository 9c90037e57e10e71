/**
 * The functions.json post-processing. Where the flag goes and what it covers follow "Manually create
 * JSON metadata for custom functions" (metadata reference, allowErrorForDataTypeAny: a top-level
 * Boolean; parameters of type any accept errors; a parameter without type is any). The fixture is
 * shaped like custom-functions-metadata's output for two PLUMB-like functions.
 */
import { describe, expect, it } from 'vitest';
import { ALLOW_ERRORS_FLAG, allowErrorsAsInput, parametersNotAcceptingErrors } from '../../../scripts/build/functionsMetadata';

// A type alias (not an interface), so it is assignable to Record<string, unknown>.
type Fixture = {
  allowCustomDataForDataTypeAny: boolean;
  functions: { id: string; name: string; options?: Record<string, boolean>; parameters: Record<string, unknown>[]; result: Record<string, unknown> }[];
};

const generated: Fixture = {
  allowCustomDataForDataTypeAny: true,
  functions: [
    {
      id: 'ESTIMATES',
      name: 'ESTIMATES',
      options: { requiresParameterAddresses: true },
      parameters: [
        { name: 'response', type: 'any', dimensionality: 'matrix' },
        { name: 'predictors', type: 'any', dimensionality: 'matrix' },
        { name: 'level', type: 'any', optional: true },
      ],
      result: { dimensionality: 'matrix' },
    },
    { id: 'GATHER', name: 'GATHER', parameters: [{ name: 'areas', dimensionality: 'matrix', repeating: true }], result: { dimensionality: 'matrix' } },
  ],
};

describe('allowErrorsAsInput', () => {
  it('sets allowErrorForDataTypeAny at the top level, not inside a function or parameter', () => {
    const out = JSON.parse(allowErrorsAsInput(JSON.stringify(generated))) as Record<string, unknown> & Fixture;
    expect(out[ALLOW_ERRORS_FLAG]).toBe(true);
    expect(JSON.stringify(out.functions)).not.toContain(ALLOW_ERRORS_FLAG);
  });

  it('keeps everything the generator wrote', () => {
    const out = JSON.parse(allowErrorsAsInput(JSON.stringify(generated))) as Record<string, unknown>;
    const { [ALLOW_ERRORS_FLAG]: flag, ...rest } = out;
    expect(flag).toBe(true);
    expect(rest).toEqual(generated);
  });

  it('refuses a typed parameter, which the flag would not let an error reach', () => {
    const typed = structuredClone(generated);
    typed.functions[0].parameters[2].type = 'number';
    expect(parametersNotAcceptingErrors(typed)).toEqual(['ESTIMATES.level (number)']);
    expect(() => allowErrorsAsInput(JSON.stringify(typed))).toThrow(/ESTIMATES\.level \(number\)/);
  });

  it('refuses metadata without functions', () => {
    expect(() => allowErrorsAsInput(JSON.stringify({ functions: [] }))).toThrow(/no functions/);
    expect(() => allowErrorsAsInput('[]')).toThrow(/not a JSON object/);
  });
});
