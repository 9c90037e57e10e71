// What the extended-precision machinery costs (issue #8): the factor-and-fit stage, with the
// check (and, where it fires, the double-double solve) against the same stage in double alone.
// The two run interleaved in one process, so drift on a shared machine hits both alike.
//   node --expose-gc --import tsx scripts/benchPrecision.ts   prints one line per case.
import { buildDesign } from '../src/engine/fit/design';
import { type Precision, solveLeastSquares } from '../src/engine/fit/leastSquares';
import { generateColumns, polynomialRows } from './benchData';

const PAIRS = 15;
const MAX_PAIRS = 201;
const WARM_UP_PAIRS = 3;
/** Collecting garbage before each run keeps one run's garbage from being billed to the next. */
const collectGarbage = (globalThis as { gc?: () => void }).gc ?? (() => undefined);

function rowsOf(x: Float64Array, n: number, p: number): number[][] {
  return Array.from({ length: n }, (_, i) => Array.from({ length: p }, (_, j) => x[j * n + i]));
}

function medianRatio(label: string, y: number[], x: number[][]): void {
  const design = buildDesign(y, x, true, undefined, undefined);
  const time = (precision: Precision) => {
    collectGarbage();
    const start = performance.now();
    solveLeastSquares(design, precision);
    return performance.now() - start;
  };
  for (let r = 0; r < WARM_UP_PAIRS; r++) {
    time('auto');
    time('double');
  }
  const auto: number[] = [];
  const plain: number[] = [];
  // Small cases get more pairs, up to about a second of them: their runs of a few milliseconds
  // are the noisiest.
  const start = performance.now();
  const pairs = (r: number) => r < PAIRS || (r < MAX_PAIRS && performance.now() - start < 1000);
  // Alternating which goes first cancels any advantage of the second run of a pair.
  for (let r = 0; pairs(r); r++) {
    if (r % 2 === 0) {
      auto.push(time('auto'));
      plain.push(time('double'));
    } else {
      plain.push(time('double'));
      auto.push(time('auto'));
    }
  }
  const median = (v: number[]) => v.sort((a, b) => a - b)[Math.floor(v.length / 2)];
  const [a, d] = [median(auto), median(plain)];
  console.log(`${label.padStart(28)}${a.toFixed(1).padStart(12)}${d.toFixed(1).padStart(12)}${(a / d).toFixed(2).padStart(10)}`);
}

// Both variants compiled by the optimizing tier before anything is timed.
const warmUp = generateColumns(2000, 5);
const warmUpDesign = buildDesign(Array.from(warmUp.y), rowsOf(warmUp.x, 2000, 5), true, undefined, undefined);
for (let r = 0; r < 200; r++) solveLeastSquares(warmUpDesign, r % 2 === 0 ? 'auto' : 'double');

console.log(`${'case'.padStart(28)}${'checked ms'.padStart(12)}${'double ms'.padStart(12)}${'ratio'.padStart(10)}`);
for (const n of [10_000, 100_000]) {
  for (const p of [5, 20, 50]) {
    const { x, y } = generateColumns(n, p);
    medianRatio(`well-conditioned ${n} × ${p}`, Array.from(y), rowsOf(x, n, p));
  }
}
const poly = polynomialRows(10_000, 8);
medianRatio('polynomial 10000 × 8 (κ ≫ 1e3)', poly.y, poly.x);
