/**
 * The preview workbook: sheets of cells holding constants or formulas, spilled results, number
 * formats, cell styles, column widths, charts and a selection. Editing a cell re-evaluates the formulas that read it, then the
 * formulas that read their results, until nothing changes.
 */
import { MAX_COLUMNS, rangesOverlap, sameSheet } from '../../addressing/a1';
import { evaluate, type FormulaResult, type FunctionEntry, isCellError, NAMESPACE } from './evaluate';
import { CellLayer, type LayerBounds } from './cellLayer';
import { ChartList } from './charts';
import { FormulaSyntaxError, parseFormula, referencedRanges, type Expression } from './formula';
import { CURRENT_EXCEL, type CalculationBehaviour, type SheetCells } from './functionArguments';
import { shapesFromMetadata, type FunctionShape } from './functionMetadata';
import { ROW_HEIGHT, STANDARD_COLUMN_WIDTH } from './layout';
import type {
  CellError,
  CellInput,
  CellPosition,
  CellStyle,
  CellValue,
  ChartChange,
  ChartSpec,
  CustomFunction,
  NewChart,
  RangeRef,
  WorkbookModel,
} from './types';

interface FormulaCell {
  /** Where it was entered; it is current while that cell of that sheet still holds it. */
  anchor: { sheet: Sheet; row: number; column: number };
  text: string;
  expression: Expression | undefined;
  syntaxError: string | undefined;
  reads: RangeRef[];
  /** What the formula last produced, before spilling. */
  result: FormulaResult;
  /** The area its grid covers (also when blocked), so a cleared blocker can re-spill it. */
  area: RangeRef;
  blocked: boolean;
  generation: number;
}

interface Sheet {
  name: string;
  inputs: CellLayer<CellInput>;
  formats: Map<number, string>;
  formulas: CellLayer<FormulaCell>;
  /** Values spilled from formulas into other cells. */
  spilled: CellLayer<CellValue>;
  /** Only cells with some style set. */
  styles: Map<number, CellStyle>;
  widths: Map<number, number>;
  charts: ChartList;
}

const PLAIN: CellStyle = { bold: false, fill: null, wrap: false };

export type { CalculationBehaviour, FunctionShape };

const key = (row: number, column: number): number => row * MAX_COLUMNS + column;
const rowOf = (k: number): number => Math.floor(k / MAX_COLUMNS);
const columnOf = (k: number): number => k % MAX_COLUMNS;
const INVALID_SHEET_NAME = /[[\]:*?/\\]/;
/** A guard against formulas that keep changing each other's inputs. */
const MAX_PASSES = 64;

export class PreviewWorkbook implements WorkbookModel {
  private readonly sheets: Sheet[] = [];
  private active = '';
  private selected: RangeRef[] = [{ sheet: '', top: 0, left: 0, bottom: 0, right: 0 }];
  private editing = false;
  private readonly functions = new Map<string, FunctionEntry>();
  private readonly shapes = new Map<string, FunctionShape>();
  private behaviour: CalculationBehaviour = CURRENT_EXCEL;
  private readonly listeners = new Set<() => void>();
  private readonly editListeners = new Set<(edited: RangeRef) => void>();
  private chartsAdded = 0;
  private valueChanges = 0;

  constructor(firstSheet = 'Sheet1') {
    this.addSheet(firstSheet);
    this.activateSheet(firstSheet);
  }

  sheetNames(): string[] {
    return this.sheets.map((s) => s.name);
  }

  hasSheet(name: string): boolean {
    return this.find(name) !== undefined;
  }

  addSheet(name: string): void {
    this.validateNewName(name);
    this.valueChanges++;
    const widths = new Map<number, number>();
    const charts = new ChartList((column) => widths.get(column) ?? STANDARD_COLUMN_WIDTH);
    this.sheets.push({
      name,
      inputs: new CellLayer(),
      formats: new Map(),
      formulas: new CellLayer(),
      spilled: new CellLayer(),
      styles: new Map(),
      widths,
      charts,
    });
    this.recalculate(this.allFormulasReading(name));
    this.notify();
  }

  renameSheet(from: string, to: string): void {
    const sheet = this.sheet(from);
    if (from.toLowerCase() !== to.toLowerCase()) this.validateNewName(to);
    this.valueChanges++;
    sheet.name = to;
    if (this.active === from) this.active = to;
    this.selected = this.selected.map((area) => (area.sheet === from ? { ...area, sheet: to } : area));
    for (const s of this.sheets) s.charts.renameSheet(from, to);
    this.notify();
  }

