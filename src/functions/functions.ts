/**
 * The PLUMB cell functions. Every function reads its ranges through one input module
 * (modelRequest), fits through the engine's shared cache, and lays its result out through a grid
 * module; failures become #VALUE! with a message (cellError). The metadata plugin turns the JSDoc
 * below into functions.json and writes the CustomFunctions.associate calls.
 *
 * Shared settings, always the last five arguments and in this order: level, intercept,
 * noise_sd, weights, robust. After them every function takes the invocation Excel passes; with
 * @requiresParameterAddresses it carries each argument's worksheet address, so rows and cells are
 * named as the user reads them (functions.json never lists it as a parameter).
 */
import {
  compareCandidates,
  compareLeadingColumns,
  fitModel,
  predict as predictRows,
  residualDiagnostics,
  assumptionChecks,
  modelCollinearity,
  normalScores,
} from '../engine';
import { guarded } from './cellError';
import { offThreadWhenLarge } from './offThread/offThread';
import type { RangeArgument } from './cellInput';
import { toCellGrid } from './cellInput';
import { readCandidates } from './candidates';
import { gatherAreas } from './gather';
import { readModel, type ModelRequest, readPredictors } from './modelRequest';
import { readNewRows } from './newRows';
import { argumentOrigins } from './parameterOrigins';
import { covarianceGrid, estimatesGrid, intervalsGrid, standardErrorsGrid } from '../cellGrids/coefficientGrids';
import { compareGrid } from '../cellGrids/compareGrid';
import { equationGrid } from '../cellGrids/equationGrid';
import { fitStatsGrid } from '../cellGrids/fitStatsGrid';
import { nestedGrid } from '../cellGrids/nestedGrid';
import { frameColumnNames, predictGrid } from '../cellGrids/predictGrid';
import { residualsGrid } from '../cellGrids/residualsGrid';
import { termsGrid } from '../cellGrids/termsGrid';
import { checksGrid } from '../cellGrids/checksGrid';
import { collinearityGrid } from '../cellGrids/collinearityGrid';
import { qqGrid } from '../cellGrids/qqGrid';

/* eslint-disable @typescript-eslint/no-explicit-any -- ranges arrive from Excel as any[][] */

type Invocation = CustomFunctions.Invocation | undefined;

/** Position of weights among the arguments: after two data ranges (the usual), or after three. */
const WEIGHTS_AFTER_TWO = 5;
const WEIGHTS_AFTER_THREE = 6;

interface SettingsAt {
  level: any;
  intercept: any;
  noise_sd: any;
  weights: any;
  robust: any;
  weightsIndex: number;
}

/**
 * response, the predictor blocks (with their argument positions) and the settings read into a
 * model, each range located on its worksheet.
 */
function requestOf(
  response: any[][],
  blocks: { range: any[][]; argument: string; index: number }[],
  settings: SettingsAt,
  invocation: Invocation,
): ModelRequest {
  const at = argumentOrigins(invocation);
  return readModel(
    response as RangeArgument,
    blocks.map((b) => ({ range: b.range as RangeArgument, argument: b.argument })),
    {
      level: settings.level,
      intercept: settings.intercept,
      knownSigma: settings.noise_sd,
      weights: settings.weights as RangeArgument | null,
      robust: settings.robust,
    },
    { y: at(0), x: blocks.map((b) => at(b.index)), weights: at(settings.weightsIndex) },
  );
}

function request(
  response: any[][],
  predictors: any[][],
  level: any,
  intercept: any,
  noise_sd: any,
  weights: any,
  robust: any,
  invocation: Invocation,
): ModelRequest {
  return requestOf(
    response,
    [{ range: predictors, argument: 'predictors', index: 1 }],
    { level, intercept, noise_sd, weights, robust, weightsIndex: WEIGHTS_AFTER_TWO },
    invocation,
  );
}

function fitOf(r: ModelRequest) {
  return fitModel(r.frame.data, r.settings);
}

