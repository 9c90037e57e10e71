import { type CellGrid, cellPlace, classifyCell, describeCell, EngineError, type ModelFrame, type RangeOrigin } from '../engine';

/**
 * The candidates grid: one row per candidate model, one 0/1 (or FALSE/TRUE) cell per source
 * column of predictors, so a categorical column is switched on or off with all its indicators.
 * A blank is not read as 0: a half-filled grid is more likely a mistake than a choice.
 */
export interface CandidateChoice {
  /** Columns of predictors included, ascending. */
  sources: number[];
  /** The columns of the frame's design (frame.data.x) those bring in. */
  terms: number[];
}

/** origin: where the candidates grid sits on its worksheet, so messages name its cells by address. */
export function readCandidates(grid: CellGrid, frame: ModelFrame, origin?: RangeOrigin): CandidateChoice[] {
  const width = frame.columns.length;
  if (grid.length === 0 || grid.every((row) => row.length === 0)) {
    throw new EngineError('shape', `candidates is empty: give one row per candidate model, with a 1 or 0 for each of the ${width} columns of predictors.`);
  }
  return grid.map((row, i) => {
    if (row.length !== width) {
      throw new EngineError(
        'shape',
        `candidates has ${row.length} columns but predictors has ${width}: give one 1/0 column per column of predictors, ` +
          'in the same order (a text column counts once, whatever its number of levels).',
      );
    }
    const included = row.map((value, j) => {
      const cell = classifyCell(value);
      if (cell.kind === 'number' && (cell.value === 0 || cell.value === 1)) return cell.value === 1;
      if (cell.kind === 'boolean') return cell.value;
      throw new EngineError(
        'bad-value',
        `${cellPlace('candidates', origin, i, j, false)} ("${frame.columns[j].name}") holds ${describeCell(cell)}: ` +
          'use 1 or TRUE to include that column of predictors, 0 or FALSE to leave it out.',
      );
    });
    return {
      sources: included.flatMap((on, j) => (on ? [j] : [])),
      terms: frame.termColumns.flatMap((source, term) => (included[source] ? [term] : [])),
    };
  });
}
