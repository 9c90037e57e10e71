/**
 * The Excel boundary: raw argument values as custom functions receive them, turned into the
 * engine's neutral cell values and settings. This is the only module that knows how Excel's
 * cells look: the engine's one-pass read of all-numeric ranges takes them as Excel passed them
 * and reads an error object through errorCodeOf; any other range is turned into CellValues here.
 */
import { type CellGrid, type CellValue, type CovarianceKind, EngineError, type FitSettings, judgeNoiseSd, type NoiseSdVerdict } from '../engine';
import { noiseSdMessage } from '../presentation';

/** A range argument as Excel passes it: row-major, blanks as "", null or 0, errors as objects. */
export type RangeArgument = unknown[][];

/**
 * Excel.ErrorCellValue's errorType, for an error value that carries no basicValue (the data-types
 * form of an error, "Excel.ErrorCellValue" in the Excel JavaScript API reference).
 */
const ERROR_TYPE_CODES: Record<string, string> = {
  Blocked: '#BLOCKED!',
  Busy: '#BUSY!',
  Calc: '#CALC!',
  Connect: '#CONNECT!',
  Div0: '#DIV/0!',
  External: '#EXTERNAL!',
  Field: '#FIELD!',
  GettingData: '#GETTING_DATA',
  NotAvailable: '#N/A',
  Name: '#NAME?',
  Null: '#NULL!',
  Num: '#NUM!',
  Ref: '#REF!',
  Spill: '#SPILL!',
  Value: '#VALUE!',
};

/**
 * The error code of a cell argument, or undefined when it is no error. "Handle and return errors
 * from your custom function" says errors reach a function when functions.json allows it but not in
 * which form, so every form the Office documentation shows for an error value is read: a
 * CustomFunctions.Error ({ code: "#N/A", message? }) and an Excel.ErrorCellValue
 * ({ type: "Error", basicValue: "#N/A", errorType: "NotAvailable" }).
 */
export function errorCodeOf(value: unknown): string | undefined {
  if (typeof value !== 'object' || value === null) return undefined;
  if ('code' in value && typeof value.code === 'string') return value.code;
  if ('type' in value && value.type === 'Error') {
    if ('basicValue' in value && typeof value.basicValue === 'string' && value.basicValue.startsWith('#')) return value.basicValue;
    if ('errorType' in value && typeof value.errorType === 'string') return ERROR_TYPE_CODES[value.errorType] ?? '#VALUE!';
  }
  return undefined;
}

export function toCellGrid(range: RangeArgument | null | undefined, argument: string): CellGrid {
  if (range === null || range === undefined) return [];
  if (!Array.isArray(range)) throw notRange(argument);
  // Most ranges hold only numbers, text, booleans and blanks, which are cell values already: those
  // are used as they are, and only a range with an error, another object or undefined is copied.
  return isPlainGrid(range, argument) ? range : range.map((row) => row.map(toCellValue));
}

/**
 * A range's rows, checked as toCellGrid checks them (a range of rows that are arrays), with the
 * cells left as Excel passed them: for callers that look at a row or two, or only count rows.
 */
export function rangeRows(range: RangeArgument | null | undefined, argument: string): readonly unknown[][] {
  if (range === null || range === undefined) return [];
  if (!Array.isArray(range)) throw notRange(argument);
  for (const row of range as unknown[]) if (!Array.isArray(row)) throw notRange(argument);
  return range;
}

function notRange(argument: string): EngineError {
  return new EngineError('shape', `${argument} must be a range of cells.`);
}

/**
 * Whether every cell is a cell value as it is; throws when a row is no array. One indexed pass
 * with the checks inline, since it runs over every cell of every formula's ranges.
 */
function isPlainGrid(range: unknown[], argument: string): range is CellValue[][] {
  let plain = true;
  for (let i = 0; i < range.length; i++) {
    const row: unknown = range[i];
    if (!Array.isArray(row)) throw notRange(argument);
    for (let j = 0; plain && j < row.length; j++) {
      const value: unknown = row[j];
      const type = typeof value;
      plain = type === 'number' || type === 'string' || type === 'boolean' || value === null;
    }
  }
  return plain;
}

export function toCellValue(value: unknown): CellValue {
  if (value === null || value === undefined) return null;
  if (typeof value === 'number' || typeof value === 'string' || typeof value === 'boolean') return value;
  // Any other object (a data type, say) is no cell value a regression can use.
  return { errorCode: errorCodeOf(value) ?? '#VALUE!' };
}

/** A single-cell argument may still arrive as a 1×1 range. */
function scalar(value: unknown): unknown {
  if (Array.isArray(value)) return Array.isArray(value[0]) ? value[0][0] : value[0];
  return value;
}