/**
 * Which terms matter: estimate, standard error, t, p-value, confidence interval, CV % and a reading for every term.
 * @customfunction TERMS
 * @param response Responses: one column, with an optional text header.
 * @param predictors Predictors: one or more columns with the same rows. Text columns are categorical.
 * @param [level] Confidence level for the intervals. Default 0.95.
 * @param [intercept] TRUE (default) fits an intercept; FALSE forces the model through zero.
 * @param [noise_sd] The noise standard deviation if known from outside the data. Default: estimated.
 * @param [weights] Optional column of positive case weights, same rows as response.
 * @param [robust] FALSE (default) for classical standard errors; TRUE for heteroscedasticity-consistent HC3, or the text "HC0", "HC1", "HC3" or "classical".
 * @param invocation Passed by Excel: the address of each argument, to name rows and cells as the worksheet does.
 * @requiresParameterAddresses
 * @returns A table with a header row and one row per term.
 */
export function terms(
  response: any[][],
  predictors: any[][],
  level?: any,
  intercept?: any,
  noise_sd?: any,
  weights?: any[][],
  robust?: any,
  invocation?: CustomFunctions.Invocation,
): any[][] {
  return offThreadWhenLarge('terms', [response, predictors, level, intercept, noise_sd, weights, robust], invocation, () =>
    guarded(() => termsGrid(fitOf(request(response, predictors, level, intercept, noise_sd, weights, robust, invocation)))),
  );
}

/**
 * The estimated coefficients, one per term: the intercept first, then the predictors in range order.
 * @customfunction ESTIMATES
 * @param response Responses: one column, with an optional text header.
 * @param predictors Predictors: one or more columns with the same rows. Text columns are categorical.
 * @param [level] Confidence level. Default 0.95.
 * @param [intercept] TRUE (default) fits an intercept; FALSE forces the model through zero.
 * @param [noise_sd] The noise standard deviation if known. Default: estimated.
 * @param [weights] Optional column of positive case weights, same rows as response.
 * @param [robust] Accepted as in every PLUMB function; the estimates do not depend on it.
 * @param invocation Passed by Excel: the address of each argument, to name rows and cells as the worksheet does.
 * @requiresParameterAddresses
 * @returns One column of numbers.
 */
export function estimates(
  response: any[][],
  predictors: any[][],
  level?: any,
  intercept?: any,
  noise_sd?: any,
  weights?: any[][],
  robust?: any,
  invocation?: CustomFunctions.Invocation,
): any[][] {
  return offThreadWhenLarge('estimates', [response, predictors, level, intercept, noise_sd, weights, robust], invocation, () =>
    guarded(() => estimatesGrid(fitOf(request(response, predictors, level, intercept, noise_sd, weights, robust, invocation)))),
  );
}

/**
 * The standard error of each coefficient, in the order of PLUMB.ESTIMATES.
 * @customfunction STDERRORS
 * @param response Responses: one column, with an optional text header.
 * @param predictors Predictors: one or more columns with the same rows. Text columns are categorical.
 * @param [level] Confidence level. Default 0.95.
 * @param [intercept] TRUE (default) fits an intercept; FALSE forces the model through zero.
 * @param [noise_sd] The noise standard deviation if known. Default: estimated.
 * @param [weights] Optional column of positive case weights, same rows as response.
 * @param [robust] FALSE (default) for classical standard errors; TRUE for heteroscedasticity-consistent HC3, or the text "HC0", "HC1", "HC3" or "classical".
 * @param invocation Passed by Excel: the address of each argument, to name rows and cells as the worksheet does.
 * @requiresParameterAddresses
 * @returns One column of standard errors.
 */
export function stdErrors(
  response: any[][],
  predictors: any[][],
  level?: any,
  intercept?: any,
  noise_sd?: any,
  weights?: any[][],
  robust?: any,
  invocation?: CustomFunctions.Invocation,
): any[][] {
  return offThreadWhenLarge('stdErrors', [response, predictors, level, intercept, noise_sd, weights, robust], invocation, () =>
    guarded(() => standardErrorsGrid(fitOf(request(response, predictors, level, intercept, noise_sd, weights, robust, invocation)))),
  );
}

