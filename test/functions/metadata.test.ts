/**
 * The help text users see in formula autocomplete is generated from functions.ts's JSDoc by
 * custom-functions-metadata (the generator the build plugin uses). Every function and parameter
 * must be described, ranges must be matrices, and the shared settings must sit in the same order.
 */
import { resolve } from 'node:path';
import { generateCustomFunctionsMetadata } from 'custom-functions-metadata';
import { beforeAll, describe, expect, it } from 'vitest';

interface Parameter {
  name: string;
  description?: string;
  dimensionality?: string;
  optional?: boolean;
  repeating?: boolean;
  type?: string;
}
interface FunctionMetadata {
  id: string;
  description?: string;
  options?: { requiresParameterAddresses?: boolean };
  parameters: Parameter[];
  result: { dimensionality?: string };
}

const DATA_ARGUMENTS: Record<string, string[]> = {
  TERMS: ['response', 'predictors'],
  ESTIMATES: ['response', 'predictors'],
  STDERRORS: ['response', 'predictors'],
  INTERVALS: ['response', 'predictors'],
  COVARIANCE: ['response', 'predictors'],
  FITSTATS: ['response', 'predictors'],
  EQUATION: ['response', 'predictors'],
  NESTEDF: ['response', 'base', 'added'],
  PREDICT: ['response', 'predictors', 'new_rows'],
  RESIDUALS: ['response', 'predictors'],
  QQPOINTS: ['response', 'predictors'],
  COLLINEARITY: ['predictors'],
  CHECKS: ['response', 'predictors'],
  COMPARE: ['response', 'predictors', 'candidates'],
};
const SETTINGS = ['level', 'intercept', 'noise_sd', 'weights', 'robust'];

let functions: FunctionMetadata[];

beforeAll(async () => {
  const result = await generateCustomFunctionsMetadata(resolve(__dirname, '../../src/functions/functions.ts'));
  expect(result.errors).toEqual([]);
  functions = (JSON.parse(result.metadataJson) as { functions: FunctionMetadata[] }).functions;
});

describe('generated function metadata', () => {
  it('lists exactly the fifteen PLUMB functions', () => {
    expect(functions.map((f) => f.id).sort()).toEqual([...Object.keys(DATA_ARGUMENTS), 'GATHER'].sort());
  });

  // "Manually create JSON metadata for custom functions" (options: requiresParameterAddresses,
  // which needs a matrix result) and "Custom functions parameter options" (the invocation
  // parameter is passed by Excel, never shown to the user as an argument).
  it('asks for parameter addresses in every function, and never lists the invocation as a parameter', () => {
    for (const fn of functions) {
      expect(fn.options?.requiresParameterAddresses).toBe(true);
      expect(fn.result.dimensionality).toBe('matrix');
      expect(fn.parameters.map((p) => p.name)).not.toContain('invocation');
    }
  });

  // "Custom functions parameter options" (Repeating parameters): an any[][][] parameter becomes
  // repeating, a matrix of type any ("allowErrorForDataTypeAny" applies to any and any[][]).
  it('GATHER takes one repeating matrix parameter of any type', () => {
    const fn = functions.find((f) => f.id === 'GATHER')!;
    expect(fn.description?.length ?? 0).toBeGreaterThan(30);
    expect(fn.parameters).toHaveLength(1);
    const [areas] = fn.parameters;
    expect(areas).toMatchObject({ name: 'areas', repeating: true, dimensionality: 'matrix', type: 'any' });
    expect(areas.description?.length ?? 0).toBeGreaterThan(10);
  });

  it.each(Object.entries(DATA_ARGUMENTS))('%s: data ranges, then level, intercept, noise_sd, weights, robust', (id, data) => {
    const fn = functions.find((f) => f.id === id)!;
    expect(fn.description?.length ?? 0).toBeGreaterThan(30);
    expect(fn.parameters.map((p) => p.name)).toEqual([...data, ...SETTINGS]);
    for (const p of fn.parameters) expect(p.description?.length ?? 0).toBeGreaterThan(10);
    for (const p of fn.parameters.slice(0, data.length)) {
      expect(p.dimensionality).toBe('matrix');
      expect(p.optional ?? false).toBe(false);
    }
    const [level, intercept, sigma, weights, robust] = fn.parameters.slice(data.length);
    for (const p of [level, intercept, sigma, weights, robust]) expect(p.optional).toBe(true);
    expect(level.dimensionality ?? 'scalar').toBe('scalar');
    expect(robust.dimensionality ?? 'scalar').toBe('scalar');
    expect(weights.dimensionality).toBe('matrix');
    expect(fn.result.dimensionality).toBe('matrix');
  });

  // Our own names (issue #14): the argument names of the spreadsheet's built-in regression
  // functions, and names built on them, appear in no parameter name and no help text.
  it("uses none of the built-in regression functions' argument names", () => {
    const borrowed = ['known_y', 'known_x', 'new_x', 'base_x', 'added_x', 'known_sigma'];
    for (const fn of functions) {
      for (const p of fn.parameters) {
        expect(borrowed).not.toContain(p.name);
        for (const name of borrowed) expect(p.description ?? '').not.toContain(name);
      }
      for (const name of borrowed) expect(fn.description ?? '').not.toContain(name);
    }
  });
});
