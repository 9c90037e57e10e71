import { fieldTools, type SectionProps } from './sectionProps';

/** Which predictors form the added set whose contribution the nested F test judges. */
export function CompareSection({ state, analysis, dispatch }: Pick<SectionProps, 'state' | 'analysis' | 'dispatch'>) {
  const { edit } = fieldTools({ state, dispatch });
  const { added } = state.choices;
  const toggle = (j: number, on: boolean) => edit({ added: on ? [...added, j].sort((a, b) => a - b) : added.filter((k) => k !== j) });
  return (
    <section aria-labelledby="compare-heading">
      <h2 id="compare-heading">Compare</h2>
      {typeof analysis !== 'object' ? (
        <p class="hint">Read the data first; then tick the predictors whose contribution you want tested, for example "does bean age add anything?".</p>
      ) : (
        <fieldset>
          <legend>Test whether these added predictors help</legend>
          {analysis.predictorNames.map((name, j) => (
            <div class="field checkbox" key={name}>
              <input id={`added-${j}`} type="checkbox" checked={added.includes(j)} onChange={(e) => toggle(j, (e.currentTarget as HTMLInputElement).checked)} />
              <label for={`added-${j}`}>{name}</label>
            </div>
          ))}
        </fieldset>
      )}
    </section>
  );
}
