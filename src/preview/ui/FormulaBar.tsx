import { useEffect, useRef, useState } from 'preact/hooks';
import type { CellInput, RangeRef } from '../workbook/types';
import { NameBox } from './NameBox';

interface FormulaBarProps {
  selection: RangeRef;
  input: CellInput;
  /** Text that replaces the input when editing started by typing into the grid. */
  editSeed: { text: string | undefined; token: number };
  onCommit(text: string): void;
  onCancel(): void;
  onGoTo(range: RangeRef): boolean;
}

function inputText(input: CellInput): string {
  if (input === null) return '';
  if (typeof input === 'boolean') return input ? 'TRUE' : 'FALSE';
  return String(input);
}

/** The selected cell's address and its input, edited here: Enter commits, Escape cancels. */
export function FormulaBar({ selection, input, editSeed, onCommit, onCancel, onGoTo }: FormulaBarProps) {
  const field = useRef<HTMLInputElement>(null);
  const [text, setText] = useState(inputText(input));

  useEffect(() => setText(inputText(input)), [input, selection.sheet, selection.top, selection.left]);
  useEffect(() => {
    if (editSeed.token === 0) return;
    if (editSeed.text !== undefined) setText(editSeed.text);
    field.current?.focus();
  }, [editSeed.token]);

  return (
    <div class="formula-bar">
      <NameBox selection={selection} onGoTo={onGoTo} />
      <label class="visually-hidden" for="formula-input">
        Cell contents
      </label>
      <input
        id="formula-input"
        ref={field}
        class="formula-input"
        value={text}
        spellcheck={false}
        autocomplete="off"
        onInput={(e) => setText((e.currentTarget as HTMLInputElement).value)}
        onKeyDown={(e) => {
          if (e.key === 'Enter') {
            e.preventDefault();
            onCommit(text);
          } else if (e.key === 'Escape') {
            e.preventDefault();
            setText(inputText(input));
            onCancel();
          }
        }}
      />
    </div>
  );
}