/**
 * Confidence intervals for the coefficients, in the order of PLUMB.ESTIMATES.
 * @customfunction INTERVALS
 * @param response Responses: one column, with an optional text header.
 * @param predictors Predictors: one or more columns with the same rows. Text columns are categorical.
 * @param [level] Confidence level of the intervals. Default 0.95.
 * @param [intercept] TRUE (default) fits an intercept; FALSE forces the model through zero.
 * @param [noise_sd] The noise standard deviation if known. Default: estimated.
 * @param [weights] Optional column of positive case weights, same rows as response.
 * @param [robust] FALSE (default) for classical standard errors; TRUE for heteroscedasticity-consistent HC3, or the text "HC0", "HC1", "HC3" or "classical".
 * @param invocation Passed by Excel: the address of each argument, to name rows and cells as the worksheet does.
 * @requiresParameterAddresses
 * @returns Two columns: low and high.
 */
export function intervals(
  response: any[][],
  predictors: any[][],
  level?: any,
  intercept?: any,
  noise_sd?: any,
  weights?: any[][],
  robust?: any,
  invocation?: CustomFunctions.Invocation,
): any[][] {
  return offThreadWhenLarge('intervals', [response, predictors, level, intercept, noise_sd, weights, robust], invocation, () =>
    guarded(() => intervalsGrid(fitOf(request(response, predictors, level, intercept, noise_sd, weights, robust, invocation)))),
  );
}

/**
 * The covariance matrix of the coefficient estimates, terms in the order of PLUMB.ESTIMATES.
 * @customfunction COVARIANCE
 * @param response Responses: one column, with an optional text header.
 * @param predictors Predictors: one or more columns with the same rows. Text columns are categorical.
 * @param [level] Confidence level. Default 0.95.
 * @param [intercept] TRUE (default) fits an intercept; FALSE forces the model through zero.
 * @param [noise_sd] The noise standard deviation if known. Default: estimated.
 * @param [weights] Optional column of positive case weights, same rows as response.
 * @param [robust] FALSE (default) for classical standard errors; TRUE for heteroscedasticity-consistent HC3, or the text "HC0", "HC1", "HC3" or "classical".
 * @param invocation Passed by Excel: the address of each argument, to name rows and cells as the worksheet does.
 * @requiresParameterAddresses
 * @returns A square matrix, one row and column per term.
 */
export function covariance(
  response: any[][],
  predictors: any[][],
  level?: any,
  intercept?: any,
  noise_sd?: any,
  weights?: any[][],
  robust?: any,
  invocation?: CustomFunctions.Invocation,
): any[][] {
  return offThreadWhenLarge('covariance', [response, predictors, level, intercept, noise_sd, weights, robust], invocation, () =>
    guarded(() => covarianceGrid(fitOf(request(response, predictors, level, intercept, noise_sd, weights, robust, invocation)))),
  );
}

/**
 * How well the model fits: rows used and skipped, sigma-hat, R², adjusted R², the overall F test, log-likelihood, AIC and BIC.
 * @customfunction FITSTATS
 * @param response Responses: one column, with an optional text header.
 * @param predictors Predictors: one or more columns with the same rows. Text columns are categorical.
 * @param [level] Confidence level. Default 0.95.
 * @param [intercept] TRUE (default) fits an intercept; FALSE forces the model through zero (R² is then uncentered).
 * @param [noise_sd] The noise standard deviation if known. Default: estimated.
 * @param [weights] Optional column of positive case weights, same rows as response.
 * @param [robust] Accepted as in every PLUMB function; these statistics, the F test included, stay classical.
 * @param invocation Passed by Excel: the address of each argument, to name rows and cells as the worksheet does.
 * @requiresParameterAddresses
 * @returns Two columns: label and value.
 */