  deleteSheet(name: string): void {
    const sheet = this.sheet(name);
    if (this.sheets.length === 1) throw new Error('A workbook must keep at least one sheet.');
    this.valueChanges++;
    this.sheets.splice(this.sheets.indexOf(sheet), 1);
    if (this.active === sheet.name) this.activateSheet(this.sheets[0].name);
    this.recalculate(this.allFormulasReading(sheet.name));
    this.notify();
  }

  activeSheet(): string {
    return this.active;
  }

  activateSheet(name: string): void {
    this.active = this.sheet(name).name;
    this.selected = [{ sheet: this.active, top: 0, left: 0, bottom: 0, right: 0 }];
    this.notify();
  }

  inputAt(p: CellPosition): CellInput {
    const sheet = this.sheet(p.sheet);
    const formula = sheet.formulas.get(p.row, p.column);
    return formula !== undefined ? formula.text : (sheet.inputs.get(p.row, p.column) ?? null);
  }

  valueAt(p: CellPosition): CellValue {
    return this.value(this.sheet(p.sheet), p.row, p.column);
  }

  valuesIn(range: RangeRef): CellValue[][] {
    const cells = this.cellsOf(this.sheet(range.sheet));
    const rows: CellValue[][] = [];
    for (let r = range.top; r <= range.bottom; r++) {
      const row: CellValue[] = [];
      for (let c = range.left; c <= range.right; c++) row.push(cells(r, c));
      rows.push(row);
    }
    return rows;
  }

  /**
   * A count that grows whenever any cell's value may have changed (an entry, a recalculated
   * result, a sheet added, renamed or deleted), so a view drawn from values can be reused while it stays.
   */
  valuesRevision(): number {
    return this.valueChanges;
  }

  /** The formula's error message at a cell, for the grid's tooltip and status line. */
  errorAt(p: CellPosition): CellError | undefined {
    const value = this.valueAt(p);
    return isCellError(value) ? value : undefined;
  }

  setInputs(sheetName: string, top: number, left: number, inputs: readonly (readonly CellInput[])[]): void {
    const sheet = this.sheet(sheetName);
    this.valueChanges++;
    const changed: RangeRef = { sheet: sheet.name, top, left, bottom: top + inputs.length - 1, right: left + (inputs[0]?.length ?? 1) - 1 };
    const dirty = new Set<FormulaCell>();
    inputs.forEach((row, i) =>
      row.forEach((input, j) => {
        const [row, column] = [top + i, left + j];
        sheet.inputs.delete(row, column);
        const old = sheet.formulas.get(row, column);
        if (old !== undefined) {
          this.clearSpill(old);
          sheet.formulas.delete(row, column);
          this.formulasReading(old.area).forEach((f) => dirty.add(f));
        }
        // As in Excel, a cell formatted as text ("@") keeps what is entered as text, even "=…".
        const asText = sheet.formats.get(key(row, column))?.trim() === '@';
        if (typeof input === 'string' && input.startsWith('=') && input.length > 1 && !asText) {
          const formula = this.newFormula(sheet, input, row, column);
          sheet.formulas.set(row, column, formula);
          dirty.add(formula);
        } else if (input !== null && input !== '') {
          sheet.inputs.set(row, column, input);
        }
      }),
    );
    this.formulasReading(changed).forEach((f) => dirty.add(f));
    this.formulasSpillingInto(changed).forEach((f) => dirty.add(f));
    this.recalculate(dirty);
    this.notify();
    for (const listener of this.editListeners) listener(changed);
  }

  numberFormatAt(p: CellPosition): string {
    return this.sheet(p.sheet).formats.get(key(p.row, p.column)) ?? 'General';
  }

  setNumberFormats(sheetName: string, top: number, left: number, formats: readonly (readonly string[])[]): void {
    const sheet = this.sheet(sheetName);
    formats.forEach((row, i) => row.forEach((f, j) => sheet.formats.set(key(top + i, left + j), f)));
    this.notify();
  }

  styleAt(p: CellPosition): CellStyle {
    return { ...(this.sheet(p.sheet).styles.get(key(p.row, p.column)) ?? PLAIN) };
  }

  setStyle(range: RangeRef, change: Partial<CellStyle>): void {
    const sheet = this.sheet(range.sheet);
    this.eachCell(range, (k) => {
      const style = { ...(sheet.styles.get(k) ?? PLAIN), ...change };
      if (style.bold || style.fill !== null || style.wrap) sheet.styles.set(k, style);
      else sheet.styles.delete(k);
    });
    this.notify();
  }

