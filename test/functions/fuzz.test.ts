/**
 * Property-based fuzzing of every PLUMB cell function through the any[][] interface Excel uses.
 * Whatever a worksheet hands over, a cell must show either a well-formed result (a rectangular
 * grid of finite numbers and text) or #VALUE!/#N/A with a message written for a person. A plain
 * exception, a NaN in a cell or a call that never returns would break the workbook instead.
 *
 * Replay a failure with the seed printed at the start of the run:
 *   PLUMB_FUZZ_SEED=<seed> npx vitest run test/functions/fuzz.test.ts
 */
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { MESSAGE_LIMIT } from '../../src/functions/cellError';
import * as plumb from '../../src/functions/functions';

/** Runs per function: 13 × 8,000 = 104,000 argument sets a run, the floor the CI budget was sized for. */
const RUNS_PER_FUNCTION = 8000;

/**
 * A fixed default seed keeps every run (and CI) reproducible; set PLUMB_FUZZ_SEED to explore other
 * cases. No call is timed here: speed is `npm run bench`'s job, and the slowest call is only printed.
 */
const DEFAULT_SEED = 20261203;

const seed = process.env.PLUMB_FUZZ_SEED !== undefined && process.env.PLUMB_FUZZ_SEED !== '' ? Number(process.env.PLUMB_FUZZ_SEED) : DEFAULT_SEED;
if (!Number.isInteger(seed)) throw new Error(`PLUMB_FUZZ_SEED must be an integer; got ${process.env.PLUMB_FUZZ_SEED}`);
console.log(`fuzz seed: PLUMB_FUZZ_SEED=${seed} (${RUNS_PER_FUNCTION} runs per function)`);

/**
 * The 100,000-character texts are built once (generating them per case would dominate the run)
 * and travel through the generators as a marker, so that a reported counterexample names them
 * instead of printing them; `materialize` swaps the real text in just before the call.
 */
class HugeText {
  constructor(readonly text: string) {}
  [fc.toStringMethod](): string {
    return `<text of ${this.text.length} characters starting "${this.text.slice(0, 8)}">`;
  }
}
const HUGE_TEXT = new HugeText('x'.repeat(100_000));
const HUGE_DIGITS = new HugeText(`${'1,'.repeat(49_999)}9x`);

function materialize(value: unknown): unknown {
  if (value instanceof HugeText) return value.text;
  if (Array.isArray(value)) return value.map(materialize);
  return value;
}

const EXTREME_NUMBERS = [
  0,
  -0,
  1,
  -1,
  1e308,
  -1e308,
  1e-308,
  -1e-308,
  Number.MAX_VALUE,
  -Number.MAX_VALUE,
  Number.MIN_VALUE,
  1e300,
  -1e300,
  1e-300,
  2 ** 53,
  45000,
];
const ERROR_CODES = ['#DIV/0!', '#N/A', '#VALUE!', '#REF!', '#NAME?', '#NUM!', '#NULL!', '#SPILL!', '#CALC!', '#GETTING_DATA', '#BUSY!'];

const blank = fc.constantFrom<unknown>('', null, '   ');
const cleanNumber = fc.oneof(fc.integer({ min: -50, max: 50 }), fc.double({ min: -100, max: 100, noNaN: true }));
const finiteNumber = fc.oneof(
  { weight: 3, arbitrary: cleanNumber },
  { weight: 2, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }) },
  { weight: 1, arbitrary: fc.integer() },
  { weight: 2, arbitrary: fc.constantFrom(...EXTREME_NUMBERS) },
);
const text = fc.oneof(
  { weight: 4, arbitrary: fc.constantFrom('1,234', '=SUM(A1)', '#N/A', '#DIV/0!', 'abc', 'a', 'b', 'TRUE', '0.5', '1e5', '-', '−3', 'NaN', 'Infinity') },
  { weight: 3, arbitrary: fc.string({ maxLength: 6 }) },
  { weight: 1, arbitrary: fc.constantFrom<unknown>(HUGE_TEXT, HUGE_DIGITS) },
);
const errorObject = fc.oneof(
  { weight: 8, arbitrary: fc.constantFrom(...ERROR_CODES).map((code): unknown => ({ code })) },
  { weight: 1, arbitrary: fc.constantFrom<unknown>({}, { code: 42 }, { code: '' }, [], Symbol('cell')) },
);
const nonFinite = fc.constantFrom<unknown>(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY);

