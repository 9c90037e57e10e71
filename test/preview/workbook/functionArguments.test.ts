/**
 * How the preview hands cell values to a custom function, checked against the Office docs each
 * test names. The functions are stand-ins that record what they receive, so every expectation
 * is the argument itself.
 */
import { describe, expect, it } from 'vitest';
import { CustomFunctionsError } from '../../../src/preview/workbook/customFunctionError';
import { createWorkbook, type PreviewWorkbook } from '../../../src/preview/workbook/workbook';

const at = (sheet: string, row: number, column: number) => ({ sheet, row, column });

interface Recorder {
  calls: unknown[][];
}

/** A workbook whose PLUMB.PEEK(range, [single]) records its arguments and returns 1. */
function peekWorkbook(metadata: Record<string, unknown>, sheet = 'Data'): { wb: PreviewWorkbook; seen: Recorder } {
  const wb = createWorkbook(sheet);
  const seen: Recorder = { calls: [] };
  wb.registerFunction('PEEK', (...args: unknown[]) => {
    seen.calls.push(args);
    return 1;
  });
  wb.loadFunctionMetadata(metadata);
  return { wb, seen };
}

const peek = (parameterType: string | undefined, root: Record<string, unknown> = {}) => ({
  ...root,
  functions: [
    {
      id: 'PEEK',
      name: 'PEEK',
      result: { dimensionality: 'matrix' },
      parameters: [
        { name: 'range', dimensionality: 'matrix', ...(parameterType === undefined ? {} : { type: parameterType }) },
        { name: 'single', optional: true, ...(parameterType === undefined ? {} : { type: parameterType }) },
      ],
    },
  ],
});

describe('error values in arguments', () => {
  // "Handle and return errors from your custom function", Errors as custom function inputs: a
  // function processes inputs that contain errors only with allowErrorForDataTypeAny set to true.
  it('does not call a function whose range holds an error when functions.json does not allow errors; the cell shows that error', () => {
    const { wb, seen } = peekWorkbook(peek('any'));
    wb.setInputs('Data', 0, 0, [[1], ['=PLUMB.NOPE()']]);
    wb.setInputs('Data', 5, 0, [['=PLUMB.PEEK(A1:A2)']]);
    expect(seen.calls).toHaveLength(0);
    expect(wb.valueAt(at('Data', 5, 0))).toEqual({ error: '#NAME?' });
  });

  it('shows the first error in argument order, row by row, when a single-value argument holds one too', () => {
    const { wb, seen } = peekWorkbook(peek('any'));
    wb.setInputs('Data', 0, 0, [[1, '=PLUMB.NOPE()']]);
    wb.registerFunction('NA', () => {
      throw new CustomFunctionsError('#N/A');
    });
    wb.setInputs('Data', 1, 0, [['=PLUMB.NA()']]);
    wb.setInputs('Data', 5, 0, [['=PLUMB.PEEK(A1:B1, A2)'], ['=PLUMB.PEEK(C1, A2)']]);
    expect(seen.calls).toHaveLength(0);
    expect(wb.valueAt(at('Data', 5, 0))).toEqual({ error: '#NAME?' });
    expect(wb.valueAt(at('Data', 6, 0))).toEqual({ error: '#N/A' });
  });

  // "Manually create JSON metadata for custom functions", allowErrorForDataTypeAny: a top-level
  // property; parameters of type any (the default type) then accept errors.
  it('with the top-level allowErrorForDataTypeAny, passes errors to parameters of type any as CustomFunctions.Error with the code', () => {
    const { wb, seen } = peekWorkbook(peek('any', { allowErrorForDataTypeAny: true }));
    wb.registerFunction('NA', () => {
      throw new CustomFunctionsError('#N/A', 'no value');
    });
    wb.setInputs('Data', 0, 0, [['=PLUMB.NA()'], [2]]);
    wb.setInputs('Data', 5, 0, [['=PLUMB.PEEK(A1:A2, A1)']]);
    expect(wb.valueAt(at('Data', 5, 0))).toBe(1);
    const [range, single] = seen.calls.at(-1) as [unknown[][], unknown];
    expect(range[0][0]).toBeInstanceOf(CustomFunctionsError);
    expect(range[0][0]).toMatchObject({ code: '#N/A' });
    expect(range[1][0]).toBe(2);
    expect(single).toMatchObject({ code: '#N/A' });
  });

  it('treats a parameter without a type as type any, and one of type number as refusing errors', () => {
    const untyped = peekWorkbook(peek(undefined, { allowErrorForDataTypeAny: true }));
    untyped.wb.setInputs('Data', 0, 0, [['=PLUMB.NOPE()'], ['=PLUMB.PEEK(A1)']]);
    expect((untyped.seen.calls.at(-1) as unknown[][][])[0][0][0]).toMatchObject({ code: '#NAME?' });
    const numeric = peekWorkbook(peek('number', { allowErrorForDataTypeAny: true }));
    numeric.wb.setInputs('Data', 0, 0, [['=PLUMB.NOPE()'], ['=PLUMB.PEEK(A1)']]);
    expect(numeric.seen.calls).toHaveLength(0);
    expect(numeric.wb.valueAt(at('Data', 1, 0))).toEqual({ error: '#NAME?' });
  });

  it('can pass errors in the data-types shape instead (ErrorCellValue: type, basicValue, errorType), the other shape the docs show', () => {
    const { wb, seen } = peekWorkbook(peek('any', { allowErrorForDataTypeAny: true }));
    wb.setCalculationBehaviour({ errorArguments: 'ErrorCellValue' });
    wb.setInputs('Data', 0, 0, [['=PLUMB.NOPE()'], ['=PLUMB.PEEK(A1)']]);
    const [range] = seen.calls.at(-1) as [unknown[][]];
    expect(range[0][0]).toEqual({ type: 'Error', basicType: 'Error', basicValue: '#NAME?', errorType: 'Name' });
  });
});

