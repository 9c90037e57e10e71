import { PredictionCards } from './PredictionCards';
import { RangeField } from './RangeField';
import { fieldTools, type SectionProps } from './sectionProps';

/** The new rows to predict, and one card per row once the data are read. */
export function PredictSection({ state, analysis, dispatch, commands }: SectionProps) {
  const { problem, edit } = fieldTools({ state, analysis, dispatch });
  return (
    <section aria-labelledby="predict-heading">
      <h2 id="predict-heading">Predict</h2>
      <RangeField
        id="new-rows"
        label="New rows (optional)"
        hint="Laid out like the predictors, with or without the header row."
        value={state.choices.newRows}
        problem={problem('newRows')}
        onChange={(newRows) => edit({ newRows })}
        onUseSelection={() => commands.takeSelection('newRows')}
      />
      {typeof analysis === 'object' && <PredictionCards analysis={analysis} data={state.data} level={state.choices.level} />}
    </section>
  );
}
