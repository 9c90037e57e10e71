/**
 * The self-check workbook, assets/plumbline-self-check.xlsx: it is what scripts/make-self-check.ts
 * generates, it is written so real Excel spills and resolves its PLUMB formulas, and loaded into
 * the preview with the real PLUMB functions every check passes. The LRE here is computed by the
 * test from the PLUMB results and the certified values (NIST StRD) or reference values (R's lm()
 * on the complete rows, scripts/selfCheck/toothGrowth.R); the workbook's own arithmetic is for
 * Excel and is checked for its references, not evaluated.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import JSZip from 'jszip';
import { beforeAll, describe, expect, it } from 'vitest';
import { cellAddress, columnIndex, columnLetters } from '../../src/addressing/a1';
import { FIT_STATS_LABELS } from '../../src/cellGrids/fitStatsGrid';
import { RESIDUALS_HEADER } from '../../src/cellGrids/residualsGrid';
import type { CellValue } from '../../src/preview/workbook/types';
import type { PreviewWorkbook } from '../../src/preview/workbook/workbook';
import { buildSelfCheckPlan } from '../../scripts/selfCheck/buildPlan';
import { CHECK_COLUMNS, DATA_HEADER_ROW, OUTPUT_COLUMN, SUMMARY, SUMMARY_SHEET } from '../../scripts/selfCheck/layout';
import { lre, readStrd, strdAvailable } from '../support/strd';
import { ExcelArithmetic } from './selfCheck/excelArithmetic';
import { loadIntoPreview } from './selfCheck/previewWorkbook';
import { type FileCell, type FileSheet, planCells, readXlsxCells } from './selfCheck/xlsxCells';

const WORKBOOK = resolve(__dirname, '../../assets/plumbline-self-check.xlsx');
const DATA_SHEETS = ['Longley', 'Norris', 'ToothGrowth'] as const;
/** The README's threshold (section "Self-check in your Excel"): ten significant digits. */
const README_THRESHOLD = 10;

let bytes: Buffer;
let sheets: FileSheet[];
let preview: PreviewWorkbook;

beforeAll(async () => {
  bytes = readFileSync(WORKBOOK);
  sheets = await readXlsxCells(bytes);
  preview = await loadIntoPreview(sheets);
});

function sheet(name: string): FileSheet {
  const found = sheets.find((s) => s.name === name);
  if (!found) throw new Error(`The workbook has no sheet ${name}.`);
  return found;
}

function at(name: string, row: number, column: number): FileCell | undefined {
  return sheet(name).cells.get(cellAddress(row, column));
}

function valueAt(name: string, row: number, column: number): number | string | undefined {
  const cell = at(name, row, column);
  return cell !== undefined && 'value' in cell ? cell.value : undefined;
}

interface CheckRow {
  row: number;
  label: string;
  expected: number;
  /** The PLUMB result cell the check's Plumbline column refers to. */
  source: { row: number; column: number };
}

/** Every row of a sheet's check table, read from the file: label, expected value and the cell it compares. */
function checkRows(name: string): CheckRow[] {
  const rows: CheckRow[] = [];
  for (let row = DATA_HEADER_ROW + 1; at(name, row, CHECK_COLUMNS.label) !== undefined; row++) {
    const label = valueAt(name, row, CHECK_COLUMNS.label);
    const expected = valueAt(name, row, CHECK_COLUMNS.expected);
    const reference = at(name, row, CHECK_COLUMNS.plumbline);
    const m = reference !== undefined && 'formula' in reference ? /^([A-Z]+)(\d+)$/.exec(reference.formula) : null;
    if (typeof label !== 'string' || typeof expected !== 'number' || !m) throw new Error(`${name} row ${row + 1} is not a check row.`);
    rows.push({ row, label, expected, source: { row: Number(m[2]) - 1, column: columnIndex(m[1]) } });
  }
  return rows;
}

function sorted(cells: Map<string, FileCell>): [string, FileCell][] {
  return [...cells].sort(([a], [b]) => a.localeCompare(b));
}

