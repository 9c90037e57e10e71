/**
 * One layer of a sheet's cells (its inputs, its formulas or its spilled values), kept by row: each
 * row is an array over its columns, undefined where a cell is empty. A formula's range argument
 * reads every cell of its range, and reading a row array per row instead of hashing every cell
 * keeps that far below the function's own cost (common practice (no source)).
 */
export interface LayerBounds {
  top: number;
  left: number;
  bottom: number;
  right: number;
}

export class CellLayer<V> {
  private readonly rows = new Map<number, (V | undefined)[]>();
  private count = 0;

  /** Cells holding a value. */
  get size(): number {
    return this.count;
  }

  get(row: number, column: number): V | undefined {
    return this.rows.get(row)?.[column];
  }

  has(row: number, column: number): boolean {
    return this.get(row, column) !== undefined;
  }

  /** The row's cells by column, or undefined when it has none; for reading only. */
  row(row: number): readonly (V | undefined)[] | undefined {
    return this.rows.get(row);
  }

  set(row: number, column: number, value: V): void {
    let cells = this.rows.get(row);
    if (cells === undefined) {
      cells = [];
      this.rows.set(row, cells);
    }
    if (cells[column] === undefined) this.count++;
    // Filled up to the column, never holey, so the engine keeps the array's fast element kind.
    while (cells.length < column) cells.push(undefined);
    cells[column] = value;
  }

  delete(row: number, column: number): void {
    const cells = this.rows.get(row);
    if (cells?.[column] === undefined) return;
    cells[column] = undefined;
    this.count--;
    this.trim(row, cells);
  }

  /** The row's trailing empty cells dropped, and the row itself when none is left. */
  private trim(row: number, cells: (V | undefined)[]): void {
    let end = cells.length;
    while (end > 0 && cells[end - 1] === undefined) end--;
    if (end === 0) this.rows.delete(row);
    else cells.length = end;
  }

  /**
   * Every cell of the block from column left to right in rows top … bottom emptied, but the one
   * at `keep` (a spill's anchor, which the formula layer holds): each row looked up and trimmed
   * once, where a cell at a time would look each up (a 50,000-row spill: 500,000 lookups).
   */
  deleteBlock(block: LayerBounds, keep?: { row: number; column: number }): void {
    for (let r = block.top; r <= block.bottom; r++) {
      const cells = this.rows.get(r);
      if (cells === undefined) continue;
      const last = Math.min(block.right, cells.length - 1);
      for (let c = block.left; c <= last; c++) {
        if (cells[c] === undefined || (keep !== undefined && r === keep.row && c === keep.column)) continue;
        cells[c] = undefined;
        this.count--;
      }
      this.trim(r, cells);
    }
  }

  /** Whether any cell of the block but the one at `keep` holds a value: each row looked up once. */
  holdsAny(block: LayerBounds, keep?: { row: number; column: number }): boolean {
    for (let r = block.top; r <= block.bottom; r++) {
      const cells = this.rows.get(r);
      if (cells === undefined) continue;
      const last = Math.min(block.right, cells.length - 1);
      for (let c = block.left; c <= last; c++) {
        if (cells[c] !== undefined && (keep === undefined || r !== keep.row || c !== keep.column)) return true;
      }
    }
    return false;
  }

  /** The grid's values written from (top, left) on, but at `keep`: set() a row at a time. */
  setBlock(top: number, left: number, grid: readonly (readonly V[])[], keep?: { row: number; column: number }): void {
    grid.forEach((values, i) => {
      const r = top + i;
      let cells = this.rows.get(r);
      if (cells === undefined) {
        cells = [];
        this.rows.set(r, cells);
      }
      while (cells.length < left) cells.push(undefined);
      for (let j = 0; j < values.length; j++) {
        const c = left + j;
        if (keep !== undefined && r === keep.row && c === keep.column) {
          if (cells.length === c) cells.push(undefined);
          continue;
        }
        if (cells[c] === undefined) this.count++;
        if (cells.length === c) cells.push(values[j]);
        else cells[c] = values[j];
      }
      this.trim(r, cells);
    });
  }

  *values(): Generator<V> {
    for (const cells of this.rows.values()) for (const value of cells) if (value !== undefined) yield value;
  }

  /** The smallest rectangle holding every cell with a value, or undefined when the layer is empty. */
  bounds(): LayerBounds | undefined {
    if (this.rows.size === 0) return undefined;
    let [top, left, bottom, right] = [Infinity, Infinity, -Infinity, -Infinity];
    for (const [row, cells] of this.rows) {
      let first = 0;
      while (cells[first] === undefined) first++;
      top = Math.min(top, row);
      bottom = Math.max(bottom, row);
      left = Math.min(left, first);
      right = Math.max(right, cells.length - 1);
    }
    return { top, left, bottom, right };
  }
}