export function fitStats(
  response: any[][],
  predictors: any[][],
  level?: any,
  intercept?: any,
  noise_sd?: any,
  weights?: any[][],
  robust?: any,
  invocation?: CustomFunctions.Invocation,
): any[][] {
  return offThreadWhenLarge('fitStats', [response, predictors, level, intercept, noise_sd, weights, robust], invocation, () =>
    guarded(() => {
      const r = request(response, predictors, level, intercept, noise_sd, weights, robust, invocation);
      return fitStatsGrid(fitOf(r), r.frame);
    }),
  );
}

/**
 * The fitted equation as text, with the names from the headers and each coefficient rounded to about three significant digits of its standard error.
 * @customfunction EQUATION
 * @param response Responses: one column, with an optional text header.
 * @param predictors Predictors: one or more columns with the same rows. Text columns are categorical.
 * @param [level] Confidence level, accepted as in every PLUMB function; it does not change the equation. Default 0.95.
 * @param [intercept] TRUE (default) fits an intercept; FALSE forces the model through zero.
 * @param [noise_sd] The noise standard deviation if known; it sets the standard errors and so the rounding. Default: estimated.
 * @param [weights] Optional column of positive case weights, same rows as response.
 * @param [robust] FALSE (default) rounds to the classical standard errors; TRUE to HC3, or the text "HC0", "HC1", "HC3" or "classical".
 * @param invocation Passed by Excel: the address of each argument, to name rows and cells as the worksheet does.
 * @requiresParameterAddresses
 * @returns One cell: the fitted equation, such as "Fitted [Yield] = 12.34 + 0.456·[Grind size]".
 */
export function equation(
  response: any[][],
  predictors: any[][],
  level?: any,
  intercept?: any,
  noise_sd?: any,
  weights?: any[][],
  robust?: any,
  invocation?: CustomFunctions.Invocation,
): any[][] {
  return offThreadWhenLarge('equation', [response, predictors, level, intercept, noise_sd, weights, robust], invocation, () =>
    guarded(() => {
      const r = request(response, predictors, level, intercept, noise_sd, weights, robust, invocation);
      return equationGrid(r.frame.responseName, fitOf(r));
    }),
  );
}

/**
 * Do the added predictors earn their place? The nested-model F test of base plus added against base alone.
 * @customfunction NESTEDF
 * @param response Responses: one column, with an optional text header.
 * @param base Predictors of the smaller model, same rows as response.
 * @param added The extra predictors to test, same rows as response.
 * @param [level] Confidence level of the test (critical F at this level). Default 0.95.
 * @param [intercept] TRUE (default) fits an intercept in both models; FALSE leaves it out of both.
 * @param [noise_sd] The noise standard deviation if known. Default: estimated from the larger model.
 * @param [weights] Optional column of positive case weights, same rows as response.
 * @param [robust] Accepted as in every PLUMB function; the nested F test stays classical.
 * @param invocation Passed by Excel: the address of each argument, to name rows and cells as the worksheet does.
 * @requiresParameterAddresses
 * @returns Two columns: label and value, ending with a reading.
 */
export function nestedF(
  response: any[][],
  base: any[][],
  added: any[][],
  level?: any,
  intercept?: any,
  noise_sd?: any,
  weights?: any[][],
  robust?: any,
  invocation?: CustomFunctions.Invocation,
): any[][] {
  return offThreadWhenLarge('nestedF', [response, base, added, level, intercept, noise_sd, weights, robust], invocation, () =>
    guarded(() => {
      const r = requestOf(
        response,
        [
          { range: base, argument: 'base', index: 1 },
          { range: added, argument: 'added', index: 2 },
        ],
        { level, intercept, noise_sd, weights, robust, weightsIndex: WEIGHTS_AFTER_THREE },
        invocation,
      );
      // Terms come in block order, so base's terms are the frame's leading columns.
      const baseColumns = r.frame.termBlocks.filter((b) => b === 0).length;
      return nestedGrid(compareLeadingColumns(r.frame.data, baseColumns, r.settings));
    }),
  );
}