describe('the committed self-check workbook', () => {
  it.skipIf(!strdAvailable())('holds exactly the cells scripts/make-self-check.ts generates (regenerate with npm run self-check)', () => {
    const generated = planCells(buildSelfCheckPlan());
    expect(sheets.map((s) => s.name)).toEqual(generated.map((s) => s.name));
    for (const fresh of generated) expect(sorted(sheet(fresh.name).cells), fresh.name).toEqual(sorted(fresh.cells));
  });

  // OfficeDev/Excel-Custom-Functions issue 108: Excel saves a JavaScript custom function's call with the
  // prefix _xldudf_ and resolves only that spelling on opening. ECMA-376 Part 1 §18.3.1.4 (c@cm) and
  // [MS-XLSX] dynamicArrayProperties: a dynamic-array formula is an array formula whose cell points at
  // XLDAPR cell metadata with fDynamic="1"; without it Excel shows only the first value, behind "@".
  it('stores every PLUMB call as Excel saves a custom function, as a dynamic array that spills', async () => {
    const zip = await JSZip.loadAsync(bytes);
    const sheetXml = await Promise.all(
      Object.keys(zip.files)
        .filter((p) => /^xl\/worksheets\/sheet\d+\.xml$/.test(p))
        .map((p) => zip.file(p)!.async('string')),
    );
    const formulas = sheetXml.flatMap((xml) => [...xml.matchAll(/<c ([^>]*)><f([^>]*)>([^<]*)<\/f>/g)].map((m) => ({ cell: m[1], f: m[2], text: m[3] })));
    const plumb = formulas.filter((f) => /PLUMB/i.test(f.text));
    expect(plumb.length).toBeGreaterThanOrEqual(12);
    for (const f of plumb) {
      expect(f.text).toMatch(/^_xldudf_PLUMB_[A-Z]+\(/);
      expect(f.text).not.toMatch(/PLUMB\./);
      expect(f.f).toMatch(/t="array" ref="[A-Z]+\d+:[A-Z]+\d+"/);
      expect(f.cell).toContain('cm="1"');
    }
    expect(formulas.filter((f) => !/PLUMB/i.test(f.text)).every((f) => !f.cell.includes('cm='))).toBe(true);
    const metadata = await zip.file('xl/metadata.xml')!.async('string');
    expect(metadata).toContain('<metadataType name="XLDAPR"');
    expect(metadata).toContain('<xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/>');
    expect(metadata).toContain('<cellMetadata count="1"><bk><rc t="1" v="0"/></bk></cellMetadata>');
    expect(await zip.file('[Content_Types].xml')!.async('string')).toContain(
      'PartName="/xl/metadata.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml"',
    );
    expect(await zip.file('xl/_rels/workbook.xml.rels')!.async('string')).toMatch(/relationships\/sheetMetadata" Target="metadata.xml"/);
    expect(await zip.file('xl/workbook.xml')!.async('string')).toContain('fullCalcOnLoad="1"');
  });

  it.skipIf(!strdAvailable())('copies the NIST StRD Longley and Norris data and certified values as NIST publishes them', () => {
    for (const name of ['Longley', 'Norris'] as const) {
      const problem = readStrd(name);
      const data = problem.y.map((y, i) => [y, ...problem.rawX[i]]);
      data.forEach((row, i) => row.forEach((v, j) => expect(valueAt(name, DATA_HEADER_ROW + 1 + i, j), `${name} data`).toBe(v)));
      expect(at(name, DATA_HEADER_ROW + 1 + data.length, 0)).toBeUndefined();
      const expected = checkRows(name).map((c) => c.expected);
      const c = problem.certified;
      for (const p of c.parameters) expect(expected).toEqual(expect.arrayContaining([p.estimate, p.standardDeviation]));
      expect(expected).toEqual(expect.arrayContaining([c.residualSd, c.rSquared, c.residual.df, c.residual.ss, c.regression.f, problem.y.length]));
      expect(String(valueAt(name, 1, 0))).toContain('NIST');
    }
  });

  it('ToothGrowth holds three blank and three #N/A cells, one of each kind in response, text and numeric columns', () => {
    const kinds = new Map<string, string[]>();
    for (let i = 0; i < 60; i++) {
      for (let j = 0; j < 3; j++) {
        const cell = at('ToothGrowth', DATA_HEADER_ROW + 1 + i, j);
        const kind = cell === undefined ? 'blank' : 'error' in cell ? cell.error : typeof (cell as { value: unknown }).value;
        kinds.set(`${j}:${kind}`, [...(kinds.get(`${j}:${kind}`) ?? []), cellAddress(DATA_HEADER_ROW + 1 + i, j)]);
      }
    }
    expect([...kinds.keys()].sort()).toEqual(['0:#N/A', '0:blank', '0:number', '1:#N/A', '1:blank', '1:string', '2:#N/A', '2:blank', '2:number']);
    expect([...kinds].filter(([k]) => /blank|#N\/A/.test(k)).flatMap(([, cells]) => cells)).toHaveLength(6);
    expect(
      new Set(
        kinds
          .get('1:string')!
          .map((a) => sheet('ToothGrowth').cells.get(a))
          .map((c) => (c as { value: string }).value),
      ),
    ).toEqual(new Set(['OJ', 'VC']));
  });

  it('counts every check on the Summary, against the threshold the README states', () => {
    expect(valueAt(SUMMARY_SHEET, SUMMARY.threshold.row, SUMMARY.threshold.column)).toBe(README_THRESHOLD);
    let total = 0;
    DATA_SHEETS.forEach((name, i) => {
      const row = SUMMARY.firstSection + i;
      const rows = checkRows(name);
      total += rows.length;
      expect(valueAt(SUMMARY_SHEET, row, 0)).toBe(name);
      expect(valueAt(SUMMARY_SHEET, row, 1)).toBe(rows.length);
      const result = (r: number) => `$${columnLetters(CHECK_COLUMNS.result)}$${r + 1}`;
      expect(at(SUMMARY_SHEET, row, 2)).toEqual({ formula: `COUNTIF(${name}!${result(rows[0].row)}:${result(rows[rows.length - 1].row)},"PASS")` });
      for (const c of rows) {
        const r = c.row + 1;
        expect(at(name, c.row, CHECK_COLUMNS.result), `${name}!M${r}`).toEqual({
          formula: `IF(L${r}>=${SUMMARY_SHEET}!$B$${SUMMARY.threshold.row + 1},"PASS","FAIL")`,
        });
        expect(at(name, c.row, CHECK_COLUMNS.lre), `${name}!L${r}`).toEqual({ formula: expect.stringContaining(`ABS(K${r}-J${r})/ABS(J${r})`) });
      }
    });
    expect(valueAt(SUMMARY_SHEET, SUMMARY.total.row, SUMMARY.total.column)).toBe(total);
    const passed = cellAddress(SUMMARY.passed.row, SUMMARY.passed.column);
    const inWorkbook = cellAddress(SUMMARY.total.row, SUMMARY.total.column);
    expect(at(SUMMARY_SHEET, SUMMARY.passed.row, SUMMARY.passed.column)).toEqual({
      formula: `SUM(C${SUMMARY.firstSection + 1}:C${SUMMARY.firstSection + DATA_SHEETS.length})`,
    });
    expect(at(SUMMARY_SHEET, SUMMARY.overall.row, SUMMARY.overall.column)).toEqual({ formula: `IF(${passed}=${inWorkbook},"PASS","FAIL")` });
  });
});

describe('the self-check in the preview, with the real PLUMB functions', () => {
  it.each(DATA_SHEETS)('%s: every check passes (LRE of the PLUMB result against the certified or reference value)', (name) => {
    const threshold = valueAt(SUMMARY_SHEET, SUMMARY.threshold.row, SUMMARY.threshold.column) as number;
    const failures: string[] = [];
    for (const check of checkRows(name)) {
      expect(check.source.column, check.label).toBeGreaterThanOrEqual(OUTPUT_COLUMN);
      const value = preview.valueAt({ sheet: name, ...check.source });
      const shown = preview.valueAt({ sheet: name, row: check.row, column: CHECK_COLUMNS.plumbline });
      const digits = typeof value === 'number' ? lre(value, check.expected) : 0;
      if (digits < threshold || shown !== value) failures.push(`${check.label}: ${JSON.stringify(value)} vs ${check.expected} (LRE ${digits.toFixed(1)})`);
    }
    expect(failures).toEqual([]);
  });

  it('every PLUMB formula fills the block the file records for it, with no error and no blank', () => {
    const problems: string[] = [];
    for (const name of DATA_SHEETS) {
      for (const [address, cell] of sheet(name).cells) {
        if (!('spill' in cell) || cell.spill === undefined) continue;
        const [from, to] = cell.spill.split(':').map((a) => /^([A-Z]+)(\d+)$/.exec(a)!);
        for (let r = Number(from[2]) - 1; r <= Number(to[2]) - 1; r++) {
          for (let c = columnIndex(from[1]); c <= columnIndex(to[1]); c++) {
            const value = preview.valueAt({ sheet: name, row: r, column: c });
            if (value === null || typeof value === 'object') problems.push(`${name}!${cellAddress(r, c)} (from ${address}): ${JSON.stringify(value)}`);
          }
        }
        // The block ends where the file says: the cell past its last row is empty.
        const below = preview.valueAt({ sheet: name, row: Number(to[2]), column: columnIndex(from[1]) });
        if (below !== null) problems.push(`${name}: ${address}'s result runs past ${cell.spill}`);
      }
    }
    expect(problems).toEqual([]);
  });

  // README, "How cells are read": a blank or #N/A anywhere in a row leaves the row out and FITSTATS counts
  // it under Rows skipped; rows are named by their worksheet row (the row a user reads at the left).
  it('ToothGrowth: the fit skips exactly the rows with a blank or #N/A and names the others by worksheet row', () => {
    const complete: number[] = [];
    for (let i = 0; i < 60; i++) {
      const row = DATA_HEADER_ROW + 1 + i;
      if (
        [0, 1, 2].every((j) => {
          const c = at('ToothGrowth', row, j);
          return c !== undefined && 'value' in c;
        })
      )
        complete.push(row + 1);
    }
    expect(complete).toHaveLength(54);
    const anchor = (fn: string) => {
      const found = [...sheet('ToothGrowth').cells].find(([, c]) => 'formula' in c && c.formula.startsWith(`PLUMB.${fn}(`));
      const m = /^([A-Z]+)(\d+)$/.exec(found![0])!;
      return { row: Number(m[2]) - 1, column: columnIndex(m[1]) };
    };
    const fit = anchor('FITSTATS');
    const statistic = (label: (typeof FIT_STATS_LABELS)[number]) => {
      const row = fit.row + FIT_STATS_LABELS.indexOf(label);
      expect(preview.valueAt({ sheet: 'ToothGrowth', row, column: fit.column })).toBe(label);
      return preview.valueAt({ sheet: 'ToothGrowth', row, column: fit.column + 1 });
    };
    expect([statistic('Rows used'), statistic('Rows skipped')]).toEqual([54, 6]);
    const residuals = anchor('RESIDUALS');
    const rowColumn = residuals.column + RESIDUALS_HEADER.indexOf('Row');
    const listed = complete.map((_, i) => preview.valueAt({ sheet: 'ToothGrowth', row: residuals.row + 1 + i, column: rowColumn }));
    expect(listed).toEqual(complete);
  });
});

type Shown = number | string | boolean | { error: string } | null;

function shownOf(value: CellValue): Shown {
  return typeof value === 'object' && value !== null ? { error: value.error } : value;
}

/**
 * The workbook's own formulas evaluated by Excel's rules (./selfCheck/excelArithmetic.ts), with
 * every PLUMB result read from the preview; `replace` swaps chosen PLUMB results to show that a
 * wrong one turns its check to FAIL.
 */
function excelView(replace: Record<string, Shown> = {}): ExcelArithmetic {
  return new ExcelArithmetic({
    formulaAt: (name, address) => {
      const cell = sheet(name).cells.get(address);
      return cell !== undefined && 'formula' in cell && !cell.formula.startsWith('PLUMB.') ? cell.formula : undefined;
    },
    valueAt: (name, address) => {
      const cell = sheet(name).cells.get(address);
      if (cell !== undefined && 'value' in cell) return cell.value;
      if (cell !== undefined && 'error' in cell) return { error: cell.error };
      if (`${name}!${address}` in replace) return replace[`${name}!${address}`];
      const m = /^([A-Z]+)(\d+)$/.exec(address)!;
      return shownOf(preview.valueAt({ sheet: name, row: Number(m[2]) - 1, column: columnIndex(m[1]) }));
    },
  });
}

describe("the workbook's own arithmetic, by Excel's rules, on the preview's PLUMB results", () => {
  const overall = cellAddress(SUMMARY.overall.row, SUMMARY.overall.column);

  it('shows PASS in every Result cell and in the overall result', () => {
    const excel = excelView();
    for (const name of DATA_SHEETS) {
      const results = checkRows(name).map((c) => excel.cell(name, cellAddress(c.row, CHECK_COLUMNS.result)));
      expect(new Set(results), name).toEqual(new Set(['PASS']));
    }
    expect(excel.cell(SUMMARY_SHEET, cellAddress(SUMMARY.passed.row, SUMMARY.passed.column))).toBe(
      valueAt(SUMMARY_SHEET, SUMMARY.total.row, SUMMARY.total.column),
    );
    expect(excel.cell(SUMMARY_SHEET, overall)).toBe('PASS');
  });

  it('shows FAIL, never an error, for a result off in its tenth digit, an error or an empty cell', () => {
    const [estimate, , third] = checkRows('Longley');
    const tooth = checkRows('ToothGrowth');
    const address = (c: CheckRow) => cellAddress(c.source.row, c.source.column);
    const offBy = (c: CheckRow) => (shownOf(preview.valueAt({ sheet: 'Longley', ...c.source })) as number) * (1 + 3e-10);
    const excel = excelView({
      [`Longley!${address(estimate)}`]: offBy(estimate),
      [`ToothGrowth!${address(tooth[0])}`]: { error: '#VALUE!' },
      [`ToothGrowth!${address(tooth[tooth.length - 1])}`]: null,
    });
    const result = (name: string, c: CheckRow) => excel.cell(name, cellAddress(c.row, CHECK_COLUMNS.result));
    expect([result('Longley', estimate), result('Longley', third), result('ToothGrowth', tooth[0]), result('ToothGrowth', tooth[tooth.length - 1])]).toEqual([
      'FAIL',
      'PASS',
      'FAIL',
      'FAIL',
    ]);
    expect(excel.cell(SUMMARY_SHEET, overall)).toBe('FAIL');
  });
});
