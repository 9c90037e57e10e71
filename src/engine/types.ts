/** Numbers in, row-major: n rows of y, and n rows × p columns of predictors (p may be 0). */
export interface ModelData {
  y: number[];
  x: number[][];
  /** Names of the p predictor columns; defaults to x1…xp. */
  names?: string[];
  /** Case weights for weighted least squares; each must be finite and positive. */
  weights?: number[];
}

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
}

export interface ResolvedSettings {
  intercept: boolean;
  level: number;
  knownSigma: number | undefined;
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
  logLikelihood: number;
  aic: number;
  bic: number;
  fitted: number[];
  /** y − fitted, unweighted. */
  residuals: number[];
  /** Which distribution the statistics refer to. */
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
}
