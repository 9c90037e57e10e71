import { memo } from 'preact/compat';
import type { PlottedChart } from '../workbook/chartData';
import { axisTicks, extent, hasZeroLine, linearScale, tickLabel } from './chartScale';
import { markerPath } from './markerPath';

interface ScatterChartProps {
  name: string;
  plotted: PlottedChart;
  /** Pixels within the grid canvas. */
  left: number;
  top: number;
  width: number;
  height: number;
}

/** The first series takes the add-in's accent; further series get plain, clearly different tones. */
const SERIES_COLOURS = ['#0f766e', '#52525b', '#b45309', '#1d4ed8'];
const TICK_TARGET = 5;

const colourOf = (index: number) => SERIES_COLOURS[index % SERIES_COLOURS.length];
const MARKER_RADIUS = 3.5;

/**
 * One scatter chart over the grid (redrawn only when its props change: the grid passes the same
 * plotted values until a value changes), drawn as inline SVG from the values its cells hold now: marker
 * series as dots, line series as straight lines without markers. Axes follow Excel's automatic
 * scale unless their bounds are fixed; what lies outside fixed bounds is clipped, as in Excel.
 * Axis titles and the series names (when there are several) take space only when present.
 */
export const ScatterChart = memo(function ScatterChart({ name, plotted, left, top, width, height }: ScatterChartProps) {
  const points = plotted.series.flatMap((s) => s.points);
  const xTicks = axisTicks(plotted.xScale, ...extent(points.map((p) => p.x)), TICK_TARGET);
  const yTicks = axisTicks(plotted.yScale, ...extent(points.map((p) => p.y)), TICK_TARGET);
  const legend = plotted.series.length > 1;
  const plot = {
    left: 52 + (plotted.yTitle ? 18 : 0),
    right: width - 14,
    top: 12 + (plotted.title ? 22 : 0) + (legend ? 18 : 0),
    bottom: height - 26 - (plotted.xTitle ? 18 : 0),
  };
  const x = linearScale(xTicks.min, xTicks.max, plot.left, plot.right);
  const y = linearScale(yTicks.min, yTicks.max, plot.bottom, plot.top);
  const label = plotted.title || name;
  const clipId = `chart-plot-${name.replace(/[^A-Za-z0-9_-]/g, '_')}`;

  return (
    <div class="chart" data-chart={name} style={{ left: `${left}px`, top: `${top}px`, width: `${width}px`, height: `${height}px` }}>
      <svg role="img" aria-label={label} width={width} height={height} viewBox={`0 0 ${width} ${height}`}>
        {plotted.title && (
          <text class="chart-title" x={width / 2} y={22} text-anchor="middle">
            {plotted.title}
          </text>
        )}
        {legend && (
          <g class="chart-legend">
            {plotted.series.map((s, i) => (
              <g key={i} transform={`translate(${plot.left + i * 130}, ${plot.top - 12})`}>
                {s.drawn === 'lines' ? (
                  <line x1={-2} x2={10} y1={-4} y2={-4} stroke={colourOf(i)} stroke-width={2} />
                ) : (
                  <circle r={4} cx={4} cy={-4} fill={colourOf(i)} />
                )}
                <text x={12} y={0}>
                  {s.name}
                </text>
              </g>
            ))}
          </g>
        )}
        {yTicks.values.map((v) => (
          <g key={`y${v}`} class="chart-tick" data-axis="y">
            <line x1={plot.left} x2={plot.right} y1={y(v)} y2={y(v)} class="chart-grid" />
            <text x={plot.left - 6} y={y(v) + 4} text-anchor="end">
              {tickLabel(v, yTicks.step)}
            </text>
          </g>
        ))}
        {xTicks.values.map((v) => (
          <g key={`x${v}`} class="chart-tick" data-axis="x">
            <line x1={x(v)} x2={x(v)} y1={plot.bottom} y2={plot.bottom + 4} class="chart-axis" />
            <text x={x(v)} y={plot.bottom + 17} text-anchor="middle">
              {tickLabel(v, xTicks.step)}
            </text>
          </g>
        ))}
        {hasZeroLine(yTicks) && <line class="chart-zero" x1={plot.left} x2={plot.right} y1={y(0)} y2={y(0)} />}
        <line class="chart-axis" x1={plot.left} x2={plot.left} y1={plot.top} y2={plot.bottom} />
        <line class="chart-axis" x1={plot.left} x2={plot.right} y1={plot.bottom} y2={plot.bottom} />
        <clipPath id={clipId}>
          <rect x={plot.left} y={plot.top} width={Math.max(0, plot.right - plot.left)} height={Math.max(0, plot.bottom - plot.top)} />
        </clipPath>
        {plotted.series.map((s, i) =>
          s.drawn === 'lines' ? (
            <g key={i} class="chart-line" data-series={s.name} clip-path={`url(#${clipId})`} stroke={colourOf(i)}>
              {s.runs
                .filter((run) => run.length > 1)
                .map((run, j) => (
                  <polyline key={j} fill="none" stroke-width={1.5} points={run.map((p) => `${x(p.x)},${y(p.y)}`).join(' ')} />
                ))}
            </g>
          ) : (
            <g key={i} class="chart-series" data-series={s.name} clip-path={`url(#${clipId})`}>
              <path
                class="chart-markers"
                d={markerPath(s.points, x, y)}
                stroke={colourOf(i)}
                stroke-width={2 * MARKER_RADIUS}
                stroke-linecap="round"
                fill="none"
              />
            </g>
          ),
        )}
        {plotted.xTitle && (
          <text class="chart-axis-title" x={(plot.left + plot.right) / 2} y={height - 8} text-anchor="middle">
            {plotted.xTitle}
          </text>
        )}
        {plotted.yTitle && (
          <text class="chart-axis-title" transform={`translate(14, ${(plot.top + plot.bottom) / 2}) rotate(-90)`} text-anchor="middle">
            {plotted.yTitle}
          </text>
        )}
      </svg>
    </div>
  );
});
