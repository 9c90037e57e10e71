// "Live report (issue #15)": the eight PLUMB formulas of a report at the live size, called as Excel
// calls them (fresh any[][] grids with a header row, an invocation with each argument's address),
// against R's full analysis of the same numbers, plus a cached formula's cost and the diagnostics'
// cold cost against a plain fit. The last table of `npm run bench`; alone:
//   node --expose-gc --import tsx scripts/bench/liveReport.ts
import { execFileSync } from 'node:child_process';
import { cpus, totalmem } from 'node:os';
import { fitModel, modelCache, resetCaches } from '../../src/engine';
import { checks, collinearity, fitStats, nestedF, predict, qqPoints, residuals, terms } from '../../src/functions/functions';
import { readModel } from '../../src/functions/modelRequest';
import { R_STEPS, type RAnalysis, rAnalysis } from './liveReportR';
import { invocationOf, LIVE_SHAPES, LiveSheet } from './liveSheet';

/**
 * Data edits timed per shape, after untimed warm-up edits: a live report recalculates on every
 * edit, so what a user meets is the steady state once the JIT has compiled the pipeline. The
 * first edit after loading is printed beside it.
 */
const WARM_UP_EDITS = 5;
const EDITS = 9;
const CACHED_CALLS = 9;
const COLD_ROUNDS = 5;
const R_REPEATS = 5;
const collectGarbage = (globalThis as { gc?: () => void }).gc ?? (() => undefined);

/** A formula: `prepare` builds its fresh grids (untimed, Excel's marshalling) and returns the timed call. */
interface Formula {
  name: string;
  prepare: () => () => unknown;
}

function reportOf(sheet: LiveSheet): Formula[] {
  const p = sheet.shape.predictors;
  const b = sheet.baseColumns;
  const y = sheet.responseAddress();
  const x = sheet.predictorsAddress();
  const u = undefined;
  const plain = (name: string, fn: typeof terms): Formula => ({
    name,
    prepare: () => {
      const [response, predictors, at] = [sheet.response(), sheet.predictors(), invocationOf([y, x])];
      return () => fn(response, predictors, u, u, u, u, u, at);
    },
  });
  return [
    plain('TERMS', terms),
    plain('FITSTATS', fitStats),
    {
      name: 'NESTEDF',
      prepare: () => {
        const [response, base, added] = [sheet.response(), sheet.predictors(0, b), sheet.predictors(b, p)];
        const at = invocationOf([y, sheet.predictorsAddress(0, b), sheet.predictorsAddress(b, p)]);
        return () => nestedF(response, base, added, u, u, u, u, u, at);
      },
    },
    {
      name: 'PREDICT',
      prepare: () => {
        const [response, predictors, newRows] = [sheet.response(), sheet.predictors(), sheet.newRows()];
        const at = invocationOf([y, x, sheet.newRowsAddress()]);
        return () => predict(response, predictors, newRows, u, u, u, u, u, at);
      },
    },
    plain('CHECKS', checks),
    plain('RESIDUALS', residuals),
    plain('QQPOINTS', qqPoints),
    {
      name: 'COLLINEARITY',
      prepare: () => {
        const [predictors, at] = [sheet.predictors(), invocationOf([x])];
        return () => collinearity(predictors, u, u, u, u, u, at);
      },
    },
  ];
}

function timed(call: () => unknown): number {
  const start = performance.now();
  call();
  return performance.now() - start;
}

function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

interface ReportCost {
  /** The first edit after loading, before any warm-up. */
  firstMs: number;
  medianMs: number;
  formulaMs: number[];
  fitsPerEdit: number;
}

/** Target 1, the engine's side: the whole report after each of several edits of one cell. */
function reportCost(sheet: LiveSheet, report: Formula[]): ReportCost {
  const totals: number[] = [];
  const perFormula: number[][] = report.map(() => []);
  let fitsPerEdit = 0;
  let firstMs = NaN;
  for (let edit = 0; edit < WARM_UP_EDITS + EDITS; edit++) {
    const timedEdit = edit >= WARM_UP_EDITS;
    sheet.edit(edit);
    collectGarbage();
    const fitsBefore = modelCache.stats().fits;
    let total = 0;
    report.forEach((formula, k) => {
      const ms = timed(formula.prepare());
      total += ms;
      if (timedEdit) perFormula[k].push(ms);
    });
    fitsPerEdit = modelCache.stats().fits - fitsBefore;
    if (edit === 0) firstMs = total;
    if (timedEdit) totals.push(total);
  }
  return { firstMs, medianMs: median(totals), formulaMs: perFormula.map(median), fitsPerEdit };
}

/** Target 2: TERMS again over equal cells (fresh arrays, as Excel passes), its fit cached. */
function cachedCost(report: Formula[]): { medianMs: number; refits: number } {
  const termsFormula = report[0];
  timed(termsFormula.prepare());
  const fitsBefore = modelCache.stats().fits;
  const times = Array.from({ length: CACHED_CALLS }, () => timed(termsFormula.prepare()));
  return { medianMs: median(times), refits: modelCache.stats().fits - fitsBefore };
}