  clearStyles(range: RangeRef): void {
    const sheet = this.sheet(range.sheet);
    this.eachCell(range, (k) => sheet.styles.delete(k));
    this.notify();
  }

  columnWidth(sheetName: string, column: number): number {
    return this.sheet(sheetName).widths.get(column) ?? STANDARD_COLUMN_WIDTH;
  }

  setColumnWidth(sheetName: string, left: number, right: number, points: number): void {
    if (!Number.isFinite(points) || points < 0) throw new Error(`${points} is not a column width.`);
    const sheet = this.sheet(sheetName);
    for (let c = left; c <= right; c++) sheet.widths.set(c, points);
    this.notify();
  }

  rowHeight(sheetName: string): number {
    this.sheet(sheetName);
    return ROW_HEIGHT;
  }

  charts(sheetName: string): ChartSpec[] {
    return this.sheet(sheetName).charts.list();
  }

  addChart(sheetName: string, chart: NewChart): ChartSpec {
    const added = this.sheet(sheetName).charts.add(chart, `preview-chart-${++this.chartsAdded}`);
    this.notify();
    return added;
  }

  updateChart(sheetName: string, id: string, change: ChartChange): void {
    this.sheet(sheetName).charts.update(id, change);
    this.notify();
  }

  removeChart(sheetName: string, id: string): void {
    this.sheet(sheetName).charts.remove(id);
    this.notify();
  }

  usedExtent(sheetName: string): { rows: number; columns: number } {
    const sheet = this.sheet(sheetName);
    let rows = 0;
    let columns = 0;
    for (const bounds of this.valueBounds(sheet)) {
      rows = Math.max(rows, bounds.bottom + 1);
      columns = Math.max(columns, bounds.right + 1);
    }
    return { rows, columns };
  }

  usedArea(sheetName: string, valuesOnly: boolean): RangeRef | undefined {
    const sheet = this.sheet(sheetName);
    const parts = this.valueBounds(sheet);
    if (!valuesOnly) {
      for (const map of [sheet.formats, sheet.styles]) {
        for (const k of map.keys()) parts.push({ top: rowOf(k), left: columnOf(k), bottom: rowOf(k), right: columnOf(k) });
      }
    }
    if (parts.length === 0) return undefined;
    return {
      sheet: sheet.name,
      top: Math.min(...parts.map((b) => b.top)),
      left: Math.min(...parts.map((b) => b.left)),
      bottom: Math.max(...parts.map((b) => b.bottom)),
      right: Math.max(...parts.map((b) => b.right)),
    };
  }

  selection(): RangeRef {
    return { ...this.selected[0] };
  }

  selectedAreas(): RangeRef[] {
    return this.selected.map((area) => ({ ...area }));
  }

  select(range: RangeRef): void {
    this.selectAreas([range]);
  }

  selectAreas(areas: readonly RangeRef[]): void {
    if (areas.length === 0) throw new Error('A selection has at least one area.');
    const sheet = this.sheet(areas[0].sheet).name;
    if (areas.some((area) => this.sheet(area.sheet).name !== sheet)) throw new Error('Every selected area must be on one sheet.');
    this.active = sheet;
    this.selected = areas.map((area) => ({ ...area, sheet }));
    this.notify();
  }

  cellEditMode(): boolean {
    return this.editing;
  }

  setCellEditMode(editing: boolean): void {
    if (this.editing === editing) return;
    this.editing = editing;
    this.notify();
  }

  registerFunction(id: string, fn: CustomFunction): void {
    const upper = id.toUpperCase();
    this.functions.set(upper, { fn, shape: this.shapes.get(upper) });
    this.recalculate(this.formulasCalling(upper));
    this.notify();
  }

  /** Parameter shapes from functions.json, so arguments arrive as Excel passes them. */
  setFunctionShapes(shapes: readonly FunctionShape[]): void {
    for (const s of shapes) {
      const id = s.id.toUpperCase();
      this.shapes.set(id, s);
      const entry = this.functions.get(id);
      if (entry !== undefined) this.functions.set(id, { ...entry, shape: s });
    }
    this.recalculate(new Set(this.everyFormula()));
    this.notify();
  }

  /** The parsed text of functions.json, as the add-in ships it. */
  loadFunctionMetadata(metadata: unknown): void {
    this.setFunctionShapes(shapesFromMetadata(metadata));
  }

  calculationBehaviour(): CalculationBehaviour {
    return { ...this.behaviour };
  }

