import { ModelCache } from './cache/modelCache';
import { type PackedPredictors, packedPredictorsOf } from './cache/packedPredictors';
import { EngineError } from './errors';
import { buildDesign } from './fit/design';
import { type LeastSquaresSolution, solveLeastSquares } from './fit/leastSquares';
import { covarianceMatrix, standardErrors } from './infer/covariance';
import { fitSummary, rowTotalsOf, type RowTotals } from './infer/fitSummary';
import { robustCovariance } from './infer/robustCovariance';
import { type CoefficientReference, coefficientReference } from './infer/referenceDistribution';
import { termTable } from './infer/termTable';
import { resolveSettings } from './settings';
import type { FitSettings, ModelData, ModelFit, ResolvedSettings } from './types';

/** A fit together with the factorization behind it, for operations that build on it. */
export interface SolvedModel {
  fit: ModelFit;
  solution: LeastSquaresSolution;
  /** σ used for classical inference (predictions, tests): the known σ, or σ̂. */
  inferenceSigma: number;
  /** The classical reference (z when σ is known), which predictions use whatever the covariance setting. */
  reference: CoefficientReference;
}

export function fitModel(data: ModelData, settings?: FitSettings): ModelFit {
  return solveModel(data, settings).fit;
}

/** Bounds chosen so a workbook's worth of ordinary models stays cached within a modest budget. */
export const modelCache = new ModelCache<SolvedModel>(64, 256 * 1024 * 1024);

/** The fit of `data`, computed once per distinct content and settings (see ModelCache). */
export function solveModel(data: ModelData, settings?: FitSettings): SolvedModel {
  const resolved = resolveSettings(settings);
  const solved = modelCache.getOrCompute(data, resolved, (rowsPacking) => solveUncached(data, resolved, rowsPacking), approximateBytes);
  return withNames(solved, data.names);
}

/**
 * The cache is keyed on numbers alone, so formulas that label the same columns differently
 * (or not at all) still share one fit; names are applied on the way out.
 */
function withNames(solved: SolvedModel, names: readonly string[] | undefined): SolvedModel {
  const offset = solved.solution.design.hasIntercept ? 1 : 0;
  const same = solved.fit.terms.every((t, j) => j < offset || t.name === (names?.[j - offset] ?? `x${j - offset + 1}`));
  if (same) return solved;
  const terms = solved.fit.terms.map((t, j) => (j < offset ? t : { ...t, name: names?.[j - offset] ?? `x${j - offset + 1}` }));
  return { ...solved, fit: { ...solved.fit, terms } };
}

/** Largest parameter list a message spells out; beyond it the parameters are counted. */
const LISTED_PARAMETERS = 6;

/**
 * No residual df means rows ≤ rank ≤ the model's parameters, so every parameter is counted, the
 * aliased ones too: the rows are short of the model as specified, which is what the user can change.
 */
function tooFewRows(n: number, parameterNames: readonly string[]): string {
  const q = parameterNames.length;
  const listed = q <= LISTED_PARAMETERS ? ` (${parameterNames.join(', ')})` : '';
  return (
    `${n === 1 ? '1 row' : `${n} rows`} cannot fit the model's ${q === 1 ? '1 parameter' : `${q} parameters`}${listed} ` +
    `with any left over to measure the noise: the model needs more rows than parameters. Give at least ${q + 1} rows, or fewer predictors.`
  );
}

function approximateBytes(model: SolvedModel): number {
  const n = model.fit.n;
  const q = model.fit.parameters;
  // Reflectors (rank × n), fitted and residuals twice over (typed and plain arrays), covariance.
  return 8 * (model.fit.rank * n + 4 * n + 2 * q * q) + 1024;
}

function solveUncached(data: ModelData, resolved: ResolvedSettings, rowsPacking: PackedPredictors | undefined): SolvedModel {
  // The model frame's packed predictors, when it registered them, spare building its rows; the
  // cache key's packing of plain rows spares reading them a second time.
  const packed = packedPredictorsOf(data) ?? rowsPacking;
  const predictors = packed !== undefined && packed.rows === data.y.length ? packed : data.x;
  const design = buildDesign(data.y, predictors, resolved.intercept, data.names, data.weights);
  if (design.matrix.cols === 0) throw new EngineError('shape', 'The model has no terms: give at least one predictor or keep the intercept.');
  const solution = solveLeastSquares(design);
  return assembleFit(solution, resolved, rowTotalsOf(solution), plainArray(solution.fitted), plainArray(solution.residuals));
}

/** A typed array's numbers as a plain array: a counted loop into a sized array is about twice Array.from's speed. */
function plainArray(values: Float64Array): number[] {
  const copy = new Array<number>(values.length);
  for (let i = 0; i < values.length; i++) copy[i] = values[i];
  return copy;
}

/**
 * Inference from a factorization and the rows' totals: shared by the in-memory fit and the
 * streamed one, whose factorization stands in for rows it no longer holds.
 */
export function assembleFit(solution: LeastSquaresSolution, resolved: ResolvedSettings, totals: RowTotals, fitted: number[], residuals: number[]): SolvedModel {
  const { design } = solution;
  const n = totals.n;
  const q = design.matrix.cols;
  const rank = solution.qr.accepted.length;
  const residualDf = n - rank;
  if (residualDf <= 0) throw new EngineError('no-residual-df', tooFewRows(n, design.names));

  const sigmaHat = solution.yScale * Math.sqrt(solution.scaledRss / residualDf);
  const inferenceSigma = resolved.knownSigma ?? sigmaHat;
  const reference = coefficientReference(residualDf, resolved.knownSigma !== undefined);
  // A robust covariance is estimated from the residuals, not from σ, so its statistics are t on
  // the residual df (the usual practice) even when σ is known.
  const robust = resolved.covariance === 'classical' ? undefined : robustCovariance(solution, resolved.covariance);
  const termReference = robust === undefined ? reference : coefficientReference(residualDf, false);
  const errors = robust?.standardErrors ?? standardErrors(solution, inferenceSigma);
  const summary = fitSummary(solution, resolved.knownSigma, totals);

  const fit: ModelFit = {
    terms: termTable(design.names, solution.coefficients, errors, termReference, resolved.level, robust?.leverageOne),
    n,
    parameters: q,
    rank,
    residualDf,
    sigma: sigmaHat,
    ...summary,
    covariance: robust?.covariance ?? covarianceMatrix(solution, inferenceSigma),
    covarianceKind: resolved.covariance,
    fitted,
    residuals,
    statisticKind: termReference.kind,
    settings: resolved,
    perfectFit: solution.perfectFit,
  };
  return { fit, solution, inferenceSigma, reference };
}
