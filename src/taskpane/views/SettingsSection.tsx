import type { PaneChoices } from '../model/choices';
import { describedBy, ProblemNote } from './ProblemNote';
import { RangeChoice } from './RangeChoice';
import { fieldTools, type SectionProps } from './sectionProps';

const ROBUST_OPTIONS: { value: PaneChoices['robust']; label: string }[] = [
  { value: 'classical', label: 'Classical (constant spread)' },
  { value: 'HC3', label: 'Robust HC3 (when spread varies)' },
  { value: 'HC1', label: 'Robust HC1' },
  { value: 'HC0', label: 'Robust HC0' },
];

/** The fit's settings; each change refits the data already read at once. */
export function SettingsSection(props: SectionProps) {
  const { state, analysis, dispatch } = props;
  const { problem, edit } = fieldTools({ state, analysis, dispatch });
  const { choices } = state;
  const levelProblem = problem('level');
  // Checked as the user types, by the rule noise_sd follows in the cells.
  const sigmaProblem = problem('knownSigma');
  return (
    <section aria-labelledby="settings-heading">
      <h2 id="settings-heading">Settings</h2>
      <div class="field">
        <label for="level">Confidence level</label>
        <input
          id="level"
          type="number"
          min="0.5"
          max="0.999"
          step="0.01"
          value={choices.level}
          aria-invalid={levelProblem !== undefined}
          aria-describedby={describedBy(levelProblem, 'level-problem')}
          onChange={(e) => edit({ level: Number((e.currentTarget as HTMLInputElement).value) })}
        />
        <ProblemNote id="level-problem" problem={levelProblem} />
      </div>
      <div class="field checkbox">
        <input
          id="intercept"
          type="checkbox"
          checked={choices.intercept}
          onChange={(e) => edit({ intercept: (e.currentTarget as HTMLInputElement).checked })}
        />
        <label for="intercept">Fit an intercept</label>
      </div>
      <div class="field">
        <label for="known-sigma">Known σ (leave empty to estimate it)</label>
        <input
          id="known-sigma"
          type="text"
          inputMode="decimal"
          value={choices.knownSigma}
          aria-invalid={sigmaProblem !== undefined}
          aria-describedby={describedBy(sigmaProblem, 'known-sigma-problem')}
          onInput={(e) => edit({ knownSigma: (e.currentTarget as HTMLInputElement).value })}
        />
        <ProblemNote id="known-sigma-problem" problem={sigmaProblem} />
      </div>
      <div class="field">
        <label for="robust">Standard errors</label>
        <select id="robust" value={choices.robust} onChange={(e) => edit({ robust: (e.currentTarget as HTMLSelectElement).value as PaneChoices['robust'] })}>
          {ROBUST_OPTIONS.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </select>
      </div>
      <RangeChoice {...props} field="weights" id="weights" label="Weights (optional)" hint="A column of positive weights with the response's rows." />
    </section>
  );
}
