/**
 * Plumbline's engine: pure TypeScript, no Office, cells or UI. This is its only public entry.
 */
export { fitModel } from './fitModel';
export { compareNested } from './compareNested';
export { predict } from './predict';
export { compareCandidates, type CandidateResult } from './infer/modelComparison';
export {
  residualDiagnostics,
  maxCooksDistance,
  highLeverageCount,
  type ResidualDiagnostics,
  type RowDiagnostics,
  type DiagnosticFlag,
  type UndefinedReason,
} from './infer/influence';
export { EngineError, type EngineErrorCode } from './errors';
export { judgeNoiseSd, type NoiseSdVerdict } from './noiseSd';
export type { CovarianceKind, FitSettings, ModelData, ModelFit, NestedComparison, NestedData, Prediction, ResolvedSettings, TermEstimate } from './types';
export { modelCache } from './fitModel';
export type { CacheStats } from './cache/modelCache';
export { buildModelFrame, type FrameInput, type FrameOrigins, type ModelFrame, type SkippedRow } from './design/modelFrame';
export { cellPlace, type RangeOrigin, rowNumber } from './design/origin';
export { codeRow, type SourceColumn } from './design/categorical';
export { classifyCell, describeCell, type Cell, type CellGrid, type CellValue, type CellErrorValue } from './design/cells';
export { INTERCEPT_NAME } from './fit/design';
export { collinearity, type Collinearity, type CollinearityReason, type TermCollinearity } from './infer/collinearity';
export { assumptionChecks, type AssumptionChecks, type UnusualRow } from './infer/assumptionChecks';
export { COLLINEARITY_REASON_TEXT, conditionReading, formatP, LARGE_VIF, unusualRowsReading } from './infer/checkReadings';
export type { DurbinWatson, DurbinWatsonReason } from './infer/durbinWatson';
export type { BreuschPagan, BreuschPaganReason } from './infer/breuschPagan';
export type { JarqueBera } from './infer/jarqueBera';
export { normalScores, type NormalScorePoint } from './infer/normalScores';
export { RegressionAccumulator, type RowBlock, type AccumulatedRows } from './stream/regressionAccumulator';
export { fitAccumulated } from './stream/fitAccumulated';
export { blockResiduals } from './stream/blockResiduals';
export { fCriticalValue } from './infer/referenceDistribution';
