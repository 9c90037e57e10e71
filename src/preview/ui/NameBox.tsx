import { useEffect, useState } from 'preact/hooks';
import { formatRange, parseRange, type RangeRef } from '../../addressing/a1';

interface NameBoxProps {
  selection: RangeRef;
  /** Selects the typed range; returns false when the text is not an address of a known sheet. */
  onGoTo(range: RangeRef): boolean;
}

/**
 * Shows the selection's address and takes a typed one ("B1:B61", "'Planned batches'!B1:F6"):
 * the keyboard way to select a range too large to click.
 */
export function NameBox({ selection, onGoTo }: NameBoxProps) {
  const [text, setText] = useState(formatRange(selection, false));
  const [invalid, setInvalid] = useState(false);
  useEffect(() => {
    setText(formatRange(selection, false));
    setInvalid(false);
  }, [selection.sheet, selection.top, selection.left, selection.bottom, selection.right]);

  return (
    <input
      class={invalid ? 'name-box invalid' : 'name-box'}
      aria-label="Selected range (type an address and press Enter to select it)"
      aria-invalid={invalid}
      value={text}
      spellcheck={false}
      onInput={(e) => setText((e.currentTarget as HTMLInputElement).value)}
      onKeyDown={(e) => {
        if (e.key !== 'Enter') return;
        e.preventDefault();
        const range = parseRange(text, selection.sheet);
        setInvalid(range === undefined || !onGoTo(range));
      }}
    />
  );
}