/** Target 5: each diagnostic formula cold (engine caches cleared) against fitModel cold on the same frame data, interleaved. */
function coldCosts(sheet: LiveSheet, report: Formula[]): Map<string, number> {
  const frame = readModel(sheet.response(), [{ range: sheet.predictors(), argument: 'predictors' }], {
    level: undefined,
    intercept: undefined,
    knownSigma: undefined,
    weights: null,
    robust: undefined,
  });
  const cases: Formula[] = [
    { name: 'fitModel', prepare: () => () => fitModel(frame.frame.data, frame.settings) },
    ...report.filter((f) => ['CHECKS', 'RESIDUALS', 'QQPOINTS'].includes(f.name)),
  ];
  const times = new Map<string, number[]>(cases.map((c) => [c.name, []]));
  for (let round = 0; round <= COLD_ROUNDS; round++) {
    for (const c of cases) {
      const call = c.prepare();
      // Every cache the engine keeps (fits, and what is kept beside them), so nothing of an earlier round is reused.
      resetCaches();
      collectGarbage();
      const ms = timed(call);
      if (round > 0) times.get(c.name)?.push(ms);
    }
  }
  return new Map([...times].map(([name, ms]) => [name, median(ms)]));
}

function rVersion(): string | undefined {
  try {
    return execFileSync('Rscript', ['-e', 'cat(R.version$major, R.version$minor, sep = ".")'], {
      encoding: 'utf8',
      stdio: ['ignore', 'pipe', 'ignore'],
    }).trim();
  } catch {
    return undefined;
  }
}

type Line = (label: string, value: string, target?: string) => void;

/** R's side of target 1; a missing R package or a failed run is said, and the rest of the table still prints. */
function printRSide(sheet: LiveSheet, engineMs: number, line: Line): void {
  let analysis: RAnalysis;
  try {
    analysis = rAnalysis(sheet, R_REPEATS);
  } catch (error) {
    line(`(1) R's full analysis failed (${String(error).split('\n')[0].slice(0, 60)})`, '—', '≤ 0.5');
    return;
  }
  line(`    R's full analysis, same numbers (ms, median of ${R_REPEATS})`, analysis.medianMs.toFixed(0));
  console.log(
    `      per step (ms): ${R_STEPS.map((s, k) => `${s} ${analysis.stepMs[k].toFixed(0)}`).join(', ')}; dwtest exact = ${analysis.dwExact ? 'TRUE' : 'FALSE (n > 300)'}`,
  );
  line('(1) ratio engine report / R analysis', (engineMs / analysis.medianMs).toFixed(2), '≤ 0.5');
}

function main(): void {
  const r = rVersion();
  const cpu = cpus()[0]?.model ?? 'unknown CPU';
  console.log(
    `Machine: ${cpus().length} cores (${cpu}), ${(totalmem() / 2 ** 30).toFixed(0)} GiB, Node ${process.version}, ${r === undefined ? 'R absent' : `R ${r}`}`,
  );
  if (r === undefined) console.log("Rscript is absent: R's side of target 1 is skipped.");
  const line: Line = (label, value, target = '') => console.log(`${label.padEnd(66)}${value.padStart(12)}${target.padStart(10)}`);
  line('measure', 'value', 'target');
  for (const shape of LIVE_SHAPES) {
    const sheet = new LiveSheet(shape);
    const report = reportOf(sheet);
    const size = `${shape.rows.toLocaleString('en-US')} × ${shape.predictors}`;
    console.log(`\n${size}`);

    const engine = reportCost(sheet, report);
    line('    report of 8 formulas, first edit of this shape in the run (ms)', engine.firstMs.toFixed(0));
    line(`(1) report of 8 formulas after one edit, engine (ms, median of ${EDITS})`, engine.medianMs.toFixed(0));
    console.log(
      `      per formula (ms): ${report.map((f, k) => `${f.name} ${engine.formulaMs[k].toFixed(0)}`).join(', ')}; fits per edit: ${engine.fitsPerEdit}`,
    );
    if (r === undefined) line("(1) R's full analysis: Rscript absent, not measured", '—', '≤ 0.5');
    else printRSide(sheet, engine.medianMs, line);

    const cached = cachedCost(report);
    line(`(2) TERMS again, fit cached (ms, median of ${CACHED_CALLS})`, cached.medianMs.toFixed(1), '≤ 5');
    if (cached.refits > 0) console.log(`      (the cache missed: ${cached.refits} refits)`);

    const cold = coldCosts(sheet, report);
    const fit = cold.get('fitModel') ?? NaN;
    line(`    fitModel on the frame data, cold (ms, median of ${COLD_ROUNDS})`, fit.toFixed(0));
    for (const name of ['CHECKS', 'RESIDUALS', 'QQPOINTS']) {
      const ms = cold.get(name) ?? NaN;
      line(`(5) ${name} cold, ${ms.toFixed(0)} ms: ratio to fitModel cold`, (ms / fit).toFixed(2), '≤ 2');
    }
  }
}

main();