const anyCell: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 6, arbitrary: finiteNumber },
  { weight: 3, arbitrary: text },
  { weight: 2, arbitrary: fc.boolean() },
  { weight: 2, arbitrary: blank },
  { weight: 2, arbitrary: errorObject },
  { weight: 1, arbitrary: nonFinite },
);

/**
 * Most columns are kept plausible so that a good share of cases get past validation and exercise
 * the fit, the inference and the grids, not only the input checks.
 */
type ColumnKind = 'clean' | 'wild' | 'category' | 'any';
const columnKind = fc.oneof(
  { weight: 6, arbitrary: fc.constant<ColumnKind>('clean') },
  { weight: 2, arbitrary: fc.constant<ColumnKind>('wild') },
  { weight: 1, arbitrary: fc.constant<ColumnKind>('category') },
  { weight: 1, arbitrary: fc.constant<ColumnKind>('any') },
);
function cellOf(kind: ColumnKind): fc.Arbitrary<unknown> {
  switch (kind) {
    case 'clean':
      return fc.oneof({ weight: 25, arbitrary: cleanNumber }, { weight: 1, arbitrary: blank });
    case 'wild':
      return fc.oneof({ weight: 12, arbitrary: finiteNumber }, { weight: 1, arbitrary: anyCell });
    case 'category':
      return fc.oneof({ weight: 12, arbitrary: fc.constantFrom<unknown>('a', 'b', 'c') }, { weight: 1, arbitrary: anyCell });
    case 'any':
      return anyCell;
  }
}

function columnArb(kind: ColumnKind, rows: number): fc.Arbitrary<unknown[]> {
  return fc.array(cellOf(kind), { minLength: rows, maxLength: rows });
}

function gridArb(kinds: readonly ColumnKind[], rows: number): fc.Arbitrary<unknown[][]> {
  return fc.tuple(...kinds.map((k) => columnArb(k, rows))).map((cols) => Array.from({ length: rows }, (_, i) => cols.map((c) => c[i])));
}

/** Shapes a worksheet selection can take by mistake, applied to one range of a case. */
type Mangle =
  | { kind: 'none' }
  | { kind: 'empty' }
  | { kind: 'emptyRow' }
  | { kind: 'dropRows'; count: number }
  | { kind: 'addRow' }
  | { kind: 'ragged'; row: number; delta: number }
  | { kind: 'transpose' };
const mangle: fc.Arbitrary<Mangle> = fc.oneof(
  { weight: 40, arbitrary: fc.constant<Mangle>({ kind: 'none' }) },
  { weight: 1, arbitrary: fc.constant<Mangle>({ kind: 'empty' }) },
  { weight: 1, arbitrary: fc.constant<Mangle>({ kind: 'emptyRow' }) },
  { weight: 1, arbitrary: fc.integer({ min: 1, max: 3 }).map((count): Mangle => ({ kind: 'dropRows', count })) },
  { weight: 1, arbitrary: fc.constant<Mangle>({ kind: 'addRow' }) },
  { weight: 1, arbitrary: fc.record({ row: fc.nat(), delta: fc.constantFrom(-1, 1, 2) }).map((r): Mangle => ({ kind: 'ragged', ...r })) },
  { weight: 1, arbitrary: fc.constant<Mangle>({ kind: 'transpose' }) },
);

function applyMangle(grid: unknown[][], m: Mangle): unknown[][] {
  switch (m.kind) {
    case 'none':
      return grid;
    case 'empty':
      return [];
    case 'emptyRow':
      return [[]];
    case 'dropRows':
      return grid.slice(0, Math.max(0, grid.length - m.count));
    case 'addRow':
      return [...grid, grid[0] === undefined ? [1] : grid[0].map(() => 1)];
    case 'ragged': {
      if (grid.length === 0) return grid;
      const r = m.row % grid.length;
      return grid.map((row, i) => (i !== r ? row : m.delta < 0 ? row.slice(0, row.length - 1) : [...row, ...Array.from({ length: m.delta }, () => 2)]));
    }
    case 'transpose':
      return grid[0] === undefined ? grid : grid[0].map((_, j) => grid.map((row) => row[j]));
  }
}

