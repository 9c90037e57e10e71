/**
 * Plumbline's presentation: every reading text, rule-of-thumb threshold and number format, shared
 * by the pane, the reports and the cell functions. The engine returns numbers and verdict codes;
 * this module words them. It imports only the engine.
 */
export { formatCount, formatFixed, formatLevel, formatNumber, formatShare, formatSigned, SIGNIFICANT_DIGITS } from './numbers';
export { formatP, formatPValue, P_VALUE_DECIMALS, P_VALUE_FORMAT } from './pValues';
export { decimalsFor, fixedFormat, formatDecimals, MINUS, roundedParts } from './decimals';
export {
  CONDITION_BANDS,
  COOKS_NUMERATOR,
  COOKS_RULE,
  FLAG_TEXT,
  HIGH_LEVERAGE_MULTIPLE,
  highLeverageCount,
  LARGE_STUDENTIZED,
  LARGE_VIF,
  LEVERAGE_RULE,
  NORMAL_KURTOSIS,
  NOTABLE_SKEWNESS,
  type ResidualFlag,
  residualFlags,
  SCREENS_TEXT,
  screenCutoffs,
  UNUSUAL_COOKS_DISTANCE,
  type UnusualRow,
  unusualRows,
} from './thresholds';
export {
  breuschPaganReading,
  durbinWatsonMethodText,
  durbinWatsonPText,
  durbinWatsonReading,
  largestVifTermReading,
  overallReading,
  unusualRowsReading,
} from './checkReadings';
export { jarqueBeraReading, shapiroWilkReading } from './normalityReadings';
export { outlierReading } from './outlierReadings';
export { lackOfFitReading } from './lackOfFitReadings';
export { type CheckLine, checkList } from './checkList';
export { COLLINEARITY_REASON_TEXT, conditionReading } from './collinearityReadings';
export { intervalVerdict, nestedReading, termReading } from './termReadings';
export { type NoiseSdEntry, noiseSdMessage } from './noiseSd';
