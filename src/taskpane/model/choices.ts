import { columnsOf, parseRange, type RangeRef, sameSheet, splitAreas } from '../../addressing/a1';
import type { CovarianceKind } from '../../engine';
import { noiseSdProblem } from './noiseSdField';

/** What the user has chosen in the pane, as addresses: the pane's whole input. */
export interface PaneChoices {
  response: string;
  /** One or more areas, comma-separated, as Excel writes a multi-area selection. */
  predictors: string;
  weights: string;
  newRows: string;
  /** Indexes (into the predictor columns, in order) of the columns that form the "added" set. */
  added: number[];
  level: number;
  intercept: boolean;
  /** Empty when σ is to be estimated. */
  knownSigma: string;
  robust: CovarianceKind;
}

export const EMPTY_CHOICES: PaneChoices = {
  response: '',
  predictors: '',
  weights: '',
  newRows: '',
  added: [],
  level: 0.95,
  intercept: true,
  knownSigma: '',
  robust: 'classical',
};

/** A field's problem, shown beside it. */
export interface FieldProblem {
  field: keyof PaneChoices;
  message: string;
}

export interface ResolvedRanges {
  response: RangeRef;
  predictorColumns: RangeRef[];
  weights: RangeRef | undefined;
  newRows: RangeRef[] | undefined;
}

function parseField(text: string, field: keyof PaneChoices, label: string, problems: FieldProblem[]): RangeRef[] {
  const areas = splitAreas(text);
  if (areas.length === 0) {
    problems.push({ field, message: `Choose the ${label}: select it in the sheet, then press "Use selection".` });
    return [];
  }
  const ranges = areas.map((a) => parseRange(a, ''));
  if (ranges.some((r) => r === undefined || r.sheet === '')) {
    problems.push({ field, message: `"${text}" is not a range address with its sheet, such as Batches!B1:B61.` });
    return [];
  }
  return ranges as RangeRef[];
}

/** The confidence level's rule, applied when the data are read and as the level is typed. */
export function levelProblem(level: number): string | undefined {
  return level > 0 && level < 1 ? undefined : 'The confidence level must be between 0 and 1, such as 0.95.';
}

/**
 * Turns the typed or picked addresses into ranges and checks their shapes against each other,
 * so the pane can say what to fix before anything is read.
 */
export function resolveRanges(choices: PaneChoices): { ranges?: ResolvedRanges; problems: FieldProblem[] } {
  const problems: FieldProblem[] = [];
  const [response] = parseField(choices.response, 'response', 'response column', problems);
  const predictorAreas = parseField(choices.predictors, 'predictors', 'predictor columns', problems);
  const weightAreas = choices.weights.trim() === '' ? [] : parseField(choices.weights, 'weights', 'weights column', problems);
  const newAreas = choices.newRows.trim() === '' ? [] : parseField(choices.newRows, 'newRows', 'new rows', problems);
  if (problems.length > 0 || response === undefined) return { problems };

  const rows = response.bottom - response.top;
  if (response.left !== response.right) problems.push({ field: 'response', message: 'The response must be a single column.' });
  for (const area of predictorAreas) {
    if (!sameSheet(area.sheet, response.sheet) || area.top !== response.top || area.bottom !== response.bottom) {
      problems.push({
        field: 'predictors',
        message: `Every predictor area must cover the response's rows (${response.sheet} rows ${response.top + 1}–${response.bottom + 1}).`,
      });
      break;
    }
  }
  const weights = weightAreas[0];
  if (weights !== undefined && (weights.left !== weights.right || weights.bottom - weights.top !== rows)) {
    problems.push({ field: 'weights', message: 'Weights must be one column with the same rows as the response.' });
  }
  const predictorColumns = predictorAreas.flatMap(columnsOf);
  if (newAreas.length > 0 && newAreas.reduce((n, a) => n + a.right - a.left + 1, 0) !== predictorColumns.length) {
    problems.push({ field: 'newRows', message: `New rows need ${predictorColumns.length} columns, one per predictor, in the same order.` });
  }
  const sigmaProblem = noiseSdProblem(choices.knownSigma);
  if (sigmaProblem !== undefined) problems.push({ field: 'knownSigma', message: sigmaProblem });
  const level = levelProblem(choices.level);
  if (level !== undefined) problems.push({ field: 'level', message: level });
  if (problems.length > 0) return { problems };
  return { ranges: { response, predictorColumns, weights, newRows: newAreas.length > 0 ? newAreas : undefined }, problems };
}

/** The fields that hold addresses, in the order the pane shows them. */
export const ADDRESS_FIELDS = ['response', 'predictors', 'weights', 'newRows'] as const;

/** Each sheet an address field names, once per field; text that is no address with a sheet names none. */
export function sheetsNamed(choices: PaneChoices): { field: (typeof ADDRESS_FIELDS)[number]; sheet: string }[] {
  return ADDRESS_FIELDS.flatMap((field) => {
    const sheets = splitAreas(choices[field]).flatMap((area) => {
      const range = parseRange(area, '');
      return range === undefined || range.sheet === '' ? [] : [range.sheet];
    });
    return [...new Set(sheets)].map((sheet) => ({ field, sheet }));
  });
}

/** A typed address whose sheet the workbook lacks, said on its own field. */
export function noSuchSheetProblem(field: keyof PaneChoices, sheet: string): FieldProblem {
  return { field, message: `There is no sheet named ${sheet}. Check the spelling, or select the range in the sheet and press "Use selection".` };
}

const SINGLE_AREA_FIELDS: Partial<Record<keyof PaneChoices, string>> = { response: 'The response', weights: 'Weights' };

/**
 * A selection of several areas is fine for predictors and new rows (each area adds columns), but
 * the response and the weights are one column each: say so rather than take the first area.
 */
export function singleAreaProblem(field: keyof PaneChoices, areas: readonly string[]): FieldProblem | undefined {
  const what = SINGLE_AREA_FIELDS[field];
  if (what === undefined || areas.length <= 1) return undefined;
  return { field, message: `${what} must be one column, but the selection has ${areas.length} areas (${areas.join(', ')}): select one column only.` };
}