/** A setting as Excel may pass it: omitted (null), a scalar, or a one-cell range. */
function settingArb(typical: fc.Arbitrary<unknown>): fc.Arbitrary<unknown> {
  return fc.oneof(
    { weight: 24, arbitrary: fc.constant(null) },
    { weight: 6, arbitrary: typical },
    { weight: 1, arbitrary: anyCell },
    { weight: 1, arbitrary: fc.constantFrom<unknown>(undefined, [], [[]], [[0.9]], [[true]], [['HC1']]) },
  );
}

interface Settings {
  level: unknown;
  intercept: unknown;
  knownSigma: unknown;
  weights: unknown;
  robust: unknown;
}

interface FuzzCase {
  y: unknown[][];
  x: unknown[][];
  /** Predictors for a second block (added) with the same rows. */
  added: unknown[][];
  newX: unknown[][];
  candidates: unknown[][];
  settings: Settings;
}

const fuzzCase: fc.Arbitrary<FuzzCase> = fc
  .record({
    rows: fc.oneof({ weight: 6, arbitrary: fc.integer({ min: 0, max: 8 }) }, { weight: 1, arbitrary: fc.integer({ min: 9, max: 30 }) }),
    yKind: columnKind,
    xKinds: fc.array(columnKind, { minLength: 0, maxLength: 4 }),
    addedKinds: fc.array(columnKind, { minLength: 0, maxLength: 2 }),
    header: fc.oneof({ weight: 4, arbitrary: fc.constant(false) }, { weight: 1, arbitrary: fc.constant(true) }),
    weighted: fc.oneof({ weight: 4, arbitrary: fc.constant(false) }, { weight: 1, arbitrary: fc.constant(true) }),
  })
  .chain((shape) => {
    const headerRow = (width: number, prefix: string): fc.Arbitrary<unknown[]> =>
      fc.oneof(
        { weight: 8, arbitrary: fc.constant(Array.from({ length: width }, (_, j) => `${prefix}${j + 1}`)) },
        { weight: 1, arbitrary: fc.array(anyCell, { minLength: width, maxLength: width }) },
      );
    const withHeader = (grid: fc.Arbitrary<unknown[][]>, width: number, prefix: string): fc.Arbitrary<unknown[][]> =>
      shape.header ? fc.tuple(headerRow(width, prefix), grid).map(([h, g]) => [h, ...g]) : grid;
    const width = shape.xKinds.length;
    const newWidth = fc.oneof({ weight: 8, arbitrary: fc.constant(width) }, { weight: 1, arbitrary: fc.integer({ min: 0, max: 5 }) });
    const candidateCell = fc.oneof({ weight: 12, arbitrary: fc.constantFrom<unknown>(0, 1, true, false) }, { weight: 1, arbitrary: anyCell });
    const positiveWeight = fc.oneof({ weight: 12, arbitrary: fc.double({ min: 1e-3, max: 10, noNaN: true }) }, { weight: 1, arbitrary: anyCell });
    return fc.record({
      y: withHeader(gridArb([shape.yKind], shape.rows), 1, 'y'),
      x: withHeader(gridArb(shape.xKinds, shape.rows), width, 'x'),
      added: withHeader(gridArb(shape.addedKinds, shape.rows), shape.addedKinds.length, 'z'),
      newX: fc.tuple(newWidth, fc.integer({ min: 0, max: 3 })).chain(([w, r]) =>
        gridArb(
          Array.from({ length: w }, (_, j) => shape.xKinds[j] ?? 'clean'),
          r,
        ),
      ),
      candidates: fc
        .integer({ min: 0, max: 3 })
        .chain((r) => fc.array(fc.array(candidateCell, { minLength: width, maxLength: width }), { minLength: r, maxLength: r })),
      mangles: fc.tuple(mangle, mangle, mangle, mangle, mangle, mangle),
      settings: fc.record({
        level: settingArb(
          fc.oneof(
            { weight: 4, arbitrary: fc.constantFrom<unknown>(0.95, 0.9, 0.5, 0.999999, 1e-12, 0) },
            fc.constantFrom<unknown>(1, 95, -0.5, '95%', true),
            fc.double(),
          ),
        ),
        intercept: settingArb(fc.constantFrom<unknown>(true, false, false, 1, 0, 'yes')),
        knownSigma: settingArb(
          fc.oneof(fc.constantFrom<unknown>(1, 0.5, 0, -1, 1e308, 1e-308, 5e-324, Number.NaN, Number.POSITIVE_INFINITY, 'one'), {
            weight: 3,
            arbitrary: fc.double({ min: 1e-3, max: 100, noNaN: true }),
          }),
        ),
        weights: shape.weighted
          ? withHeader(
              fc.array(
                positiveWeight.map((w) => [w]),
                { minLength: shape.rows, maxLength: shape.rows },
              ),
              1,
              'w',
            )
          : fc.constantFrom<unknown>(null, null, null, undefined, [], [[]]),
        robust: settingArb(fc.constantFrom<unknown>(true, false, 1, 0, 'HC0', 'hc1', ' HC3 ', 'classical', 'HC0', 'HC4')),
      }),
    });
  })
  .map(({ y, x, added, newX, candidates, mangles, settings }) => ({
    y: applyMangle(y, mangles[0]),
    x: applyMangle(x, mangles[1]),
    added: applyMangle(added, mangles[2]),
    newX: applyMangle(newX, mangles[3]),
    candidates: applyMangle(candidates, mangles[4]),
    settings: {
      ...settings,
      weights: Array.isArray(settings.weights) && settings.weights.length > 0 ? applyMangle(settings.weights as unknown[][], mangles[5]) : settings.weights,
    },
  }));

