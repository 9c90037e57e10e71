import { useEffect, useRef, useState } from 'preact/hooks';
import { cellAddress, columnLetters } from '../../addressing/a1';
import { plotChart, type PlottedChart } from '../workbook/chartData';
import { anchorAt, PIXELS_PER_POINT } from '../workbook/layout';
import type { ChartSpec, RangeRef } from '../workbook/types';
import type { PreviewWorkbook } from '../workbook/workbook';
import { formatValue } from '../workbook/numberFormat';
import { ScatterChart } from './ScatterChart';

const ROW_HEIGHT = 24;
const HEADER_WIDTH = 52;
/** Rows and columns drawn beyond the visible window, so scrolling does not show blank gaps. */
const OVERSCAN = 10;
const COLUMN_OVERSCAN = 3;
/** Preact passes style numbers through unchanged, so lengths carry their unit. */
const px = (n: number): string => `${n}px`;
const MIN_ROWS = 60;
const MIN_COLUMNS = 12;

interface GridProps {
  workbook: PreviewWorkbook;
  sheet: string;
  selection: RangeRef;
  onSelect(range: RangeRef): void;
  onStartEdit(initial?: string): void;
}

function inRange(range: RangeRef, row: number, column: number): boolean {
  return row >= range.top && row <= range.bottom && column >= range.left && column <= range.right;
}

/** The first and last of the columns whose span meets [from, to], in canvas pixels. */
function columnsMeeting(edges: readonly number[], from: number, to: number): { first: number; last: number } {
  let first = 0;
  while (first < edges.length - 2 && edges[first + 1] <= from) first++;
  let last = first;
  while (last < edges.length - 2 && edges[last + 1] < to) last++;
  return { first, last };
}

/**
 * The sheet's cells, drawn as a window over the rows and columns in view so that sheets of
 * hundreds of thousands of rows, and reports a hundred columns wide, stay responsive: every
 * recalculation redraws the grid in the same task.
 */
