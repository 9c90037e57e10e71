import { PredictionCards } from './PredictionCards';
import { RangeChoice } from './RangeChoice';
import type { SectionProps } from './sectionProps';

/** The new rows to predict, and one card per row once the data are read. */
export function PredictSection(props: SectionProps) {
  const { state, analysis } = props;
  return (
    <section aria-labelledby="predict-heading">
      <h2 id="predict-heading">Predict</h2>
      <RangeChoice {...props} field="newRows" id="new-rows" label="New rows (optional)" hint="Laid out like the predictors, with or without the header row." />
      {typeof analysis === 'object' && <PredictionCards analysis={analysis} data={state.data} level={state.choices.level} />}
    </section>
  );
}
