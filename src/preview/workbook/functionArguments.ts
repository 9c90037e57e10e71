/**
 * The arguments Excel hands a custom function, built from a formula's argument expressions and
 * the function's functions.json shape. Each rule cites the Office doc page it follows:
 * - "Custom parameter options" (Optional parameters): an omitted argument arrives as null.
 * - "Custom parameter options" (Range parameters): a range arrives as a row-major 2-D array.
 * - "Custom parameter options" (Repeating parameters): the arguments given for the repeating
 *   last parameter arrive as one array, one element per argument.
 * - "Custom parameter options" (Invocation parameter, Detect the address of a parameter): an
 *   invocation object follows the declared parameters; with options.requiresParameterAddresses
 *   it carries parameterAddresses.
 * - "Handle and return errors from your custom function" (Errors as custom function inputs) and
 *   "Manually create JSON metadata for custom functions" (allowErrorForDataTypeAny): a function
 *   whose argument holds an error is called only when the parameter accepts errors.
 * Blank cells arrive as null (OfficeDev/office-js issues 4702 and 5262: current builds), or as 0
 * on older desktop builds (the same issues and 1951), chosen by CalculationBehaviour.
 */
import { CustomFunctionsError } from './customFunctionError';
import type { Expression } from './formula';
import type { FunctionShape, ParameterShape } from './functionMetadata';
import { parameterAddress } from './parameterAddresses';
import type { CellError, CellValue, RangeRef } from './types';

export interface CalculationBehaviour {
  /** What a blank cell passes as: null on current builds, 0 on older desktop builds. */
  blankCellsAs: null | 0;
  /**
   * The docs name no shape for an error argument. The preview passes a CustomFunctions.Error
   * (code, message) by default, or an Excel ErrorCellValue ({ type: "Error", basicValue,
   * errorType }), the data-types shape the docs also show, so the add-in can be tested with both.
   */
  errorArguments: 'CustomFunctions.Error' | 'ErrorCellValue';
}

export const CURRENT_EXCEL: CalculationBehaviour = { blankCellsAs: null, errorArguments: 'CustomFunctions.Error' };

export interface ArgumentSource {
  valueAt(sheet: string, row: number, column: number): CellValue;
  hasSheet(name: string): boolean;
  /**
   * The cells of one sheet, looked up once for a whole range: a range argument reads every cell
   * of it, and finding the sheet by name per cell cost more than the function it feeds.
   */
  sheetCells(name: string): SheetCells | undefined;
}

export type SheetCells = (row: number, column: number) => CellValue;

export type Arguments = { values: unknown[] } | { error: CellError };

const ERROR_TYPES: Record<string, string> = {
  '#BLOCKED!': 'Blocked',
  '#BUSY!': 'Busy',
  '#CALC!': 'Calc',
  '#CONNECT!': 'Connect',
  '#DIV/0!': 'Div0',
  '#FIELD!': 'Field',
  '#GETTING_DATA': 'GettingData',
  '#N/A': 'NotAvailable',
  '#NAME?': 'Name',
  '#NULL!': 'Null',
  '#NUM!': 'Num',
  '#REF!': 'Ref',
  '#SPILL!': 'Spill',
  '#VALUE!': 'Value',
};

function errorArgument(error: CellError, behaviour: CalculationBehaviour): unknown {
  if (behaviour.errorArguments === 'CustomFunctions.Error') return new CustomFunctionsError(error.error, error.message);
  return { type: 'Error', basicType: 'Error', basicValue: error.error, errorType: ERROR_TYPES[error.error] ?? 'Value' };
}

function isError(value: CellValue): value is CellError {
  return typeof value === 'object' && value !== null;
}

/** Thrown inside the builder to stop at the first problem; never escapes this module. */
class NotCalled {
  constructor(readonly error: CellError) {}
}

class Builder {
  constructor(
    private readonly source: ArgumentSource,
    private readonly behaviour: CalculationBehaviour,
  ) {}

