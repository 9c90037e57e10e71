import type { ReportCell } from './reportPlan';

/**
 * Pieces both report kinds write alike: the settings rows (label in A, value in B) and the model
 * equation with the user's column names. Weights are a row only where the report lists the
 * settings it used; the live report names them with its data, since its formulas hold the range
 * itself and no cell could switch it.
 */
export function settingsRows(
  top: number,
  settings: { level: number; intercept: boolean; knownSigma: number | undefined; standardErrors: { label: string; value: string }; weights?: string },
): ReportCell[] {
  const label = (row: number, column: number, text: string): ReportCell => ({ row, column, kind: 'label', text, bold: false });
  return [
    label(top, 0, 'Confidence level'),
    { row: top, column: 1, kind: 'value', value: settings.level },
    label(top + 1, 0, 'Intercept'),
    { row: top + 1, column: 1, kind: 'value', value: settings.intercept },
    label(top + 2, 0, 'Known sigma (empty: estimated)'),
    { row: top + 2, column: 1, kind: 'value', value: settings.knownSigma ?? '' },
    label(top + 3, 0, settings.standardErrors.label),
    label(top + 3, 1, settings.standardErrors.value),
    ...(settings.weights === undefined ? [] : [label(top + 4, 0, 'Weights'), label(top + 4, 1, settings.weights)]),
  ];
}

/**
 * The cautions every report ends with: association is not causation, extrapolation is risky, and
 * the inference rests on assumptions, worded for what the report can show of them.
 */
export function cautionLines(assumptions: string): string[] {
  return [
    'These are associations in the data, not proof of cause: a clear-of-zero term does not show that changing it will change the response.',
    'Predictions outside the range of the data are extrapolations and can be badly wrong, however narrow the intervals look.',
    assumptions,
  ];
}
