import { checkList } from '../../presentation';
import type { PaneAnalysis } from '../model/paneAnalysis';
import { fitSentence, nestedSentence, type SentenceFrame, termSentence } from '../model/sentences';

interface ResultCardsProps {
  analysis: PaneAnalysis;
  level: number;
  /** Present when robust standard errors are not in use yet: switches them on. */
  onUseRobust: (() => void) | undefined;
}

function sentenceFrame(analysis: PaneAnalysis): SentenceFrame {
  return analysis.source === 'cells' ? analysis.frame : { responseName: analysis.responseName, columns: [], skipped: { length: analysis.rowsSkipped } };
}

/** The results in words: checks that failed first, then the fit, the nested verdict and one card per term. */
export function ResultCards({ analysis, level, onUseRobust }: ResultCardsProps) {
  const { fit } = analysis;
  if (fit === undefined) {
    return (
      <p class="problem" role="alert">
        {analysis.fitError}
      </p>
    );
  }
  const frame = sentenceFrame(analysis);
  const failedChecks = analysis.warnings.filter((w) => w.about === 'checks');
  return (
    <div class="results">
      {failedChecks.length > 0 && (
        <ul class="cards check-warnings" aria-label="Checks that failed">
          {failedChecks.map((w) => (
            <li key={w.text} class="card warning">
              {w.text}
              {w.suggestsRobust && onUseRobust && (
                <button type="button" class="inline-action" onClick={onUseRobust}>
                  Use robust (HC3) standard errors
                </button>
              )}
            </li>
          ))}
        </ul>
      )}
      {fit.covarianceKind !== 'classical' && <p class="card">Standard errors and intervals below are robust ({fit.covarianceKind}).</p>}
      <p class="card summary">{fitSentence(fit, frame)}</p>
      {analysis.nested && (
        <p class={`card verdict ${analysis.nested.addedHelp ? 'helps' : 'keep'}`}>{nestedSentence(analysis.nested, analysis.addedNames, level, fit)}</p>
      )}
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
      {analysis.source === 'cells' && analysis.checks !== undefined && (
        <details class="card checks">
          <summary>Every check, in words</summary>
          <dl>
            {checkList(analysis.checks).map((line) => (
              <div key={line.question}>
                <dt>{line.question}</dt>
                <dd>{line.reading}</dd>
              </div>
            ))}
          </dl>
        </details>
      )}
      <p class="caution">Associations, not causes. Predictions beyond the data are extrapolations. Check the residuals before trusting the intervals.</p>
    </div>
  );
}