/**
 * Predictions for new rows, with an interval for the mean response and one for a single new observation.
 * @customfunction PREDICT
 * @param response Responses: one column, with an optional text header.
 * @param predictors Predictors: one or more columns with the same rows. Text columns are categorical.
 * @param new_rows The rows to predict, laid out like predictors (an optional header row is skipped).
 * @param [level] Confidence level of both intervals. Default 0.95.
 * @param [intercept] TRUE (default) fits an intercept; FALSE forces the model through zero.
 * @param [noise_sd] The noise standard deviation if known. Default: estimated.
 * @param [weights] Optional column of positive case weights, same rows as response. New rows have weight 1.
 * @param [robust] Accepted as in every PLUMB function; both intervals use the classical covariance.
 * @param invocation Passed by Excel: the address of each argument, to name rows and cells as the worksheet does.
 * @requiresParameterAddresses
 * @returns One row per new row: prediction, mean low and high, new low and high, and an extrapolation note naming the predictors outside the data's range, or saying the mix of values is unlike any row used.
 */
export function predict(
  response: any[][],
  predictors: any[][],
  new_rows: any[][],
  level?: any,
  intercept?: any,
  noise_sd?: any,
  weights?: any[][],
  robust?: any,
  invocation?: CustomFunctions.Invocation,
): any[][] {
  return offThreadWhenLarge('predict', [response, predictors, new_rows, level, intercept, noise_sd, weights, robust], invocation, () =>
    guarded(() => {
      const r = requestOf(
        response,
        [{ range: predictors, argument: 'predictors', index: 1 }],
        { level, intercept, noise_sd, weights, robust, weightsIndex: WEIGHTS_AFTER_THREE },
        invocation,
      );
      const { rows } = readNewRows(toCellGrid(new_rows as RangeArgument, 'new_rows'), r.frame, argumentOrigins(invocation)(2));
      const complete = rows.filter((row): row is number[] => row !== undefined);
      const predicted = complete.length > 0 ? predictRows(r.frame.data, complete, r.settings) : [];
      let next = 0;
      return predictGrid(
        rows.map((row) => (row === undefined ? undefined : predicted[next++])),
        r.frame.hasHeader,
        frameColumnNames(r.frame),
      );
    }),
  );
}

/**
 * Which rows stand out: observed and fitted value, residual, standardized and studentized residuals, leverage, Cook's distance, DFFITS and a flag for every row used.
 * @customfunction RESIDUALS
 * @param response Responses: one column, with an optional text header.
 * @param predictors Predictors: one or more columns with the same rows. Text columns are categorical.
 * @param [level] Confidence level, accepted as in every PLUMB function; it does not change these diagnostics. Default 0.95.
 * @param [intercept] TRUE (default) fits an intercept; FALSE forces the model through zero.
 * @param [noise_sd] The noise standard deviation if known; used for the standardized residual and Cook's distance. Default: estimated.
 * @param [weights] Optional column of positive case weights, same rows as response.
 * @param [robust] Accepted as in every PLUMB function; it does not change these diagnostics.
 * @param invocation Passed by Excel: the address of each argument, to name rows and cells as the worksheet does.
 * @requiresParameterAddresses
 * @returns A table with a header row and one row per row used: its worksheet row (its position in response when response is no reference), the observed response, then the diagnostics.
 */
export function residuals(
  response: any[][],
  predictors: any[][],
  level?: any,
  intercept?: any,
  noise_sd?: any,
  weights?: any[][],
  robust?: any,
  invocation?: CustomFunctions.Invocation,
): any[][] {
  return offThreadWhenLarge('residuals', [response, predictors, level, intercept, noise_sd, weights, robust], invocation, () =>
    guarded(() => {
      const r = request(response, predictors, level, intercept, noise_sd, weights, robust, invocation);
      return residualsGrid(residualDiagnostics(r.frame.data, r.settings), r.frame);
    }),
  );
}

