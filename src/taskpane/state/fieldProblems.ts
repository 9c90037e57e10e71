import { type FieldProblem, levelProblem, type PaneChoices, resolveRanges } from '../model/choices';
import { noiseSdProblem } from '../model/noiseSdField';
import type { RangeFieldName } from './paneState';

export const RANGE_FIELDS: readonly RangeFieldName[] = ['response', 'predictors', 'weights', 'newRows'];

/** Only the range fields' problems are kept: σ and the level are judged afresh from what is typed. */
export function rangeProblems(problems: readonly FieldProblem[]): FieldProblem[] {
  return problems.filter((p) => (RANGE_FIELDS as readonly string[]).includes(p.field));
}

/**
 * After the user changed `fields`, each of them that showed a problem is checked again: the
 * message goes once the field is right, and is replaced when it is wrong in another way. A field
 * that showed nothing is not judged while the user is still choosing.
 */
export function recheckFields(problems: readonly FieldProblem[], fields: readonly RangeFieldName[], choices: PaneChoices): FieldProblem[] {
  const flagged = fields.filter((field) => problems.some((p) => p.field === field));
  if (flagged.length === 0) return [...problems];
  const isFlagged = (p: FieldProblem) => (flagged as readonly string[]).includes(p.field);
  const found = resolveRanges(choices).problems.filter(isFlagged);
  return [...problems.filter((p) => !isFlagged(p)), ...found];
}

/** The problem shown beside a field now, if any. */
export function problemOf(field: keyof PaneChoices, choices: PaneChoices, problems: readonly FieldProblem[]): string | undefined {
  if (field === 'knownSigma') return noiseSdProblem(choices.knownSigma);
  if (field === 'level') return levelProblem(choices.level);
  return problems.find((p) => p.field === field)?.message;
}
