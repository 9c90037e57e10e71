import type { PaneChoices } from './model/choices';

/**
 * The inputs that decide which cells are read. Settings (level, intercept, σ, robust, the added
 * set) are applied to the data already read, so they refit at once; these need a new read.
 */
const READ_INPUTS = { response: 'the response', predictors: 'the predictors', weights: 'the weights', newRows: 'the new rows' } as const;

export type ReadInput = keyof typeof READ_INPUTS;

/** The read inputs whose addresses differ from those the shown results were read from. */
export function changedReadInputs(read: PaneChoices, current: PaneChoices): ReadInput[] {
  return (Object.keys(READ_INPUTS) as ReadInput[]).filter((field) => read[field].trim() !== current[field].trim());
}

function listed(names: readonly string[]): string {
  return names.length <= 1 ? names.join('') : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

/**
 * Why the results shown may no longer describe the inputs, or undefined when they do. Write
 * report reads the data again first in either case, so the report and the cards always agree.
 */
export function staleMessage(changed: readonly ReadInput[], dataChanged: boolean): string | undefined {
  if (changed.length > 0) {
    const what = listed(changed.map((field) => READ_INPUTS[field]));
    return `Out of date: ${what} changed since the data were read. Press Read data and fit to update these results (Write report reads the data again first).`;
  }
  if (dataChanged) {
    return 'These results may be out of date: cells on the data’s sheets changed since they were read. Press Read data and fit to update them (Write report reads the data again first).';
  }
  return undefined;
}
