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

/**
 * The preview's formulas have no error constants; `=PLUMB.TEST_NOT_AVAILABLE()` stands in for a
 * cell holding #N/A ("Handle and return errors from your custom function": a thrown
 * CustomFunctions.Error with code #N/A shows #N/A in its cell).
 */
export const NOT_AVAILABLE_CELL = '=PLUMB.TEST_NOT_AVAILABLE()';

export async function plumbPreview(firstSheet: string): Promise<PreviewWorkbook> {
  const generated = await generateCustomFunctionsMetadata(resolve(__dirname, '../../src/functions/functions.ts'));
  if (generated.errors.length > 0) throw new Error(generated.errors.join('\n'));
  const model = createWorkbook(firstSheet);
  installOfficeShim(model);
  model.loadFunctionMetadata(JSON.parse(allowErrorsAsInput(generated.metadataJson)));
  const exported = cellFunctions as Record<string, unknown>;
  for (const { id, functionName } of generated.associate) CustomFunctions.associate(id, exported[functionName] as (...args: unknown[]) => unknown);
  model.registerFunction('TEST_NOT_AVAILABLE', () => {
    throw new CustomFunctions.Error(CustomFunctions.ErrorCode.notAvailable);
  });
  return model;
}