  cell(value: CellValue, parameter: ParameterShape | undefined): unknown {
    if (value === null) return this.behaviour.blankCellsAs;
    if (!isError(value)) return value;
    // Excel does not call the function; the cell shows the argument's error (its code only).
    if (parameter?.acceptsErrors !== true) throw new NotCalled({ error: value.error });
    return errorArgument(value, this.behaviour);
  }

  argument(expression: Expression | null, parameter: ParameterShape | undefined): unknown {
    if (expression === null) return null;
    const dimensionality = parameter?.dimensionality ?? 'matrix';
    switch (expression.kind) {
      case 'call':
      case 'divide':
        throw new NotCalled({ error: '#VALUE!', message: 'Nested calculations are not supported in the preview.' });
      case 'reference': {
        const range = expression.range;
        if (!this.source.hasSheet(range.sheet)) throw new NotCalled({ error: '#REF!', message: `There is no sheet named ${range.sheet}.` });
        if (dimensionality === 'scalar') {
          if (range.top !== range.bottom || range.left !== range.right) {
            // Excel would evaluate the function once per cell and spill the results; the preview does not.
            throw new NotCalled({ error: '#VALUE!', message: 'The preview passes only one cell to a single-value parameter.' });
          }
          return this.cell(this.source.valueAt(range.sheet, range.top, range.left), parameter);
        }
        return this.grid(range, parameter);
      }
      default:
        return dimensionality === 'scalar' ? expression.value : [[expression.value]];
    }
  }

  private grid(range: RangeRef, parameter: ParameterShape | undefined): unknown[][] {
    const cells = this.source.sheetCells(range.sheet);
    if (cells === undefined) throw new NotCalled({ error: '#REF!', message: `There is no sheet named ${range.sheet}.` });
    const width = range.right - range.left + 1;
    const rows: unknown[][] = new Array<unknown[]>(range.bottom - range.top + 1);
    for (let r = range.top; r <= range.bottom; r++) {
      const row: unknown[] = new Array<unknown>(width);
      for (let c = 0; c < width; c++) row[c] = this.cell(cells(r, range.left + c), parameter);
      rows[r - range.top] = row;
    }
    return rows;
  }
}

function countError(name: string, parameters: readonly ParameterShape[], given: number): CellError | undefined {
  const repeats = parameters.at(-1)?.repeating === true;
  const required = parameters.filter((p) => !p.optional).length;
  if (!repeats && given > parameters.length) return { error: '#VALUE!', message: `${name} takes at most ${parameters.length} arguments.` };
  if (given < required) return { error: '#VALUE!', message: `${name} needs at least ${required} arguments.` };
  return undefined;
}

/**
 * One address per argument the formula gives ("" for a constant or an empty argument); the docs
 * do not say what Excel lists for trailing omitted arguments, so the preview lists none.
 */
function addressesOf(args: readonly (Expression | null)[]): string[] {
  return args.map((a) => (a !== null && a.kind === 'reference' ? parameterAddress(a.range) : ''));
}

export function buildArguments(
  name: string,
  args: readonly (Expression | null)[],
  shape: FunctionShape | undefined,
  source: ArgumentSource,
  behaviour: CalculationBehaviour,
): Arguments {
  const builder = new Builder(source, behaviour);
  try {
    if (shape === undefined) return { values: args.map((a) => builder.argument(a, undefined)) };
    const parameters = shape.parameters;
    const problem = countError(name, parameters, args.length);
    if (problem) return { error: problem };
    const repeating = parameters.at(-1)?.repeating === true ? parameters[parameters.length - 1] : undefined;
    const fixed = repeating ? parameters.length - 1 : parameters.length;
    const values: unknown[] = [];
    for (let i = 0; i < fixed; i++) values.push(builder.argument(args[i] ?? null, parameters[i]));
    if (repeating) values.push(args.slice(fixed).map((a) => builder.argument(a, repeating)));
    values.push(shape.requiresParameterAddresses === true ? { parameterAddresses: addressesOf(args) } : {});
    return { values };
  } catch (thrown) {
    if (thrown instanceof NotCalled) return { error: thrown.error };
    throw thrown;
  }
}
