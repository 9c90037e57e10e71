import { predictorValues } from './cache/packedPredictors';
import { EngineError } from './errors';
import { frobeniusCondition, type LeastSquaresSolution, needsExtendedPrecision } from './fit/leastSquares';
import { type SolvedModel, solveModel } from './fitModel';
import { fCriticalValue, fUpperTail } from './infer/referenceDistribution';
import { resolveSettings } from './settings';
import type { FitSettings, ModelData, NestedComparison, NestedData, ResolvedSettings } from './types';

/** Why the nested test is not formed when the added columns add no rank; the pane's streamed test throws it too. */
export const NOTHING_ADDED_MESSAGE = 'The added columns are combinations of the base columns, so they cannot change the fit: there is nothing to test.';

/**
 * The extra-sum-of-squares F test of the full model (base plus added columns) against the base
 * model. Nesting holds by construction, and the denominator is the full model's noise estimate
 * (σ² itself when σ is known, making the reference χ²/df).
 */
export function compareNested(data: NestedData, settings?: FitSettings): NestedComparison {
  const resolved = resolveSettings(settings);
  if (data.base.length !== data.y.length || data.added.length !== data.y.length) {
    throw new EngineError(
      'shape',
      `y has ${data.y.length} rows, the base columns ${data.base.length} and the added columns ${data.added.length}; they must match.`,
    );
  }
  const full: ModelData = { y: data.y, x: data.base.map((row, i) => [...row, ...data.added[i]]), weights: data.weights };
  const baseColumns = data.base[0]?.length ?? 0;
  // Rows of unequal width are refused by the base model's own fit, in its words.
  const rectangular = data.base.every((row) => row.length === baseColumns);
  return nestedTest(full, baseColumns, resolved, rectangular, () => data.base);
}

/**
 * compareNested when the full model's data are at hand: the base model is their first
 * `baseColumns` predictor columns (the intercept too, when the settings keep it), so a full model
 * whose fit is cached is neither copied nor refitted.
 */
export function compareLeadingColumns(full: ModelData, baseColumns: number, settings?: FitSettings): NestedComparison {
  const resolved = resolveSettings(settings);
  const { p } = predictorValues(full);
  if (!(Number.isInteger(baseColumns) && baseColumns >= 0 && baseColumns <= p)) {
    throw new EngineError('shape', `The base model was given as the first ${baseColumns} of ${p} predictor columns.`);
  }
  return nestedTest(full, baseColumns, resolved, true, () => leadingRows(full, baseColumns));
}

function nestedTest(
  fullData: ModelData,
  baseColumns: number,
  resolved: ResolvedSettings,
  shortcutAllowed: boolean,
  baseRows: () => number[][],
): NestedComparison {
  const full = solveModel(fullData, resolved);
  const base = (shortcutAllowed ? baseFromFullFactor(full.solution, baseColumns) : undefined) ?? baseFromItsOwnFit(fullData, baseRows(), full, resolved);
  const dfNumerator = full.fit.rank - base.rank;
  if (dfNumerator <= 0) {
    throw new EngineError('nothing-added', NOTHING_ADDED_MESSAGE);
  }

  const known = resolved.knownSigma;
  const dfDenominator = known === undefined ? full.fit.residualDf : Number.POSITIVE_INFINITY;
  const scale = full.solution.yScale;
  const errorScale = known === undefined ? full.solution.scaledRss / dfDenominator : (known / scale) ** 2;
  const f = base.extraScaled / dfNumerator / errorScale;
  const fCritical = fCriticalValue(resolved.level, dfNumerator, dfDenominator);

  return {
    f,
    dfNumerator,
    dfDenominator,
    pValue: fUpperTail(f, dfNumerator, dfDenominator),
    fCritical,
    rssBase: base.rssScaled * scale * scale,
    rssFull: full.fit.rss,
    addedHelp: f > fCritical,
  };
}

/** What the test needs of the base model: its rank, its RSS and how much more that is than the full model's, over the full model's yScale². */
interface BaseModel {
  rank: number;
  rssScaled: number;
  extraScaled: number;
}

/**
 * The base model read off the full model's factorization. Householder QR takes the columns in
 * order and decides each column's aliasing from the columns before it alone, so the factor of the
 * leading columns is the leading part of the full factor, and with Qᵀy = (c₁, …, c_n):
 *   RSS_base = RSS_full + Σ c_a² over the accepted added columns a,
 * the extra sum of squares itself, summed without subtracting two residual sums.
 *
 * Only where the full fit stayed in double precision: then its Qᵀy is good to the fit's own target
 * (leastSquares.ts, needsExtendedPrecision), and the base model, whose condition estimate is no
 * larger (the leading blocks of R and R⁻¹ are parts of them) and whose residuals are no smaller,
 * would itself have been solved in double from the same Qᵀy. Otherwise undefined: refinement or
 * double-double then need the base model's own fit. An empty base (no intercept, no columns) has
 * no fit and is refused by that fit too.
 */
function baseFromFullFactor(solution: LeastSquaresSolution, baseColumns: number): BaseModel | undefined {
  const { qr, design, acceptedQty: qty } = solution;
  const leading = baseColumns + (design.hasIntercept ? 1 : 0);
  const rank = qr.accepted.length;
  if (leading === 0) return undefined;
  if (needsExtendedPrecision(frobeniusCondition(qr.r, solution.rInverse, rank), Math.sqrt(solution.scaledRss))) return undefined;
  let baseRank = 0;
  let extraScaled = 0;
  qr.accepted.forEach((col, a) => {
    if (col < leading) baseRank++;
    else extraScaled += qty[a] * qty[a];
  });
  return { rank: baseRank, rssScaled: solution.scaledRss + extraScaled, extraScaled };
}

function baseFromItsOwnFit(fullData: ModelData, rows: number[][], full: SolvedModel, resolved: ResolvedSettings): BaseModel {
  const base = solveModel({ y: fullData.y, x: rows, weights: fullData.weights }, resolved);
  // Both RSS values are in the same units; taking the difference over one scale avoids overflow.
  const rssBaseScaled = base.solution.scaledRss * (base.solution.yScale / full.solution.yScale) ** 2;
  return { rank: base.fit.rank, rssScaled: rssBaseScaled, extraScaled: Math.max(0, rssBaseScaled - full.solution.scaledRss) };
}

/** The first `columns` predictors of each row, read from the packed numbers. */
function leadingRows(data: ModelData, columns: number): number[][] {
  const { values, rows, p } = predictorValues(data);
  return Array.from({ length: rows }, (_, i) => Array.from(values.subarray(i * p, i * p + columns)));
}
