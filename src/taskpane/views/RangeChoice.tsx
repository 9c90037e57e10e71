import type { RangeFieldName } from '../state/paneState';
import { RangeField } from './RangeField';
import { fieldTools, type SectionProps } from './sectionProps';

interface RangeChoiceProps extends SectionProps {
  field: RangeFieldName;
  id: string;
  label: string;
  hint: string;
  /** Offers Add, which appends the current selection (the predictors, which may be several areas). */
  appendable?: boolean;
}

/** One range choice of the pane, bound to its field: its address, its problem, typing and Use selection. */
export function RangeChoice({ field, id, label, hint, appendable = false, state, analysis, dispatch, commands }: RangeChoiceProps) {
  const { problem, edit } = fieldTools({ state, analysis, dispatch });
  return (
    <RangeField
      id={id}
      label={label}
      hint={hint}
      value={state.choices[field]}
      problem={problem(field)}
      onChange={(value) => edit({ [field]: value })}
      onUseSelection={() => commands.takeSelection(field)}
      onAddSelection={appendable ? () => commands.takeSelection(field, true) : undefined}
    />
  );
}