export function Grid({ workbook, sheet, selection, onSelect, onStartEdit }: GridProps) {
  const scroller = useRef<HTMLDivElement>(null);
  const [scrollTop, setScrollTop] = useState(0);
  const [scrollLeft, setScrollLeft] = useState(0);
  const [height, setHeight] = useState(600);
  // Until the first measurement, as wide as a large screen, so no column in view is left out.
  const [width, setWidth] = useState(2560);
  const extent = workbook.usedExtent(sheet);
  // Each chart's values, read again only once a value or the chart itself has changed: a report's
  // charts read thousands of cells, and the grid redraws on every selection change too.
  const plots = useRef(new Map<string, { key: string; plotted: PlottedChart }>());
  const plotted = (chart: ChartSpec): PlottedChart => {
    const key = `${workbook.valuesRevision()}|${JSON.stringify(chart)}`;
    const cached = plots.current.get(chart.id);
    if (cached?.key === key) return cached.plotted;
    const fresh = plotChart(workbook, chart);
    plots.current.set(chart.id, { key, plotted: fresh });
    return fresh;
  };
  const charts = workbook.charts(sheet);
  for (const id of plots.current.keys()) if (!charts.some((c) => c.id === id)) plots.current.delete(id);
  const widthOf = (column: number) => workbook.columnWidth(sheet, column);
  // The grid reaches past the last chart too, so every chart can be scrolled into view.
  const chartEnds = charts.map((c) => anchorAt(widthOf, c.bounds.left + c.bounds.width, c.bounds.top + c.bounds.height));
  const rows = Math.max(MIN_ROWS, extent.rows + 20, ...chartEnds.map((e) => e.row + 2));
  const columns = Math.max(MIN_COLUMNS, extent.columns + 3, ...chartEnds.map((e) => e.column + 2));
  /** Column edges in pixels from the canvas's left, one more than there are columns. */
  const edges = [HEADER_WIDTH];
  for (let column = 0; column < columns; column++) edges.push(edges[column] + widthOf(column) * PIXELS_PER_POINT);

  useEffect(() => {
    const el = scroller.current;
    if (!el) return;
    const observer = new ResizeObserver(() => {
      setHeight(el.clientHeight);
      setWidth(el.clientWidth);
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, []);

  const first = Math.max(0, Math.floor(scrollTop / ROW_HEIGHT) - OVERSCAN);
  const last = Math.min(rows - 1, Math.ceil((scrollTop + height) / ROW_HEIGHT) + OVERSCAN);
  const inView = columnsMeeting(edges, scrollLeft, scrollLeft + width);
  const firstColumn = Math.max(0, inView.first - COLUMN_OVERSCAN);
  const lastColumn = Math.min(columns - 1, inView.last + COLUMN_OVERSCAN);
  const anchor = { row: selection.top, column: selection.left };

  const move = (dRow: number, dColumn: number, extend: boolean) => {
    const row = Math.max(0, Math.min(rows - 1, (extend ? selection.bottom : anchor.row) + dRow));
    const column = Math.max(0, Math.min(columns - 1, (extend ? selection.right : anchor.column) + dColumn));
    onSelect(
      extend
        ? {
            sheet,
            top: Math.min(anchor.row, row),
            left: Math.min(anchor.column, column),
            bottom: Math.max(anchor.row, row),
            right: Math.max(anchor.column, column),
          }
        : { sheet, top: row, left: column, bottom: row, right: column },
    );
  };

  const onKeyDown = (e: KeyboardEvent) => {
    const steps: Record<string, [number, number]> = { ArrowUp: [-1, 0], ArrowDown: [1, 0], ArrowLeft: [0, -1], ArrowRight: [0, 1] };
    if (e.key in steps) {
      e.preventDefault();
      move(steps[e.key][0], steps[e.key][1], e.shiftKey);
    } else if (e.key === 'Enter' || e.key === 'F2') {
      e.preventDefault();
      onStartEdit();
    } else if (e.key === 'Delete' || e.key === 'Backspace') {
      e.preventDefault();
      const blank = Array.from({ length: selection.bottom - selection.top + 1 }, () =>
        Array.from({ length: selection.right - selection.left + 1 }, () => null),
      );
      workbook.setInputs(sheet, selection.top, selection.left, blank);
    } else if (e.key.length === 1 && !e.ctrlKey && !e.metaKey && !e.altKey) {
      e.preventDefault();
      onStartEdit(e.key);
    }
  };

  const clickCell = (row: number, column: number, e: MouseEvent) => {
    if (e.shiftKey) {
      onSelect({
        sheet,
        top: Math.min(anchor.row, row),
        left: Math.min(anchor.column, column),
        bottom: Math.max(anchor.row, row),
        right: Math.max(anchor.column, column),
      });
    } else {
      onSelect({ sheet, top: row, left: column, bottom: row, right: column });
    }
    scroller.current?.focus();
  };

  const visible = [];
  for (let row = first; row <= last; row++) {
    const cells = [];
    for (let column = firstColumn; column <= lastColumn; column++) {
      const position = { sheet, row, column };
      const value = workbook.valueAt(position);
      const style = workbook.styleAt(position);
      const text = formatValue(value, workbook.numberFormatAt(position));
      const isError = typeof value === 'object' && value !== null;
      const selected = inRange(selection, row, column);
      const classes = ['cell'];
      if (typeof value === 'number') classes.push('number');
      if (style.bold) classes.push('bold');
      if (style.wrap) classes.push('wrap');
      // Text runs on into an empty neighbour, as readers of spreadsheets expect, unless it wraps.
      else if (typeof value === 'string' && workbook.valueAt({ sheet, row, column: column + 1 }) === null) classes.push('overflowing');
      if (isError) classes.push('error');
      if (selected) classes.push('selected');
      if (row === anchor.row && column === anchor.column) classes.push('active');
      cells.push(
        <div
          key={column}
          class={classes.join(' ')}
          role="gridcell"
          data-cell={cellAddress(row, column)}
          title={isError ? (value.message ?? value.error) : text}
          // The selection's tint wins over a fill so the selected cells stay visible.
          style={{
            left: px(edges[column]),
            width: px(edges[column + 1] - edges[column]),
            background: style.fill !== null && !selected ? style.fill : undefined,
          }}
          onMouseDown={(e) => clickCell(row, column, e)}
          onDblClick={() => onStartEdit()}
        >
          {text}
        </div>,
      );
    }
    visible.push(
      <div key={row} class="grid-row" role="row" style={{ top: px(ROW_HEIGHT + row * ROW_HEIGHT) }}>
        <div class="row-header" role="rowheader" style={{ width: px(HEADER_WIDTH) }}>
          {row + 1}
        </div>
        {cells}
      </div>,
    );
  }

  return (
    <div
      class="grid-scroller"
      ref={scroller}
      tabIndex={0}
      role="grid"
      aria-label={`Sheet ${sheet}`}
      aria-rowcount={rows}
      aria-colcount={columns}
      onScroll={(e) => {
        const el = e.currentTarget as HTMLDivElement;
        setScrollTop(el.scrollTop);
        setScrollLeft(el.scrollLeft);
      }}
      onKeyDown={onKeyDown}
    >
      <div class="grid-canvas" style={{ height: px(ROW_HEIGHT * (rows + 1)), width: px(edges[columns]) }}>
        <div class="column-headers" role="row" style={{ top: px(scrollTop) }}>
          <div class="corner" style={{ width: px(HEADER_WIDTH) }} />
          {Array.from({ length: lastColumn - firstColumn + 1 }, (_, k) => firstColumn + k).map((column) => (
            <div key={column} class="column-header" role="columnheader" style={{ left: px(edges[column]), width: px(edges[column + 1] - edges[column]) }}>
              {columnLetters(column)}
            </div>
          ))}
        </div>
        {visible}
        {charts.map((chart) => (
          <ScatterChart
            key={chart.id}
            name={chart.name}
            plotted={plotted(chart)}
            left={HEADER_WIDTH + chart.bounds.left * PIXELS_PER_POINT}
            top={ROW_HEIGHT + chart.bounds.top * PIXELS_PER_POINT}
            width={chart.bounds.width * PIXELS_PER_POINT}
            height={chart.bounds.height * PIXELS_PER_POINT}
          />
        ))}
      </div>
    </div>
  );
}