/**
 * Which subset of predictors to keep: fits every candidate on the same rows and ranks them by BIC, with residual df, sigma-hat, adjusted R², AIC and ΔBIC.
 * @customfunction COMPARE
 * @param response Responses: one column, with an optional text header.
 * @param predictors Every predictor any candidate may use: one or more columns with the same rows. Text columns are categorical.
 * @param candidates One row per candidate model and one 1/0 (or TRUE/FALSE) cell per column of predictors: 1 includes that column.
 * @param [level] Confidence level, accepted as in every PLUMB function; it does not change this comparison. Default 0.95.
 * @param [intercept] TRUE (default) fits an intercept in every candidate; FALSE leaves it out of all.
 * @param [noise_sd] The noise standard deviation if known; the likelihoods then use it. Default: estimated.
 * @param [weights] Optional column of positive case weights, same rows as response.
 * @param [robust] Accepted as in every PLUMB function; AIC and BIC do not depend on it.
 * @param invocation Passed by Excel: the address of each argument, to name rows and cells as the worksheet does.
 * @requiresParameterAddresses
 * @returns A table with a header row and one row per candidate, best (smallest BIC) first.
 */
export function compare(
  response: any[][],
  predictors: any[][],
  candidates: any[][],
  level?: any,
  intercept?: any,
  noise_sd?: any,
  weights?: any[][],
  robust?: any,
  invocation?: CustomFunctions.Invocation,
): any[][] {
  return offThreadWhenLarge('compare', [response, predictors, candidates, level, intercept, noise_sd, weights, robust], invocation, () =>
    guarded(() => {
      const r = requestOf(
        response,
        [{ range: predictors, argument: 'predictors', index: 1 }],
        { level, intercept, noise_sd, weights, robust, weightsIndex: WEIGHTS_AFTER_THREE },
        invocation,
      );
      const choices = readCandidates(toCellGrid(candidates as RangeArgument, 'candidates'), r.frame, argumentOrigins(invocation)(2));
      const results = compareCandidates(
        r.frame.data,
        choices.map((c) => c.terms),
        r.settings,
      );
      return compareGrid(results, choices, r.frame);
    }),
  );
}

/**
 * How far each predictor is explained by the others: VIF and tolerance for every term, and the condition number of the design.
 * @customfunction COLLINEARITY
 * @param predictors Predictors: one or more columns, with an optional header row (a first row of text in every column). Text columns are categorical.
 * @param [level] Confidence level, accepted as in every PLUMB function; it does not change these numbers. Default 0.95.
 * @param [intercept] TRUE (default): VIFs from regressions with an intercept, and the intercept column in the condition number; FALSE leaves it out of both.
 * @param [noise_sd] Accepted as in every PLUMB function; collinearity does not depend on it.
 * @param [weights] Optional column of positive case weights, same rows as predictors.
 * @param [robust] Accepted as in every PLUMB function; collinearity does not depend on it.
 * @param invocation Passed by Excel: the address of each argument, to name rows and cells as the worksheet does.
 * @requiresParameterAddresses
 * @returns A table with a header row, one row per term, and a last row with the condition number and its reading.
 */
export function collinearity(
  predictors: any[][],
  level?: any,
  intercept?: any,
  noise_sd?: any,
  weights?: any[][],
  robust?: any,
  invocation?: CustomFunctions.Invocation,
): any[][] {
  return offThreadWhenLarge('collinearity', [predictors, level, intercept, noise_sd, weights, robust], invocation, () =>
    guarded(() => {
      const at = argumentOrigins(invocation);
      const settings = { level, intercept, knownSigma: noise_sd, weights: weights as RangeArgument | null, robust };
      const r = readPredictors(predictors as RangeArgument, settings, { x: at(0), weights: at(4) });
      return collinearityGrid(modelCollinearity(r.frame.data, r.settings));
    }),
  );
}

