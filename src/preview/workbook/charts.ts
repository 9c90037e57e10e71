/**
 * One sheet's charts. Each is kept anchored to the cells under its corners, so widening a column
 * to its left moves it and widening one beneath it stretches it, as Excel's default placement
 * ("move and size with cells") does; positions are reported in points.
 */
import { anchorAt, pointOf, type CellAnchor, type WidthOf } from './layout';
import type { ChartBounds, ChartChange, ChartSpec, NewChart, RangeRef } from './types';

interface ChartRecord {
  spec: Omit<ChartSpec, 'bounds'>;
  from: CellAnchor;
  to: CellAnchor;
}

export function validBounds(b: ChartBounds): boolean {
  return [b.left, b.top, b.width, b.height].every((n) => Number.isFinite(n) && n >= 0);
}

export class ChartList {
  private readonly records: ChartRecord[] = [];
  /** Excel numbers charts on from the last one added, so a deleted chart's name is not reused. */
  private added = 0;

  constructor(private readonly widthOf: WidthOf) {}

  list(): ChartSpec[] {
    return this.records.map((r) => this.specOf(r));
  }

  add(chart: NewChart, id: string): ChartSpec {
    if (!validBounds(chart.bounds)) throw new Error('A chart needs a non-negative, finite position and size.');
    this.added++;
    let name = chart.name;
    if (name === undefined) {
      let n = this.added;
      while (this.find((r) => r.spec.name.toLowerCase() === `chart ${n}`) !== undefined) n++;
      name = `Chart ${n}`;
    }
    const { bounds, ...rest } = structuredClone(chart);
    const record: ChartRecord = { spec: { ...rest, id, name }, ...this.anchors(bounds) };
    this.records.push(record);
    return this.specOf(record);
  }

  has(id: string): boolean {
    return this.find((r) => r.spec.id === id) !== undefined;
  }

  update(id: string, change: ChartChange): void {
    const record = this.record(id);
    const { bounds, ...rest } = structuredClone(change);
    if (bounds !== undefined) {
      if (!validBounds(bounds)) throw new Error('A chart needs a non-negative, finite position and size.');
      Object.assign(record, this.anchors(bounds));
    }
    record.spec = { ...record.spec, ...rest };
  }

  remove(id: string): void {
    this.records.splice(this.records.indexOf(this.record(id)), 1);
  }

  /** Charts keep reading their cells when a sheet they read from is renamed. */
  renameSheet(from: string, to: string): void {
    const lower = from.toLowerCase();
    const moved = (ref: RangeRef): RangeRef => (ref.sheet.toLowerCase() === lower ? { ...ref, sheet: to } : ref);
    for (const { spec } of this.records) {
      spec.series = spec.series.map((s) => ({
        ...s,
        name: typeof s.name === 'string' ? s.name : moved(s.name),
        x: s.x && moved(s.x),
        y: s.y && moved(s.y),
      }));
    }
  }

  private find(match: (r: ChartRecord) => boolean): ChartRecord | undefined {
    return this.records.find(match);
  }

  private record(id: string): ChartRecord {
    const record = this.find((r) => r.spec.id === id);
    if (record === undefined) throw new Error(`There is no chart with id ${id} on this sheet.`);
    return record;
  }

  private anchors(b: ChartBounds): { from: CellAnchor; to: CellAnchor } {
    return { from: anchorAt(this.widthOf, b.left, b.top), to: anchorAt(this.widthOf, b.left + b.width, b.top + b.height) };
  }

  private specOf(record: ChartRecord): ChartSpec {
    const from = pointOf(this.widthOf, record.from);
    const to = pointOf(this.widthOf, record.to);
    return { ...structuredClone(record.spec), bounds: { left: from.x, top: from.y, width: to.x - from.x, height: to.y - from.y } };
  }
}
