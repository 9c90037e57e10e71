import { changedReadInputs, staleMessage } from '../staleness';
import type { PaneState } from './paneState';

/** Why the results shown may no longer describe the inputs, or undefined when they do. */
export function staleNotice(state: PaneState): string | undefined {
  return state.readChoices === undefined ? undefined : staleMessage(changedReadInputs(state.readChoices, state.choices), state.dataChanged);
}

/** A read is running: Read and Refresh wait for it. */
export function isReading(state: PaneState): boolean {
  return state.reading !== undefined;
}