/**
 * Are the model's assumptions plausible? Durbin–Watson for autocorrelation (exact p up to 300 rows), Breusch–Pagan for uneven spread, Shapiro–Wilk for normality (Jarque–Bera above 5000 rows), the Bonferroni outlier test, lack of fit where predictor settings repeat, plus influential rows and collinearity, each with a reading.
 * @customfunction CHECKS
 * @param response Responses: one column, with an optional text header. Row order matters for Durbin–Watson.
 * @param predictors Predictors: one or more columns with the same rows. Text columns are categorical.
 * @param [level] A check reports a problem when its p-value is below 1 − level. Default 0.95.
 * @param [intercept] TRUE (default) fits an intercept; FALSE forces the model through zero.
 * @param [noise_sd] The noise standard deviation if known; used for Cook's distance only. Default: estimated.
 * @param [weights] Optional column of positive case weights, same rows as response; the checks use the weighted residuals.
 * @param [robust] Accepted as in every PLUMB function; the checks do not depend on it (uneven spread is a reason to turn it on elsewhere).
 * @param invocation Passed by Excel: the address of each argument, to name rows and cells as the worksheet does.
 * @requiresParameterAddresses
 * @returns Two columns: label and value, ending with an overall reading.
 */
export function checks(
  response: any[][],
  predictors: any[][],
  level?: any,
  intercept?: any,
  noise_sd?: any,
  weights?: any[][],
  robust?: any,
  invocation?: CustomFunctions.Invocation,
): any[][] {
  return offThreadWhenLarge('checks', [response, predictors, level, intercept, noise_sd, weights, robust], invocation, () =>
    guarded(() => {
      const r = request(response, predictors, level, intercept, noise_sd, weights, robust, invocation);
      return checksGrid(assumptionChecks(r.frame.data, r.settings, r.frame.usedRows), r.frame);
    }),
  );
}

/**
 * Points for a normal Q–Q plot: the studentized residuals, sorted, against standard normal quantiles (Blom positions).
 * @customfunction QQPOINTS
 * @param response Responses: one column, with an optional text header.
 * @param predictors Predictors: one or more columns with the same rows. Text columns are categorical.
 * @param [level] Accepted as in every PLUMB function; it does not change these points.
 * @param [intercept] TRUE (default) fits an intercept; FALSE forces the model through zero.
 * @param [noise_sd] The noise standard deviation if known. Default: estimated.
 * @param [weights] Optional column of positive case weights, same rows as response.
 * @param [robust] Accepted as in every PLUMB function; it does not change these points.
 * @param invocation Passed by Excel: the address of each argument, to name rows and cells as the worksheet does.
 * @requiresParameterAddresses
 * @returns Three columns: normal quantile, studentized residual, and the worksheet row, as PLUMB.RESIDUALS numbers it; roughly a straight line when the residuals are normal.
 */
export function qqPoints(
  response: any[][],
  predictors: any[][],
  level?: any,
  intercept?: any,
  noise_sd?: any,
  weights?: any[][],
  robust?: any,
  invocation?: CustomFunctions.Invocation,
): any[][] {
  return offThreadWhenLarge('qqPoints', [response, predictors, level, intercept, noise_sd, weights, robust], invocation, () =>
    guarded(() => {
      const r = request(response, predictors, level, intercept, noise_sd, weights, robust, invocation);
      return qqGrid(normalScores(residualDiagnostics(r.frame.data, r.settings)), r.frame);
    }),
  );
}

/**
 * Several ranges side by side as one block, cell for cell: blanks stay blank and errors stay the same errors, so PLUMB functions that read the block skip and report the same rows as in the source cells (a plain reference would turn blanks into 0).
 * @customfunction GATHER
 * @param areas One or more ranges with the same number of rows, such as B2:B61, D2:E61; they are joined left to right.
 * @param invocation Passed by Excel: the address of each argument, to name an area that does not fit.
 * @requiresParameterAddresses
 * @returns The areas joined left to right, one row per row of the areas.
 */
export function gather(areas: any[][][], invocation?: CustomFunctions.Invocation): any[][] {
  return guarded(() => gatherAreas(areas, invocation?.parameterAddresses ?? []));
}
