/** Numbers in, row-major: n rows of y, and n rows × p columns of predictors (p may be 0). */
export interface ModelData {
  y: number[];
  x: number[][];
  /** Names of the p predictor columns; defaults to x1…xp. */
  names?: string[];
  /** Case weights for weighted least squares; each must be finite and positive. */
  weights?: number[];
}

/**
 * How the coefficients' covariance is estimated: classical σ²(XᵀWX)⁻¹, or a
 * heteroscedasticity-consistent sandwich (HC0: White 1980; HC1: HC0·n/(n − p); HC3: MacKinnon &
 * White 1985). See infer/robustCovariance.ts for weights, known σ and leverage-one rows.
 */
export type CovarianceKind = 'classical' | 'HC0' | 'HC1' | 'HC3';

export interface FitSettings {
  /** Fit an intercept (default true). */
  intercept?: boolean;
  /** Confidence level of every interval and of the nested test's critical value (default 0.95). */
  level?: number;
  /**
   * σ known from outside the data (for a unit-weight row). Inference then uses the normal
   * distribution and σ itself instead of σ̂.
   */
  knownSigma?: number;
  /**
   * Covariance of the estimates behind every term's SE, statistic, p-value and interval (default
   * 'classical'). A robust kind ignores a known σ for these; F, the nested F and predictions stay classical.
   */
  covariance?: CovarianceKind;
}

export interface ResolvedSettings {
  intercept: boolean;
  level: number;
  knownSigma: number | undefined;
  covariance: CovarianceKind;
}

export interface TermEstimate {
  name: string;
  estimate: number;
  standardError: number;
  /** t (or z when σ is known). */
  statistic: number;
  /** Two-sided p-value of estimate = 0. */
  pValue: number;
  ciLow: number;
  ciHigh: number;
  /** 100·SE/|estimate|: below 50 exactly when |estimate| > 2·SE. */
  cvPercent: number;
  /** The column is a linear combination of earlier ones, so this term cannot be estimated. */
  aliased: boolean;
  /**
   * Set when the standard error (and so the statistic, p and interval) is NaN for a reason other
   * than aliasing: 'leverage-one' means a row with leverage 1 determines this term, which HC3 cannot scale.
   */
  undefinedBecause?: 'leverage-one';
}

export interface ModelFit {
  terms: TermEstimate[];
  /** Rows used. */
  n: number;
  /** Parameters q, counting the intercept and aliased terms. */
  parameters: number;
  /** Parameters actually estimated (q minus aliased terms). */
  rank: number;
  residualDf: number;
  /** Residual sum of squares (weighted when weights are given). */
  rss: number;
  /** σ̂ = √(RSS/(n − rank)). */
  sigma: number;
  /** Centered with an intercept, uncentered without one. */
  rSquared: number;
  adjustedRSquared: number;
  /** F of all slopes zero (χ²/df form when σ is known). */
  fStatistic: number;
  fPValue: number;
  /** Degrees of freedom of the F test: [model, residual]; residual is Infinity when σ is known. */
  fDf: [number, number];
  /** q×q covariance of the estimates, rows in term order; NaN rows and columns for aliased terms. */
  covariance: number[][];
  /** Which covariance `covariance` and the terms' SEs are. */
  covarianceKind: CovarianceKind;
  logLikelihood: number;
  aic: number;
  bic: number;
  fitted: number[];
  /** y − fitted, unweighted. */
  residuals: number[];
  /** Which distribution the terms' statistics refer to (always t with a robust covariance). */
  statisticKind: 't' | 'z';
  settings: ResolvedSettings;
  /** True when the residuals are zero to the precision of the data: σ̂ and the SEs are then 0. */
  perfectFit: boolean;
}

export interface NestedData {
  y: number[];
  base: number[][];
  added: number[][];
  weights?: number[];
}

export interface NestedComparison {
  f: number;
  dfNumerator: number;
  /** Residual df of the full model (Infinity when σ is known). */
  dfDenominator: number;
  pValue: number;
  /** The F value the test must exceed at the settings' confidence level. */
  fCritical: number;
  rssBase: number;
  rssFull: number;
  addedHelp: boolean;
}

export interface Prediction {
  estimate: number;
  /** Interval for the mean response at this row. */
  meanLow: number;
  meanHigh: number;
  /** Interval for one new observation at this row. */
  newLow: number;
  newHigh: number;
  /**
   * x₀ᵀ(XᵀWX)⁻¹x₀, x₀ the row's model columns (the intercept's 1 included), on the scale of the
   * predictors: a new row's own weight does not enter. For a fitting row i it equals hᵢ/wᵢ (hᵢ the
   * weighted hat diagonal), which is hᵢ itself in an unweighted fit. NaN when the row is not estimable.
   */
  leverage: number;
  /**
   * Indices into the columns of ModelData.x (the coded columns, intercept excluded) where the new
   * value lies outside the fitting rows' [min, max]; ascending, empty when every value is inside.
   */
  outsideRange: number[];
  /**
   * Every value lies inside its column's range, yet the leverage exceeds the largest of the fitting
   * rows' (each xᵢᵀ(XᵀWX)⁻¹xᵢ, the same scale): a combination unlike any row the model was fitted to.
   */
  hiddenExtrapolation: boolean;
}
