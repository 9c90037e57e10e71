/**
 * Axis scales for the preview's charts: round tick steps (1, 2 or 5 times a power of ten) that
 * cover the data, labels with as many decimals as the step needs, and the pixel mapping.
 */

export interface Ticks {
  min: number;
  max: number;
  step: number;
  values: number[];
}

/** Decimals that show every multiple of the step exactly. */
export function stepDecimals(step: number): number {
  return Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
}

/** About `target` ticks spanning [low, high]; a single value or no data still gets a usable axis. */
export function niceTicks(low: number, high: number, target = 5): Ticks {
  let lo = Math.min(low, high);
  let hi = Math.max(low, high);
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) [lo, hi] = [0, 1];
  if (lo === hi) {
    const pad = lo === 0 ? 1 : Math.abs(lo) * 0.1;
    [lo, hi] = [lo - pad, hi + pad];
  }
  const raw = (hi - lo) / Math.max(1, target);
  const magnitude = 10 ** Math.floor(Math.log10(raw));
  const normalized = raw / magnitude;
  const step = (normalized <= 1 ? 1 : normalized <= 2 ? 2 : normalized <= 5 ? 5 : 10) * magnitude;
  // A small tolerance keeps a value that is a multiple of the step, give or take rounding, on its tick.
  const first = Math.floor(lo / step + 1e-9);
  const last = Math.ceil(hi / step - 1e-9);
  const decimals = stepDecimals(step);
  const values: number[] = [];
  for (let i = first; i <= last; i++) values.push(Number((i * step).toFixed(decimals)));
  return { min: values[0], max: values[values.length - 1], step, values };
}

export function tickLabel(value: number, step: number): string {
  const text = value.toFixed(stepDecimals(step));
  // toFixed writes a tiny negative as "-0.0"; an axis shows zero plainly.
  return Number(text) === 0 ? text.replace('-', '') : text;
}

/** Maps [domainMin, domainMax] onto [from, to]; a screen's Y axis runs downwards, so callers pass from > to for it. */
export function linearScale(domainMin: number, domainMax: number, from: number, to: number): (value: number) => number {
  const span = domainMax - domainMin;
  return (value) => (span === 0 ? (from + to) / 2 : from + ((value - domainMin) / span) * (to - from));
}

/** Zero gets its own line when the axis reaches it, so the sign of each value reads at a glance. */
export function hasZeroLine(ticks: Ticks): boolean {
  return ticks.min <= 0 && ticks.max >= 0;
}

/** Lowest and highest value; a spread over the arguments would overflow the stack on long columns. */
export function extent(values: readonly number[]): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return [lo, hi];
}

/** A fixed axis bound, or null where the axis is automatic. */
export interface AxisBounds {
  minimum: number | null;
  maximum: number | null;
}

/**
 * The span an automatic axis covers, by Excel's rule (Microsoft's knowledge-base article "How
 * Chart Axis Limits Are Determined", as Peltier, "How Excel Calculates Automatic Chart Axis
 * Limits", 2012, restates it): when every value is above zero the axis starts at 0 unless the
 * lowest is at least 5/6 of the highest, and mirrored below zero. So the preview, like Excel,
 * squeezes data far from zero into the top of the chart unless the axis is fixed.
 */
export function automaticExtent(low: number, high: number): [number, number] {
  if (low > 0 && low < (5 / 6) * high) return [0, high];
  if (high < 0 && -high < (5 / 6) * -low) return [low, 0];
  return [low, high];
}

/**
 * Ticks for an axis. A fixed bound is the axis's end exactly, and the ticks are counted in steps
 * from the minimum, as Excel counts major units from the axis minimum (from memory).
 */
export function axisTicks(bounds: AxisBounds, low: number, high: number, target = 5): Ticks {
  const [autoLow, autoHigh] = automaticExtent(low, high);
  const ticks = niceTicks(bounds.minimum ?? autoLow, bounds.maximum ?? autoHigh, target);
  if (bounds.minimum === null && bounds.maximum === null) return ticks;
  const min = bounds.minimum ?? ticks.min;
  const max = bounds.maximum ?? ticks.max;
  const decimals = Math.max(stepDecimals(ticks.step), decimalsOf(min));
  const values: number[] = [];
  for (let k = 0; min + k * ticks.step <= max + ticks.step * 1e-9; k++) values.push(Number((min + k * ticks.step).toFixed(decimals)));
  return { min, max, step: ticks.step, values };
}

function decimalsOf(value: number): number {
  const text = String(value);
  return text.includes('e') ? 0 : (text.split('.')[1]?.length ?? 0);
}
