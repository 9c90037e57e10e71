import { describedBy, ProblemNote } from './ProblemNote';

interface RangeFieldProps {
  id: string;
  label: string;
  hint: string;
  value: string;
  problem: string | undefined;
  onChange(value: string): void;
  onUseSelection(): void;
  /** Offered for predictors, which may be several separate areas. */
  onAddSelection?: () => void;
}

/** An address the user can type or take from the sheet's selection, with its problem shown inline. */
export function RangeField({ id, label, hint, value, problem, onChange, onUseSelection, onAddSelection }: RangeFieldProps) {
  const hintId = `${id}-hint`;
  const problemId = `${id}-problem`;
  return (
    <div class="field">
      <label for={id}>{label}</label>
      <div class="field-row">
        <input
          id={id}
          type="text"
          value={value}
          spellcheck={false}
          aria-describedby={describedBy(problem, problemId, hintId)}
          aria-invalid={problem !== undefined}
          onChange={(e) => onChange((e.currentTarget as HTMLInputElement).value)}
        />
        <button type="button" onClick={onUseSelection} aria-label={`Use selection for ${label}`}>
          Use selection
        </button>
        {onAddSelection && (
          <button type="button" onClick={onAddSelection} aria-label={`Add selection to ${label}`}>
            Add
          </button>
        )}
      </div>
      <p id={hintId} class="hint">
        {hint}
      </p>
      <ProblemNote id={problemId} problem={problem} />
    </div>
  );
}
