import type { AssumptionChecks, FitSettings, ModelFit, ModelFrame, NestedComparison, SkippedRow } from '../../engine';
import type { PaneData } from '../readData';
import { analyzeCells } from './analysis';
import type { BlockHeader } from './blockRows';
import type { PaneChoices } from './choices';
import type { LabelledPrediction } from './newRowPredictions';
import type { PaneWarning } from './paneWarnings';
import { analyzeStreamed } from './streamedAnalysis';

export type { LabelledPrediction } from './newRowPredictions';
export type { PaneWarning } from './paneWarnings';

/** What both sources know alike, worked out by the same modules. */
interface SharedAnalysis {
  responseName: string;
  hasHeader: boolean;
  /** The predictors' names in sheet order (the chosen columns' order), as the fit names them. */
  predictorNames: string[];
  rowsUsed: number;
  rowsSkipped: number;
  /** The rows left out, by worksheet row (a stream keeps the first few). */
  skippedExamples: readonly SkippedRow[];
  fit: ModelFit | undefined;
  fitError: string | undefined;
  nested: NestedComparison | undefined;
  nestedError: string | undefined;
  addedNames: string[];
  settings: FitSettings;
  /** Data warnings first, then the residual checks that failed. */
  warnings: PaneWarning[];
  /** What this source could not check, in words (empty when everything was checked). */
  unchecked: string[];
  /** One per new row (a header row repeated is not one), in sheet order. */
  predictions: LabelledPrediction[];
  /** Why the new rows could not be predicted at all, else undefined. */
  predictionError: string | undefined;
}

/** Cells held in memory: the model frame, so the residual checks could run. */
export interface CellsAnalysis extends SharedAnalysis {
  source: 'cells';
  frame: ModelFrame;
  checks: AssumptionChecks | undefined;
}

/** Blocks folded into R and dropped: what R and each column's range give. */
export interface StreamedAnalysis extends SharedAnalysis {
  source: 'streamed';
  header: BlockHeader;
  /** Predictor indexes (sheet order) in fit order: base ones first, added ones last. */
  order: number[];
  /** t (or z) multiplier and σ for prediction intervals. */
  multiplier: number;
  inferenceSigma: number;
  /** Data rows in the chosen ranges, header excluded. */
  dataRows: number;
}

/** The one analysis of read data, whichever way the data were read. */
export type PaneAnalysis = CellsAnalysis | StreamedAnalysis;

function failure(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

/** The analysis the pane shows and the reports write, or why there is none. */
export function analyzeRead(data: PaneData, choices: PaneChoices): PaneAnalysis | string {
  try {
    return data.kind === 'cells' ? analyzeCells(data.data, choices) : analyzeStreamed(data.data, choices);
  } catch (error) {
    return failure(error);
  }
}
