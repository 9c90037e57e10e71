import type { PaneAnalysis } from '../model/paneAnalysis';
import { observedRanges, type ObservedRange, predictionCard, predictionIntervalsNote, rangesByName } from '../model/predictionCards';
import type { PaneData } from '../readData';

/** Each numeric predictor's observed range: from the frame's rows, or the ranges a streamed read kept. */
function rangesOf(analysis: PaneAnalysis, data: PaneData | undefined): ReadonlyMap<string, ObservedRange> {
  if (analysis.source === 'cells') return observedRanges(analysis.frame);
  return data?.kind === 'streamed' ? rangesByName(analysis.predictorNames, data.data.min, data.data.max) : new Map();
}

/** One card per new row: its label and inputs, the estimate with both intervals, and any extrapolation. */
export function PredictionCards({ analysis, data, level }: { analysis: PaneAnalysis; data: PaneData | undefined; level: number }) {
  const { fit, predictions, predictionError } = analysis;
  // A failure to predict is shown beside the New rows field (sectionProps' fieldTools).
  if (predictionError !== undefined || fit === undefined || predictions.length === 0) return null;
  const context = { responseName: analysis.responseName, level, observed: rangesOf(analysis, data) };
  const note = predictionIntervalsNote(fit);
  return (
    <>
      {note !== undefined && <p class="hint">{note}</p>}
      <ul class="cards predictions" aria-label="Predictions">
        {predictions.map((prediction) => {
          const card = predictionCard(prediction, context);
          return (
            <li key={prediction.sheetRow} class={`card prediction${card.flags.length > 0 ? ' extrapolates' : ''}`}>
              <h3>{card.label}</h3>
              <p>{card.inputs}</p>
              <p class="estimate">{card.estimate}</p>
              {card.meanInterval !== '' && <p>{card.meanInterval}</p>}
              {card.newInterval !== '' && <p>{card.newInterval}</p>}
              {card.flags.map((flag) => (
                <p key={flag} class="flag">
                  {flag}
                </p>
              ))}
            </li>
          );
        })}
      </ul>
    </>
  );
}
