import { EngineError } from '../errors';
import { shortName } from './cells';

export type SourceColumn = { kind: 'numeric'; name: string } | { kind: 'categorical'; name: string; levels: string[]; reference: string | undefined };

export interface CodedColumns {
  columns: SourceColumn[];
  termNames: string[];
  /** For each term, the source column it codes. */
  termColumns: number[];
  x: number[][];
}

/**
 * Indicator (0/1) coding of text columns against their first level in sorted order, with terms
 * named "Column: level". Without an intercept the first categorical column keeps every level,
 * so that its levels take the intercept's place instead of being forced through zero.
 */
export function codeCategorical(
  rows: readonly (readonly (number | string)[])[],
  names: readonly string[],
  categorical: readonly boolean[],
  intercept: boolean,
): CodedColumns {
  let fullCodingLeft = !intercept;
  const columns: SourceColumn[] = names.map((name, j) => {
    if (!categorical[j]) return { kind: 'numeric', name };
    const levels = [...new Set(rows.map((r) => r[j] as string))].sort(compareLevels);
    const keepAll = fullCodingLeft;
    fullCodingLeft = false;
    return { kind: 'categorical', name, levels, reference: keepAll ? undefined : levels[0] };
  });
  const termNames = columns.flatMap((c) => (c.kind === 'numeric' ? [c.name] : indicatorLevels(c).map((level) => `${c.name}: ${shortName(level)}`)));
  const termColumns = columns.flatMap((c, j) => (c.kind === 'numeric' ? [j] : indicatorLevels(c).map(() => j)));
  const x = rows.map((row) => codeRow(row, columns));
  return { columns, termNames, termColumns, x };
}

/** Codes one row of source values with the columns' coding; unknown levels are an error. */
export function codeRow(row: readonly (number | string)[], columns: readonly SourceColumn[]): number[] {
  return columns.flatMap((c, j) => {
    const value = row[j];
    if (c.kind === 'numeric') {
      if (typeof value !== 'number') throw new EngineError('bad-value', `"${c.name}" needs a number; got the text "${value}".`);
      return [value];
    }
    const text = String(value);
    if (!c.levels.includes(text)) {
      throw new EngineError('unknown-level', `"${text}" is not a level of "${c.name}" in the data (levels: ${c.levels.join(', ')}).`);
    }
    return indicatorLevels(c).map((level) => (level === text ? 1 : 0));
  });
}

function indicatorLevels(c: Extract<SourceColumn, { kind: 'categorical' }>): string[] {
  return c.levels.filter((level) => level !== c.reference);
}

/** Plain code-unit order, so the reference level never depends on the host's locale. */
function compareLevels(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
