import type { FieldProblem } from '../model/choices';
import type { PaneAnalysis } from '../model/paneAnalysis';
import type { PaneState, RangeFieldName } from './paneState';

/** The engine's argument names, as its messages begin, and the pane's field for each. */
const FIELD_OF_ARGUMENT: Readonly<Record<string, RangeFieldName>> = {
  response: 'response',
  predictors: 'predictors',
  weights: 'weights',
  new_rows: 'newRows',
};

const ARGUMENT = '(response|predictors|weights|new_rows)';

/** `predictors cell Data!D8 ("Temp")` → `Data!D8 (Temp)`: the cell by its address, its column by its header. */
function withoutArgumentWords(message: string): string {
  return message.replace(
    new RegExp(`\\b${ARGUMENT} cell ('[^']*(?:''[^']*)*'!\\S+?|\\S+?)(?: \\("([^"]*)"\\))?(?=[ :;,.]|$)`, 'g'),
    (_all, _argument, address: string, name?: string) => (name === undefined ? address : `${address} (${name})`),
  );
}

/** `response has 3 columns` → `The response has 3 columns`. */
function leadingArgumentInWords(message: string): string {
  return message.replace(new RegExp(`^${ARGUMENT}\\b`), (argument) => `The ${argument.replace('_', ' ')}`);
}

/**
 * The field a failure to read the data is about, and the message in the pane's words, or undefined
 * when it names no single field. The engine's messages name a cell as `<argument> cell <address>`
 * and otherwise begin with the argument (engine/design/modelFrame.ts); a cell named anywhere wins,
 * since `response starts with a header but predictors cell …` is about the predictors' cell.
 */
export function fieldOfFailure(message: string): FieldProblem | undefined {
  const cell = new RegExp(`\\b${ARGUMENT} cell `).exec(message);
  const rows = new RegExp(`^response has \\d+ rows but ${ARGUMENT} has`).exec(message);
  const leading = new RegExp(`^${ARGUMENT}\\b`).exec(message);
  const argument = cell?.[1] ?? rows?.[1] ?? leading?.[1];
  if (argument === undefined) return undefined;
  const field = FIELD_OF_ARGUMENT[argument];
  const plain = withoutArgumentWords(message);
  // The mismatched range is the field the message sits beside: "this range" is that field.
  const worded =
    rows === null ? leadingArgumentInWords(plain) : plain.replace(/^response has (\d+) rows but \S+ has/, 'The response has $1 rows but this range has');
  return { field, message: worded };
}

/** A failure to predict the new rows sits beside the New rows field, whatever it names. */
export function newRowsFailure(message: string): FieldProblem {
  return { field: 'newRows', message: withoutArgumentWords(message) };
}

/** Why the analysis of the data read failed on `field`, while that field still holds what was read. */
export function analysisProblemOf(
  field: RangeFieldName,
  state: Pick<PaneState, 'choices' | 'readChoices'>,
  analysis: PaneAnalysis | string | undefined,
): string | undefined {
  const { choices, readChoices } = state;
  if (readChoices === undefined || choices[field] !== readChoices[field]) return undefined;
  const problem = analysisProblem(analysis);
  return problem?.field === field ? problem.message : undefined;
}

/** The one field problem a read's analysis has, if its failure names a field. */
export function analysisProblem(analysis: PaneAnalysis | string | undefined): FieldProblem | undefined {
  if (typeof analysis === 'string') return fieldOfFailure(analysis);
  return analysis?.predictionError === undefined ? undefined : newRowsFailure(analysis.predictionError);
}