describe('blank cells and omitted arguments', () => {
  // OfficeDev/office-js issues 4702 and 5262: current builds pass blank cells as null, older
  // desktop builds as 0 (also issue 1951).
  it('passes blank cells of a range and a blank single cell as null, or as 0 with the older-desktop switch', () => {
    const { wb, seen } = peekWorkbook(peek('any'));
    wb.setInputs('Data', 0, 0, [
      [1, null],
      [null, 'x'],
    ]);
    wb.setInputs('Data', 5, 0, [['=PLUMB.PEEK(A1:B2, B1)']]);
    expect(seen.calls.at(-1)?.slice(0, 2)).toEqual([
      [
        [1, null],
        [null, 'x'],
      ],
      null,
    ]);
    wb.setCalculationBehaviour({ blankCellsAs: 0 });
    expect(seen.calls.at(-1)?.slice(0, 2)).toEqual([
      [
        [1, 0],
        [0, 'x'],
      ],
      0,
    ]);
  });

  // "Custom parameter options", Optional parameters: an omitted optional argument is null.
  it('passes an omitted optional argument as null, then the invocation object as the last argument', () => {
    const { wb, seen } = peekWorkbook(peek('any'));
    wb.setInputs('Data', 0, 0, [[3], ['=PLUMB.PEEK(A1)'], ['=PLUMB.PEEK(A1,)']]);
    expect(seen.calls.length).toBeGreaterThan(0);
    for (const call of seen.calls) expect(call).toEqual([[[3]], null, {}]);
  });
});

