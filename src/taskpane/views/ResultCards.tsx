import type { PaneAnalysis } from '../model/analysis';
import { fitSentence, nestedSentence, termSentence } from '../model/sentences';

/** The results in words, one card per term, with the fit and the nested verdict. */
export function ResultCards({ analysis, level }: { analysis: PaneAnalysis; level: number }) {
  const { fit, frame } = analysis;
  if (fit === undefined) {
    return (
      <p class="problem" role="alert">
        {analysis.fitError}
      </p>
    );
  }
  return (
    <div class="results">
      <p class="card summary">{fitSentence(fit, frame)}</p>
      {analysis.nested && <p class={`card verdict ${analysis.nested.addedHelp ? 'helps' : 'keep'}`}>{nestedSentence(analysis.nested, analysis.addedNames, level)}</p>}
      {analysis.nestedError && (
        <p class="problem" role="alert">
          {analysis.nestedError}
        </p>
      )}
      <ul class="cards" aria-label="Terms">
        {fit.terms.map((t) => (
          <li key={t.name} class={`card term ${t.aliased ? 'aliased' : t.ciLow > 0 || t.ciHigh < 0 ? 'clear' : 'unclear'}`}>
            {termSentence(t, frame, level)}
          </li>
        ))}
      </ul>
      <p class="caution">Associations, not causes. Predictions beyond the data are extrapolations. Check the residuals before trusting the intervals.</p>
    </div>
  );
}