  /** Switches how Excel builds arguments (e.g. blanks as 0 on older desktop builds) and recalculates everything. */
  setCalculationBehaviour(change: Partial<CalculationBehaviour>): void {
    this.behaviour = { ...this.behaviour, ...change };
    this.recalculate(new Set(this.everyFormula()));
    this.notify();
  }

  onCellsEdited(listener: (edited: RangeRef) => void): () => void {
    this.editListeners.add(listener);
    return () => this.editListeners.delete(listener);
  }

  subscribe(listener: () => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  private notify(): void {
    for (const listener of this.listeners) listener();
  }

  /** The bounds of each non-empty layer of values: inputs, formulas and spilled values. */
  private valueBounds(sheet: Sheet): LayerBounds[] {
    return [sheet.inputs.bounds(), sheet.formulas.bounds(), sheet.spilled.bounds()].filter((b) => b !== undefined);
  }

  private eachCell(range: RangeRef, visit: (k: number) => void): void {
    for (let r = range.top; r <= range.bottom; r++) for (let c = range.left; c <= range.right; c++) visit(key(r, c));
  }

  private find(name: string): Sheet | undefined {
    const lower = name.toLowerCase();
    return this.sheets.find((s) => s.name.toLowerCase() === lower);
  }

  private sheet(name: string): Sheet {
    const sheet = this.find(name);
    if (sheet === undefined) throw new Error(`There is no sheet named ${name}.`);
    return sheet;
  }

  private validateNewName(name: string): void {
    if (name.trim() === '' || name.length > 31 || INVALID_SHEET_NAME.test(name) || name.startsWith("'") || name.endsWith("'")) {
      throw new Error(`"${name}" is not a valid sheet name.`);
    }
    if (this.find(name) !== undefined) throw new Error(`A sheet named ${name} already exists.`);
  }

  /** A formula's anchor shows its result, then a spilled value, then the input. */
  private value(sheet: Sheet, row: number, column: number): CellValue {
    const formula = sheet.formulas.get(row, column);
    if (formula !== undefined) return anchorValue(formula);
    return sheet.spilled.get(row, column) ?? sheet.inputs.get(row, column) ?? null;
  }

  /**
   * The sheet's values as value() reads them, for one range argument read row by row: each row's
   * layers are looked up once for all its columns. Only for reading the sheet as it stands now.
   */
  private cellsOf(sheet: Sheet): SheetCells {
    let current = -1;
    let formulas: readonly (FormulaCell | undefined)[] | undefined;
    let spilled: readonly (CellValue | undefined)[] | undefined;
    let inputs: readonly (CellInput | undefined)[] | undefined;
    return (row, column) => {
      if (row !== current) {
        current = row;
        formulas = sheet.formulas.row(row);
        spilled = sheet.spilled.row(row);
        inputs = sheet.inputs.row(row);
      }
      const formula = formulas?.[column];
      if (formula !== undefined) return anchorValue(formula);
      return spilled?.[column] ?? inputs?.[column] ?? null;
    };
  }

  private newFormula(sheet: Sheet, text: string, row: number, column: number): FormulaCell {
    const here: RangeRef = { sheet: sheet.name, top: row, left: column, bottom: row, right: column };
    try {
      const expression = parseFormula(text, sheet.name);
      return {
        anchor: { sheet, row, column },
        text,
        expression,
        syntaxError: undefined,
        reads: referencedRanges(expression),
        result: { grid: [[null]] },
        area: here,
        blocked: false,
        generation: 0,
      };
    } catch (error) {
      const message = error instanceof FormulaSyntaxError ? error.message : String(error);
      return {
        anchor: { sheet, row, column },
        text,
        expression: undefined,
        syntaxError: message,
        reads: [],
        result: { error: { error: '#NAME?', message } },
        area: here,
        blocked: false,
        generation: 0,
      };
    }
  }

  private *everyFormula(): Generator<FormulaCell> {
    for (const sheet of this.sheets) yield* sheet.formulas.values();
  }

  private formulasReading(range: RangeRef): Set<FormulaCell> {
    const found = new Set<FormulaCell>();
    for (const f of this.everyFormula()) if (f.reads.some((r) => rangesOverlap(r, range))) found.add(f);
    return found;
  }

  private allFormulasReading(sheetName: string): Set<FormulaCell> {
    return new Set([...this.everyFormula()].filter((f) => f.reads.some((r) => sameSheet(r.sheet, sheetName))));
  }

  private formulasSpillingInto(range: RangeRef): Set<FormulaCell> {
    return new Set([...this.everyFormula()].filter((f) => rangesOverlap(f.area, range)));
  }

  private formulasCalling(id: string): Set<FormulaCell> {
    const calls = (e: Expression | undefined | null): boolean =>
      e !== undefined &&
      e !== null &&
      ((e.kind === 'call' && (e.name === `${NAMESPACE}${id}` || e.args.some(calls))) || (e.kind === 'divide' && (calls(e.dividend) || calls(e.divisor))));
    return new Set([...this.everyFormula()].filter((f) => calls(f.expression)));
  }

  /** Where the formula stands, unless it has since been overwritten or its sheet deleted. */
  private anchorOf(formula: FormulaCell): FormulaCell['anchor'] | undefined {
    const { sheet, row, column } = formula.anchor;
    return this.sheets.includes(sheet) && sheet.formulas.get(row, column) === formula ? formula.anchor : undefined;
  }

  private recalculate(dirty: Set<FormulaCell>): void {
    let pending = dirty;
    for (let pass = 0; pass < MAX_PASSES && pending.size > 0; pass++) {
      const next = new Set<FormulaCell>();
      for (const formula of pending) {
        if (this.anchorOf(formula) === undefined || formula.expression === undefined) continue;
        const before = formula.area;
        const outcome = evaluate(formula.expression, {
          valueAt: (s, r, c) => {
            const target = this.find(s);
            return target === undefined ? { error: '#REF!' } : this.value(target, r, c);
          },
          hasSheet: (s) => this.hasSheet(s),
          sheetCells: (s) => {
            const target = this.find(s);
            return target === undefined ? undefined : this.cellsOf(target);
          },
          lookup: (name) => this.functions.get(name.toUpperCase()),
          behaviour: this.behaviour,
        });
        if (outcome instanceof Promise) {
          const generation = ++formula.generation;
          this.place(formula, { error: { error: '#BUSY!', message: 'Calculating…' } });
          void outcome.then((result) => {
            if (formula.generation !== generation || this.anchorOf(formula) === undefined) return;
            const settled = formula.area;
            this.place(formula, result);
            this.recalculate(new Set([...this.formulasReading(settled), ...this.formulasReading(formula.area)]));
            this.notify();
          });
        } else {
          formula.generation++;
          this.place(formula, outcome);
        }
        for (const f of this.formulasReading(before)) if (f !== formula) next.add(f);
        for (const f of this.formulasReading(formula.area)) if (f !== formula) next.add(f);
      }
      pending = next;
    }
  }

  private clearSpill(formula: FormulaCell): void {
    if (formula.blocked) return;
    const { area, anchor } = formula;
    anchor.sheet.spilled.deleteBlock(area, anchor);
  }

  /**
   * Writes a result at its anchor and spills it, unless any target cell is taken. A result that
   * spills over the very area its last one spilled over owns those cells already: its values
   * overwrite them in place, and only an input or a formula entered since can block it.
   */
  private place(formula: FormulaCell, result: FormulaResult): void {
    const { sheet, row, column } = formula.anchor;
    this.valueChanges++;
    const grid = 'grid' in result ? result.grid : [[null]];
    const area: RangeRef = { sheet: sheet.name, top: row, left: column, bottom: row + grid.length - 1, right: column + grid[0].length - 1 };
    const sameSpill = 'grid' in result && 'grid' in formula.result && !formula.blocked && sameArea(formula.area, area);
    if (!sameSpill) this.clearSpill(formula);
    formula.result = result;
    formula.area = area;
    formula.blocked = false;
    if (!('grid' in result)) return;
    const anchor = { row, column };
    const taken = sheet.inputs.holdsAny(area, anchor) || sheet.formulas.holdsAny(area, anchor) || (!sameSpill && sheet.spilled.holdsAny(area, anchor));
    if (taken) {
      if (sameSpill) this.clearSpill(formula);
      formula.blocked = true;
      return;
    }
    sheet.spilled.setBlock(row, column, grid, anchor);
  }
}

function sameArea(a: RangeRef, b: RangeRef): boolean {
  return a.sheet === b.sheet && a.top === b.top && a.left === b.left && a.bottom === b.bottom && a.right === b.right;
}

/** What a formula's own cell shows: its error, #SPILL! when blocked, else its result's first cell. */
function anchorValue(formula: FormulaCell): CellValue {
  if ('error' in formula.result) return formula.result.error;
  if (formula.blocked) return { error: '#SPILL!', message: 'The result needs empty cells to spill into; clear the cells in its way.' };
  return formula.result.grid[0][0];
}

export function createWorkbook(firstSheet = 'Sheet1'): PreviewWorkbook {
  return new PreviewWorkbook(firstSheet);
}
