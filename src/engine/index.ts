/**
 * Plumbline's engine: pure TypeScript, no Office, cells or UI. This is its only public entry.
 */
export { fitModel } from './fitModel';
export { compareLeadingColumns, compareNested, NOTHING_ADDED_MESSAGE } from './compareNested';
export { intervalsAround, predict } from './predict';
export { compareCandidates, type CandidateResult } from './infer/modelComparison';
export { residualDiagnostics, maxCooksDistance, type ResidualDiagnostics, type RowDiagnostics, type UndefinedReason } from './infer/influence';
export { EngineError, type EngineErrorCode } from './errors';
export { judgeNoiseSd, type NoiseSdVerdict } from './noiseSd';
export type { CovarianceKind, FitSettings, ModelData, ModelFit, NestedComparison, NestedData, Prediction, ResolvedSettings, TermEstimate } from './types';
export { modelCache } from './fitModel';
export { resetCaches } from './resetCaches';
export { COVARIANCE_KINDS } from './settings';
export type { CacheStats } from './cache/modelCache';
export { buildModelFrame, type FrameInput, type FrameOrigins, type ModelFrame, type SkippedRow } from './design/modelFrame';
export { cellPlace, type RangeOrigin, rowNumber } from './design/origin';
export { codeRow, type SourceColumn } from './design/categorical';
export { badCellMessage, badWeightMessage, isCategoricalColumn } from './design/cellRules';
export { type NewRowColumn, type NewRowNaming, type NewRowValues, readNewRowValues } from './design/newRows';
export { classifyCell, describeCell, type Cell, type CellGrid, type CellValue, type CellErrorValue } from './design/cells';
export { INTERCEPT_NAME } from './fit/design';
export { collinearity, modelCollinearity, type Collinearity, type CollinearityReason, type TermCollinearity } from './infer/collinearity';
export {
  assumptionChecks,
  checkedRow,
  type AssumptionChecks,
  type BreuschPaganVerdict,
  type DurbinWatsonVerdict,
  type JarqueBeraVerdict,
  type LackOfFitVerdict,
  type OutlierVerdict,
  type ShapiroWilkVerdict,
  type CheckedRow,
} from './infer/assumptionChecks';
export { type DurbinWatsonExact, type DurbinWatsonExactReason, type DurbinWatsonMethod, EXACT_MAX_ROWS } from './infer/durbinWatsonExact';
export { type ShapiroWilk, type ShapiroWilkReason, SHAPIRO_WILK_MAX_N, SHAPIRO_WILK_MIN_N } from './infer/shapiroWilk';
export type { OutlierTest, OutlierTestReason } from './infer/outlierTest';
export type { LackOfFit, LackOfFitReason } from './infer/lackOfFit';
export type { BreuschPagan, BreuschPaganReason } from './infer/breuschPagan';
export type { JarqueBera } from './infer/jarqueBera';
export { normalScores, type NormalScores } from './infer/normalScores';
export { RegressionAccumulator, type RowBlock, type AccumulatedRows } from './stream/regressionAccumulator';
export { fitAccumulated } from './stream/fitAccumulated';
export { blockResiduals } from './stream/blockResiduals';
export { fCriticalValue } from './infer/referenceDistribution';
