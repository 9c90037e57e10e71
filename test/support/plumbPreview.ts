/**
 * A preview workbook in Node with the shim installed and the real PLUMB functions registered as
 * the build registers them: functions.json generated from src/functions/functions.ts by
 * custom-functions-metadata, post-processed as the build does (scripts/build/functionsMetadata.ts),
 * and one CustomFunctions.associate per function the generator lists. So the preview host's
 * rules for arguments (errors, blanks as null, parameter addresses) apply exactly as in the page.
 */
import { resolve } from 'node:path';
import { generateCustomFunctionsMetadata } from 'custom-functions-metadata';
import { allowErrorsAsInput } from '../../scripts/build/functionsMetadata';
import * as cellFunctions from '../../src/functions/functions';
import { installOfficeShim } from '../../src/preview/shim/install';
import { createWorkbook, type PreviewWorkbook } from '../../src/preview/workbook/workbook';

/** The error codes a test can place in a cell through the stand-in below, by ErrorCode member. */
const STAND_IN_CODES = { '#N/A': 'notAvailable', '#DIV/0!': 'divisionByZero' } as const;

/**
 * The preview's formulas have no error constants; `=PLUMB.TEST_ERROR("#N/A")` stands in for a
 * cell holding that error ("Handle and return errors from your custom function": a thrown
 * CustomFunctions.Error with a code shows that error in its cell).
 */
export function errorCell(code: keyof typeof STAND_IN_CODES): string {
  return `=PLUMB.TEST_ERROR("${code}")`;
}

export const NOT_AVAILABLE_CELL = errorCell('#N/A');

export async function plumbPreview(firstSheet: string): Promise<PreviewWorkbook> {
  const generated = await generateCustomFunctionsMetadata(resolve(__dirname, '../../src/functions/functions.ts'));
  if (generated.errors.length > 0) throw new Error(generated.errors.join('\n'));
  const model = createWorkbook(firstSheet);
  installOfficeShim(model);
  model.loadFunctionMetadata(JSON.parse(allowErrorsAsInput(generated.metadataJson)));
  const exported = cellFunctions as Record<string, unknown>;
  for (const { id, functionName } of generated.associate) CustomFunctions.associate(id, exported[functionName] as (...args: unknown[]) => unknown);
  model.registerFunction('TEST_ERROR', (code: unknown) => {
    const member = STAND_IN_CODES[String(code) as keyof typeof STAND_IN_CODES];
    if (member === undefined) throw new Error(`TEST_ERROR has no stand-in for ${String(code)}.`);
    throw new CustomFunctions.Error(CustomFunctions.ErrorCode[member]);
  });
  return model;
}
