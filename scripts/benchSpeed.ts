// What precision and size cost (issue #15), measured side by side in one run:
//   (a) fitModel on R² = 0.9999 data against R² = 0.5 data of the same shape, 100,000 × 20;
//   (b) fitModel on 1,048,576 × 20 against R's lm.fit on the very same numbers, and the fit's peak
//       memory beyond its input against the input's size.
//   tsx scripts/benchSpeed.ts   (also the last table of `npm run bench`)
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, tmpdir, totalmem } from 'node:os';
import { join } from 'node:path';
import { fitModel, modelCache } from '../src/engine';
import { generateColumns, generateWithRSquared } from './benchData';

const PAIRS = 15;
const LARGE_ROWS = 1_048_576;
const PREDICTORS = 20;
const LARGE_REPEATS = 3;
const collectGarbage = (globalThis as { gc?: () => void }).gc ?? (() => undefined);

function rowsOf(x: Float64Array, n: number, p: number): number[][] {
  return Array.from({ length: n }, (_, i) => Array.from({ length: p }, (_, j) => x[j * n + i]));
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

function rVersion(): string | undefined {
  try {
    return execFileSync('Rscript', ['-e', 'cat(R.version$major, R.version$minor, sep = ".")'], { encoding: 'utf8' }).trim();
  } catch {
    return undefined;
  }
}

/** (a): interleaved pairs in this process, so drift on a shared machine hits both alike. */
function precisionCost(): { quiet: number; noisy: number } {
  const n = 100_000;
  const problems = [0.9999, 0.5].map((r2) => {
    const { x, y } = generateWithRSquared(n, PREDICTORS, r2);
    return { x: rowsOf(x, n, PREDICTORS), y: Array.from(y) };
  });
  const time = (k: number) => {
    modelCache.reset();
    collectGarbage();
    const start = performance.now();
    fitModel(problems[k]);
    return performance.now() - start;
  };
  time(0);
  time(1);
  const quiet: number[] = [];
  const noisy: number[] = [];
  for (let r = 0; r < PAIRS; r++) {
    if (r % 2 === 0) {
      quiet.push(time(0));
      noisy.push(time(1));
    } else {
      noisy.push(time(1));
      quiet.push(time(0));
    }
  }
  return { quiet: median(quiet), noisy: median(noisy) };
}

interface EngineCase {
  medianMs: number;
  peakExtraMb: number;
  inputMb: number;
  checksum: number;
}

/** (b), the engine's side: benchCase.ts in its own process, so that the peak memory is this fit's own. */
function largeEngineCase(): EngineCase {
  const output = execFileSync(
    process.execPath,
    [
      '--expose-gc',
      '--max-old-space-size=16384',
      '--import',
      'tsx',
      join(__dirname, 'benchCase.ts'),
      'engine',
      String(LARGE_ROWS),
      String(PREDICTORS),
      String(LARGE_REPEATS),
    ],
    { encoding: 'utf8', maxBuffer: 1 << 20 },
  );
  return JSON.parse(output.trim().split('\n').pop() ?? '{}') as EngineCase;
}

/** (b), R's side: the same generated numbers written to a file that lm.fit's script reads with readBin. */
function largeRCase(): { medianMs: number; slope: number } {
  const { x, y } = generateColumns(LARGE_ROWS, PREDICTORS);
  const dir = mkdtempSync(join(tmpdir(), 'plumbline-bench-'));
  const file = join(dir, 'design.bin');
  try {
    const values = new Float64Array(LARGE_ROWS * (PREDICTORS + 1));
    values.set(y, 0);
    values.set(x, LARGE_ROWS);
    writeFileSync(file, new Uint8Array(values.buffer));
    const output = execFileSync('Rscript', [join(__dirname, 'bench', 'lmFitTime.R'), file, String(LARGE_ROWS), String(PREDICTORS), String(LARGE_REPEATS)], {
      encoding: 'utf8',
    });
    const [seconds, slope] = output.trim().split(/\s+/).map(Number);
    return { medianMs: seconds * 1000, slope };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

function main(): void {
  const r = rVersion();
  const cpu = cpus()[0]?.model ?? 'unknown CPU';
  console.log(
    `Machine: ${cpus().length} cores (${cpu}), ${(totalmem() / 2 ** 30).toFixed(0)} GiB, Node ${process.version}, ${r === undefined ? 'R absent' : `R ${r}`}`,
  );
  console.log(`${'measure'.padEnd(58)}${'value'.padStart(12)}${'target'.padStart(10)}`);
  const line = (label: string, value: string, target: string) => console.log(`${label.padEnd(58)}${value.padStart(12)}${target.padStart(10)}`);

  const cost = precisionCost();
  line('fitModel 100,000 × 20, R² = 0.9999 (ms, median)', cost.quiet.toFixed(0), '');
  line('fitModel 100,000 × 20, R² = 0.5 (ms, median)', cost.noisy.toFixed(0), '');
  line('(a) ratio R² = 0.9999 / R² = 0.5', (cost.quiet / cost.noisy).toFixed(2), '≤ 1.3');

  const engine = largeEngineCase();
  line(`fitModel ${LARGE_ROWS.toLocaleString('en-US')} × ${PREDICTORS} (ms, median of ${LARGE_REPEATS})`, engine.medianMs.toFixed(0), '');
  if (r === undefined) {
    line("R's lm.fit: Rscript is absent, so ratio (b) is not measured", '—', '≤ 1.5');
  } else {
    const lm = largeRCase();
    line(`R lm.fit, same numbers (ms, median of ${LARGE_REPEATS})`, lm.medianMs.toFixed(0), '');
    line('(b) ratio fitModel / lm.fit', (engine.medianMs / lm.medianMs).toFixed(2), '≤ 1.5');
  }
  line('input: y and x as doubles (MB)', engine.inputMb.toFixed(0), '');
  line('fitModel peak memory beyond the input (MB)', engine.peakExtraMb.toFixed(0), '');
  line('(b) ratio peak memory beyond input / input', (engine.peakExtraMb / engine.inputMb).toFixed(2), '≤ 1.0');
}

main();