type CellFunction = (c: FuzzCase) => unknown;
// Excel passes an omitted weights argument as null, which the declared any[][] | undefined does not admit.
const s = (c: FuzzCase): [unknown, unknown, unknown, unknown[][] | undefined, unknown] => [
  c.settings.level,
  c.settings.intercept,
  c.settings.knownSigma,
  c.settings.weights as unknown[][] | undefined,
  c.settings.robust,
];

const FUNCTIONS: [string, CellFunction][] = [
  ['TERMS', (c) => plumb.terms(c.y, c.x, ...s(c))],
  ['ESTIMATES', (c) => plumb.estimates(c.y, c.x, ...s(c))],
  ['STDERRORS', (c) => plumb.stdErrors(c.y, c.x, ...s(c))],
  ['INTERVALS', (c) => plumb.intervals(c.y, c.x, ...s(c))],
  ['COVARIANCE', (c) => plumb.covariance(c.y, c.x, ...s(c))],
  ['FITSTATS', (c) => plumb.fitStats(c.y, c.x, ...s(c))],
  ['NESTEDF', (c) => plumb.nestedF(c.y, c.x, c.added, ...s(c))],
  ['PREDICT', (c) => plumb.predict(c.y, c.x, c.newX, ...s(c))],
  ['RESIDUALS', (c) => plumb.residuals(c.y, c.x, ...s(c))],
  ['CHECKS', (c) => plumb.checks(c.y, c.x, ...s(c))],
  ['COLLINEARITY', (c) => plumb.collinearity(c.x, ...s(c))],
  ['QQPOINTS', (c) => plumb.qqPoints(c.y, c.x, ...s(c))],
  ['COMPARE', (c) => plumb.compare(c.y, c.x, c.candidates, ...s(c))],
];

/** The text guarded() gives an exception nobody meant to throw: for the fuzzer, a bug. */
const UNEXPECTED = 'Plumbline could not compute this result';
/** Excel holds at most this many characters in a cell; a longer text cannot be shown as returned. */
const CELL_TEXT_LIMIT = 32_767;

