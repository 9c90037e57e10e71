import { unusedSigmaNotice } from '../model/analysisParts';
import { staleNotice } from '../state/selectors';
import { ResultCards } from './ResultCards';
import { fieldTools, type SectionProps } from './sectionProps';

/** The results in words, flagged when they no longer match the inputs. */
export function ResultsSection({ state, analysis, dispatch }: Pick<SectionProps, 'state' | 'analysis' | 'dispatch'>) {
  const { edit } = fieldTools({ state, dispatch });
  const stale = staleNotice(state);
  const { choices } = state;
  const sigmaNotice = unusedSigmaNotice(choices);
  return (
    <section aria-labelledby="results-heading" aria-live="polite">
      <h2 id="results-heading">Results</h2>
      {stale !== undefined && typeof analysis === 'object' && (
        <p class="stale" role="status">
          {stale}
        </p>
      )}
      {sigmaNotice !== undefined && typeof analysis === 'object' && (
        <p class="sigma-unused" role="status">
          {sigmaNotice}
        </p>
      )}
      {typeof analysis === 'object' ? (
        <ResultCards analysis={analysis} level={choices.level} onUseRobust={choices.robust === 'classical' ? () => edit({ robust: 'HC3' }) : undefined} />
      ) : (
        <p class="hint">Results appear here once the data are read.</p>
      )}
    </section>
  );
}
