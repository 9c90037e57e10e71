import type { CollinearityReason } from '../engine';
import { CONDITION_BANDS } from './thresholds';

/** Why a term has no VIF, in words. */
export const COLLINEARITY_REASON_TEXT: Record<CollinearityReason, string> = {
  constant: 'constant: the column does not vary',
  collinear: 'perfectly collinear: an exact combination of the other terms',
  'spans-intercept': 'with other terms it sums to a constant, standing in for the intercept: no centered VIF',
};

/** The condition number of the unit-scaled design, read by the bands of thresholds.ts. */
export function conditionReading(conditionNumber: number): string {
  if (conditionNumber === Number.POSITIVE_INFINITY) return 'infinite: some terms are exact combinations of others';
  if (!Number.isFinite(conditionNumber)) return 'not defined';
  if (conditionNumber < CONDITION_BANDS.mild) return 'no sign of harmful collinearity';
  if (conditionNumber < CONDITION_BANDS.moderate) return 'mild dependence among the columns';
  if (conditionNumber < CONDITION_BANDS.serious) return 'moderate to strong collinearity: see which terms have large VIFs';
  return 'serious collinearity: individual estimates are unreliable';
}