/** Why an outcome is not acceptable in a cell, or undefined when it is. */
function problemWith(outcome: { returned: unknown } | { thrown: unknown }): string | undefined {
  if ('thrown' in outcome) {
    const e = outcome.thrown;
    if (typeof e !== 'object' || e === null) return `threw a non-object: ${String(e)}`;
    const { code, message } = e as { code?: unknown; message?: unknown };
    if (code !== '#VALUE!' && code !== '#N/A') return `threw ${e instanceof Error ? e.name : 'an object'} with code ${String(code)}: ${String(message)}`;
    if (typeof message !== 'string' || message.trim() === '') return `threw ${String(code)} without a message`;
    if (message.startsWith(UNEXPECTED)) return `an unguarded exception reached the cell: ${message}`;
    // A message quotes the offending input; it must stay readable in a cell's error tip.
    if (message.length > MESSAGE_LIMIT) return `message of ${message.length} characters: ${message.slice(0, 120)}…`;
    if (message.includes('[object ') || message.includes('undefined')) return `message shows an internal value: ${message}`;
    return undefined;
  }
  const grid = outcome.returned;
  if (!Array.isArray(grid) || grid.length === 0) return `returned ${JSON.stringify(grid)} instead of a non-empty grid`;
  const width = Array.isArray(grid[0]) ? grid[0].length : -1;
  if (width < 1) return 'returned a grid whose first row is not a non-empty array';
  for (let i = 0; i < grid.length; i++) {
    const row: unknown = grid[i];
    if (!Array.isArray(row) || row.length !== width) return `row ${i + 1} is not an array of ${width} cells`;
    for (let j = 0; j < width; j++) {
      const cell: unknown = row[j];
      const ok = (typeof cell === 'string' && cell.length <= CELL_TEXT_LIMIT) || (typeof cell === 'number' && Number.isFinite(cell));
      if (!ok)
        return `cell (${i + 1}, ${j + 1}) is ${String(cell).slice(0, 80)} (${typeof cell}${typeof cell === 'string' ? ` of ${cell.length} characters` : ''})`;
    }
  }
  return undefined;
}

const counts = new Map<string, { cases: number; grids: number; errors: number; slowestMs: number }>();

describe(`fuzz: every PLUMB function returns a clean grid or a clear #VALUE! (seed ${seed})`, () => {
  afterAll(() => {
    const total = [...counts.values()].reduce((sum, c) => sum + c.cases, 0);
    const lines = [...counts].map(
      ([name, c]) => `  ${name.padEnd(13)} ${c.cases} cases (${c.grids} grids, ${c.errors} errors), slowest call ${c.slowestMs.toFixed(1)} ms`,
    );
    console.log(`fuzz seed ${seed}: ${total} cases\n${lines.join('\n')}`);
  });

  it.each(FUNCTIONS.map(([name, call], i) => ({ name, call, functionSeed: seed + i })))(
    'PLUMB.$name (fast-check seed $functionSeed)',
    ({ name, call, functionSeed }) => {
      const tally = { cases: 0, grids: 0, errors: 0, slowestMs: 0 };
      counts.set(name, tally);
      fc.assert(
        fc.property(fuzzCase, (c) => {
          tally.cases++;
          const real: FuzzCase = {
            y: materialize(c.y) as unknown[][],
            x: materialize(c.x) as unknown[][],
            added: materialize(c.added) as unknown[][],
            newX: materialize(c.newX) as unknown[][],
            candidates: materialize(c.candidates) as unknown[][],
            settings: {
              level: materialize(c.settings.level),
              intercept: materialize(c.settings.intercept),
              knownSigma: materialize(c.settings.knownSigma),
              weights: materialize(c.settings.weights),
              robust: materialize(c.settings.robust),
            },
          };
          const start = performance.now();
          let outcome: { returned: unknown } | { thrown: unknown };
          try {
            outcome = { returned: call(real) };
          } catch (thrown) {
            outcome = { thrown };
          }
          const ms = performance.now() - start;
          tally.slowestMs = Math.max(tally.slowestMs, ms);
          const problem = problemWith(outcome);
          if (problem !== undefined) throw new Error(`PLUMB.${name}: ${problem}; PLUMB_FUZZ_SEED=${seed}`);
          if ('returned' in outcome) tally.grids++;
          else tally.errors++;
        }),
        { seed: functionSeed, numRuns: RUNS_PER_FUNCTION },
      );
      // Shrinking replays cases, so at least the requested runs were made when the property held.
      expect(tally.cases).toBe(RUNS_PER_FUNCTION);
      // A fuzzer that never gets past input validation would test nothing but the messages.
      expect(tally.grids).toBeGreaterThan(RUNS_PER_FUNCTION / 50);
    },
  );
});
