// One benchmark case in its own process, so that its peak memory is its own:
//   tsx scripts/benchCase.ts <method> <n> <p> <repeats>
// prints one JSON line: median milliseconds, peak extra memory over the input data, and a checksum.
import { readFileSync, writeFileSync } from 'node:fs';
import { Matrix, inverse, solve } from 'ml-matrix';
import MultivariateLinearRegression from 'ml-regression-multivariate-linear';
import { fitAccumulated, fitModel, modelCache, RegressionAccumulator } from '../src/engine';
import { generateColumns } from './benchData';

type Method = 'engine' | 'streaming' | 'normal-equations' | 'regression-package';
const [method, nText, pText, repeatsText] = process.argv.slice(2) as [Method, string, string, string];
const n = Number(nText);
const p = Number(pText);
const repeats = Number(repeatsText);
const BLOCK_ROWS = 20_000;

function rows(x: Float64Array, n: number): number[][] {
  return Array.from({ length: n }, (_, i) => Array.from({ length: p }, (_, j) => x[j * n + i]));
}

function residentKb(field: 'VmRSS' | 'VmHWM'): number {
  const status = readFileSync('/proc/self/status', 'utf8');
  return Number(new RegExp(`${field}:\\s+(\\d+)`).exec(status)?.[1] ?? Number.NaN);
}

function runOnce(data: { x: Float64Array; y: Float64Array }, arrays: { x: number[][]; y: number[] } | undefined, n: number): number {
  switch (method) {
    case 'engine': {
      modelCache.reset();
      const fit = fitModel({ y: arrays!.y, x: arrays!.x });
      return fit.terms[1].estimate + fit.terms[1].standardError;
    }
    case 'streaming': {
      const accumulator = new RegressionAccumulator(p, true);
      // One pair of block buffers, refilled for each block, as a reader of sheet blocks would.
      const xBuffer = new Float64Array(BLOCK_ROWS * p);
      const yBuffer = new Float64Array(BLOCK_ROWS);
      for (let start = 0; start < n; start += BLOCK_ROWS) {
        const count = Math.min(BLOCK_ROWS, n - start);
        const x = xBuffer.subarray(0, count * p);
        for (let j = 0; j < p; j++) x.set(data.x.subarray(j * n + start, j * n + start + count), j * count);
        const y = yBuffer.subarray(0, count);
        y.set(data.y.subarray(start, start + count));
        accumulator.addBlock({ rows: count, x, y });
      }
      const fit = fitAccumulated(accumulator.result()).fit;
      return fit.terms[1].estimate + fit.terms[1].standardError;
    }
    case 'normal-equations': {
      const design = new Matrix(arrays!.x.map((r) => [1, ...r]));
      const transposed = design.transpose();
      const gram = transposed.mmul(design);
      const beta = solve(gram, transposed.mmul(Matrix.columnVector(arrays!.y)));
      const residual = Matrix.columnVector(arrays!.y).sub(design.mmul(beta));
      const sigma2 = residual.dot(residual) / (n - p - 1);
      const se = Math.sqrt(sigma2 * inverse(gram).get(1, 1));
      return beta.get(1, 0) + se;
    }
    case 'regression-package': {
      const model = new MultivariateLinearRegression(
        arrays!.x,
        arrays!.y.map((v) => [v]),
      );
      return model.weights[0][0] + model.stdErrors[0];
    }
  }
}

// One untimed run on a small problem first, so every method is timed with its code compiled.
const warmUp = generateColumns(2000, p);
runOnce(warmUp, method === 'streaming' ? undefined : { x: rows(warmUp.x, 2000), y: Array.from(warmUp.y) }, 2000);
const data = generateColumns(n, p);
const arrays = method === 'streaming' ? undefined : { x: rows(data.x, n), y: Array.from(data.y) };
const inputBytes = method === 'streaming' ? data.x.byteLength + data.y.byteLength : n * (p + 1) * 8;
(globalThis as { gc?: () => void }).gc?.();
const baselineKb = residentKb('VmRSS');
// Resets VmHWM to the current resident size (Linux), so the peak below is this fit's own.
writeFileSync('/proc/self/clear_refs', '5');
const times: number[] = [];
let checksum = 0;
for (let r = 0; r < repeats; r++) {
  // The previous repeat's garbage is collected first (untimed), so the peak is one fit's own.
  if (r > 0) (globalThis as { gc?: () => void }).gc?.();
  const start = performance.now();
  checksum = runOnce(data, arrays, n);
  times.push(performance.now() - start);
}
times.sort((a, b) => a - b);
const peakExtraMb = (residentKb('VmHWM') - baselineKb) / 1024;
console.log(JSON.stringify({ method, n, p, medianMs: times[Math.floor(times.length / 2)], peakExtraMb, inputMb: inputBytes / 1048576, checksum }));