describe('repeating parameters and parameter addresses', () => {
  const gather = {
    allowErrorForDataTypeAny: true,
    functions: [
      {
        id: 'GATHERISH',
        name: 'GATHERISH',
        options: { requiresParameterAddresses: true },
        result: { dimensionality: 'matrix' },
        parameters: [{ name: 'areas', type: 'any', dimensionality: 'matrix', repeating: true }],
      },
      {
        id: 'WHERE',
        name: 'WHERE',
        options: { requiresParameterAddresses: true },
        result: { dimensionality: 'matrix' },
        parameters: [
          { name: 'first', type: 'any', dimensionality: 'matrix' },
          { name: 'second', type: 'any', optional: true },
          { name: 'third', type: 'any', dimensionality: 'matrix', optional: true },
        ],
      },
    ],
  };

  function setup(dataSheet: string) {
    const wb = createWorkbook(dataSheet);
    const calls: unknown[][] = [];
    const record = (...args: unknown[]) => {
      calls.push(args);
      return 1;
    };
    wb.registerFunction('GATHERISH', record);
    wb.registerFunction('WHERE', record);
    wb.loadFunctionMetadata(gather);
    return { wb, calls };
  }

  // "Custom parameter options", Repeating parameters: the values are provided in an array.
  it('passes the arguments of a repeating parameter as one array of their values', () => {
    const { wb, calls } = setup('Data');
    wb.setInputs('Data', 0, 0, [
      [1, 10, 100],
      [2, 20, 200],
    ]);
    wb.setInputs('Data', 5, 0, [['=PLUMB.GATHERISH(A1:A2, C1:C2, 7)']]);
    expect(calls.at(-1)?.[0]).toEqual([[[1], [2]], [[100], [200]], [[7]]]);
    expect(calls.at(-1)).toHaveLength(2);
  });

  // "Custom parameter options", Detect the address of a parameter: SheetName!RelativeCellAddress,
  // the sheet quoted when it holds a space, "_" or another listed character, quotes doubled.
  it('gives parameterAddresses as SheetName!RelativeCellAddress, quoting sheet names as the docs list, "" for constants', () => {
    const { wb, calls } = setup('Costs');
    wb.addSheet('Latest Prices');
    wb.addSheet("Bob's_Region");
    wb.setInputs('Costs', 0, 0, [['=PLUMB.WHERE($B$2:$C$9, 0.9, D8)']]);
    expect(calls.at(-1)?.[3]).toEqual({ parameterAddresses: ['Costs!B2:C9', '', 'Costs!D8'] });
    wb.setInputs('Costs', 1, 0, [["=PLUMB.WHERE('Latest Prices'!F6, , 'Bob''s_Region'!A1:A3)"]]);
    expect(calls.at(-1)?.[3]).toEqual({ parameterAddresses: ["'Latest Prices'!F6", '', "'Bob''s_Region'!A1:A3"] });
    wb.setInputs('Costs', 2, 0, [['=PLUMB.GATHERISH(A1:A2, Costs!E1:E2)']]);
    expect(calls.at(-1)?.[1]).toEqual({ parameterAddresses: ['Costs!A1:A2', 'Costs!E1:E2'] });
  });

  it('lists no addresses for trailing arguments the formula leaves out (the docs do not say; absent is the harder case)', () => {
    const { wb, calls } = setup('Data');
    wb.setInputs('Data', 0, 0, [['=PLUMB.WHERE(B1:B3)']]);
    expect(calls.at(-1)).toEqual([[[0], [0], [0]].map(() => [null]), null, null, { parameterAddresses: ['Data!B1:B3'] }]);
  });
});

describe('results', () => {
  function returning(result: unknown): PreviewWorkbook {
    const wb = createWorkbook('Data');
    wb.registerFunction('OUT', () => result);
    wb.setInputs('Data', 0, 0, [['=PLUMB.OUT()']]);
    return wb;
  }

  // OfficeDev/office-js issue 1503 (by design): null in a returned array shows as 0.
  it('shows null inside a returned array as 0', () => {
    const wb = returning([[null, 'x']]);
    expect(wb.valueAt(at('Data', 0, 0))).toBe(0);
    expect(wb.valueAt(at('Data', 0, 1))).toBe('x');
  });

  // "Handle and return errors from your custom function", Handle errors when working with dynamic arrays.
  it('shows a CustomFunctions.Error inside a returned array as its error, keeping messages only for #VALUE! and #N/A', () => {
    const wb = returning([[1], [new CustomFunctionsError('#NUM!', 'dropped')], [new CustomFunctionsError('#N/A', 'kept')]]);
    expect(wb.valueAt(at('Data', 1, 0))).toEqual({ error: '#NUM!' });
    expect(wb.valueAt(at('Data', 2, 0))).toEqual({ error: '#N/A', message: 'kept' });
  });

  // Same page: #NAME? and #REF! are supported as input errors only; unhandled exceptions give #VALUE!.
  it('does not let a function output #REF!, and shows anything thrown but a CustomFunctions.Error as #VALUE! without a message', () => {
    expect(returning([[new CustomFunctionsError('#REF!')]]).valueAt(at('Data', 0, 0))).toMatchObject({ error: '#VALUE!' });
    expect(returning([[{ code: '#N/A' }]]).valueAt(at('Data', 0, 0))).toEqual({ error: '#VALUE!' });
    const wb = createWorkbook('Data');
    wb.registerFunction('BOOM', () => {
      throw new Error('internal detail');
    });
    wb.setInputs('Data', 0, 0, [['=PLUMB.BOOM()']]);
    expect(wb.valueAt(at('Data', 0, 0))).toEqual({ error: '#VALUE!' });
  });
});

describe('metadata', () => {
  // "Manually create JSON metadata for custom functions": repeating parameters are optional by definition.
  it('counts a repeating parameter as optional and refuses too few or too many arguments with #VALUE!', () => {
    const { wb, seen } = peekWorkbook(peek('any'));
    wb.setInputs('Data', 0, 0, [['=PLUMB.PEEK()'], ['=PLUMB.PEEK(A9, A9, A9)']]);
    expect(seen.calls).toHaveLength(0);
    expect(wb.valueAt(at('Data', 0, 0))).toMatchObject({ error: '#VALUE!' });
    expect(wb.valueAt(at('Data', 1, 0))).toMatchObject({ error: '#VALUE!' });
  });
});
