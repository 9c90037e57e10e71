// `npm run bench`: the engine against its peers, measured side by side in one run on this machine.
// Each case runs in its own process (scripts/benchCase.ts) so its peak memory is its own; times are
// medians of several repeats (one repeat for the peers at a million rows, which dominate the run time).
import { execFileSync } from 'node:child_process';
import { cpus, totalmem } from 'node:os';
import { join } from 'node:path';
import { modelCache } from '../src/engine';
import * as functions from '../src/functions/functions';
import { DEMO_RANGES, loadDemo } from '../src/preview/demo/demoWorkbook';
import { createWorkbook } from '../src/preview/workbook/workbook';

const SIZES = [10_000, 100_000, 1_048_576];
const PREDICTORS = [5, 20, 50];
const METHODS = ['streaming', 'engine', 'normal-equations', 'regression-package'] as const;

interface CaseResult {
  method: string;
  medianMs: number;
  peakExtraMb: number;
  inputMb: number;
  checksum: number;
}

function runCase(method: string, n: number, p: number): CaseResult {
  // The streaming fit, whose time every ratio divides by, always gets five repeats; its peers get
  // three, and one at a million rows, which keeps the whole run within minutes.
  const repeats = method === 'streaming' ? 5 : n >= 1_000_000 ? 1 : 3;
  const output = execFileSync(
    process.execPath,
    ['--expose-gc', '--max-old-space-size=16384', '--import', 'tsx', join(__dirname, 'benchCase.ts'), method, String(n), String(p), String(repeats)],
    {
      encoding: 'utf8',
      maxBuffer: 1 << 20,
    },
  );
  return JSON.parse(output.trim().split('\n').pop() ?? '{}') as CaseResult;
}

/** Fits performed when a report of 12 formulas over one model recalculates after one data edit. */
function fitsPerEdit(): number {
  const workbook = createWorkbook();
  for (const [name, fn] of Object.entries(functions)) workbook.registerFunction(name.toUpperCase(), fn as (...args: unknown[]) => unknown);
  loadDemo(workbook);
  const { y, x, base, added, newX } = DEMO_RANGES;
  const formulas = [
    `=PLUMB.TERMS(${y}, ${x})`,
    `=PLUMB.ESTIMATES(${y}, ${x})`,
    `=PLUMB.STDERRORS(${y}, ${x})`,
    `=PLUMB.INTERVALS(${y}, ${x})`,
    `=PLUMB.COVARIANCE(${y}, ${x})`,
    `=PLUMB.FITSTATS(${y}, ${x})`,
    `=PLUMB.PREDICT(${y}, ${x}, ${newX})`,
    `=PLUMB.RESIDUALS(${y}, ${x})`,
    `=PLUMB.QQPOINTS(${y}, ${x})`,
    `=PLUMB.NESTEDF(${y}, ${base}, ${added})`,
    `=PLUMB.TERMS(${y}, ${x}, 0.95)`,
    `=PLUMB.FITSTATS(${y}, ${x}, 0.95, TRUE)`,
  ];
  workbook.addSheet('Bench');
  formulas.forEach((f, i) => workbook.setInputs('Bench', i * 80, 0, [[f]]));
  modelCache.reset();
  workbook.setInputs('Batches', 1, 1, [[21.5]]);
  return modelCache.stats().fits;
}

function describeMachine(): string {
  const cpu = cpus()[0]?.model ?? 'unknown CPU';
  return `${cpus().length} cores (${cpu}), ${(totalmem() / 2 ** 30).toFixed(0)} GiB, Node ${process.version}`;
}

function main(): void {
  console.log(`Plumbline benchmark on ${describeMachine()}`);
  console.log('Fit with coefficients and standard errors; times are medians (ms); memory is peak growth over the input data (MB).\n');
  const header = ['n', 'p', 'streaming', 'in-memory', 'normal eq.', 'regr. pkg', 'pkg/stream', 'normal/stream', 'stream mem', 'input MB'];
  console.log(header.map((h) => h.padStart(14)).join(''));
  for (const n of SIZES) {
    for (const p of PREDICTORS) {
      const results = Object.fromEntries(METHODS.map((m) => [m, runCase(m, n, p)])) as Record<(typeof METHODS)[number], CaseResult>;
      const agree = Math.abs(results.streaming.checksum - results.engine.checksum) <= 1e-9 * Math.abs(results.engine.checksum);
      const row = [
        n,
        p,
        results.streaming.medianMs.toFixed(0),
        results.engine.medianMs.toFixed(0),
        results['normal-equations'].medianMs.toFixed(0),
        results['regression-package'].medianMs.toFixed(0),
        (results['regression-package'].medianMs / results.streaming.medianMs).toFixed(1),
        (results['normal-equations'].medianMs / results.streaming.medianMs).toFixed(1),
        results.streaming.peakExtraMb.toFixed(0),
        results.streaming.inputMb.toFixed(0),
      ];
      console.log(`${row.map((c) => String(c).padStart(14)).join('')}${agree ? '' : '   (streaming and in-memory disagree!)'}`);
    }
  }
  console.log(`\nFits when a report of 12 formulas recalculates after one data cell changes: ${fitsPerEdit()}`);
  console.log('\nExtended precision (factor-and-fit stage): with its check against double alone, interleaved medians');
  console.log(execFileSync(process.execPath, ['--expose-gc', '--import', 'tsx', join(__dirname, 'benchPrecision.ts')], { encoding: 'utf8' }).trimEnd());
  console.log("\nWhat precision and size cost (issue #15): R² = 0.9999 against R² = 0.5, and a million rows against R's lm.fit");
  console.log(execFileSync(process.execPath, ['--expose-gc', '--import', 'tsx', join(__dirname, 'benchSpeed.ts')], { encoding: 'utf8' }).trimEnd());
  console.log(
    "\nLive report (issue #15): eight PLUMB formulas at 250,000 numbers against R's full analysis, a cached formula, diagnostics against a plain fit",
  );
  console.log(execFileSync(process.execPath, ['--expose-gc', '--import', 'tsx', join(__dirname, 'bench', 'liveReport.ts')], { encoding: 'utf8' }).trimEnd());
}

main();