/**
 * How a rejected setting is quoted: a cell error by its code and long text cut short, so the
 * message stays readable in the cell's error tip (String() gave "[object Object]" for an error
 * and echoed a 100,000-character text whole).
 */
function shown(value: unknown): string {
  if (typeof value === 'string') return value.length > 40 ? `${value.slice(0, 40)}…` : value;
  if (typeof value === 'object' && value !== null) {
    const code = errorCodeOf(value);
    return code === undefined ? 'a value that is neither a number nor text' : `the error ${code}`;
  }
  return String(value);
}

/** An error in a setting is never a default: #N/A there is a broken formula, not a blank. */
function rejectErrorSetting(name: string, value: unknown): void {
  const code = errorCodeOf(value);
  if (code !== undefined) {
    throw new EngineError('bad-setting', `${name} is the error ${code}: fix the cell or formula it comes from, or leave ${name} empty for its default.`);
  }
}

function isUnset(value: unknown): boolean {
  return value === null || value === undefined || value === '';
}

/**
 * The shared settings, in the same order at the end of every PLUMB function:
 * level, intercept, noise_sd, weights, robust. An unset level or robust (omitted, blank, or 0
 * as a blank reference arrives in desktop Excel) means the default; an unset noise_sd (omitted
 * or blank) means σ is estimated, and 0 there is refused.
 */
export function parseSettings(levelArg: unknown, interceptArg: unknown, sigmaArg: unknown, robustArg?: unknown): FitSettings {
  const level = scalar(levelArg);
  const intercept = scalar(interceptArg);
  const sigma = scalar(sigmaArg);
  rejectErrorSetting('level', level);
  rejectErrorSetting('intercept', intercept);
  rejectErrorSetting('noise_sd', sigma);
  rejectErrorSetting('robust', scalar(robustArg));
  const settings: FitSettings = {};
  if (!isUnset(level) && level !== 0) {
    if (typeof level !== 'number' || !(level > 0 && level < 1)) {
      throw new EngineError('bad-setting', `level must be a number between 0 and 1, such as 0.95 for 95%; got ${shown(level)}.`);
    }
    settings.level = level;
  }
  if (!isUnset(intercept)) {
    if (intercept === true || intercept === 1) settings.intercept = true;
    else if (intercept === false || intercept === 0) settings.intercept = false;
    else throw new EngineError('bad-setting', `intercept must be TRUE or FALSE; got ${shown(intercept)}.`);
  }
  const knownSigma = parseNoiseSd(sigma);
  if (knownSigma !== undefined) settings.knownSigma = knownSigma;
  const covariance = parseRobust(scalar(robustArg));
  if (covariance !== undefined) settings.covariance = covariance;
  return settings;
}

/**
 * noise_sd by the rule the pane applies too (engine/noiseSd.ts), in the words the pane's field
 * uses (presentation/noiseSd.ts): empty estimates σ, and 0 is an error rather than a second way
 * of saying "estimate".
 */
function parseNoiseSd(sigma: unknown): number | undefined {
  const verdict: NoiseSdVerdict =
    typeof sigma === 'number' || typeof sigma === 'string' ? judgeNoiseSd(sigma) : isUnset(sigma) ? { kind: 'estimate' } : { kind: 'not-a-number' };
  const problem = noiseSdMessage(verdict, { name: 'noise_sd', where: 'noise_sd', shown: shown(typeof sigma === 'string' ? sigma.trim() : sigma) });
  if (problem !== undefined) throw new EngineError('bad-setting', problem);
  return verdict.kind === 'known' ? verdict.sigma : undefined;
}

const COVARIANCE_NAMES = new Map<string, CovarianceKind>([
  ['classical', 'classical'],
  ['hc0', 'HC0'],
  ['hc1', 'HC1'],
  ['hc3', 'HC3'],
]);

/**
 * TRUE or 1 asks for the robust default, HC3: of the three it behaves best in small samples
 * (Long & Ervin 2000), and with it a single switch cell is enough for most workbooks.
 */
function parseRobust(robust: unknown): CovarianceKind | undefined {
  if (isUnset(robust) || robust === false || robust === 0) return undefined;
  if (robust === true || robust === 1) return 'HC3';
  const named = typeof robust === 'string' ? COVARIANCE_NAMES.get(robust.trim().toLowerCase()) : undefined;
  if (named !== undefined) return named;
  throw new EngineError(
    'bad-setting',
    `robust must be FALSE (classical standard errors), TRUE (HC3), or one of the texts "HC0", "HC1", "HC3", "classical"; got ${shown(robust)}.`,
  );
}
