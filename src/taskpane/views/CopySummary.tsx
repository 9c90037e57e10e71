import { useRef, useState } from 'preact/hooks';

type CopyOutcome = 'copied' | 'select' | undefined;

/**
 * Copies the textarea's selected text. The asynchronous Clipboard API is not used: Office on the
 * web runs the pane in a frame whose permissions policy blocks it (office-js issues #1991 and
 * #3480: "The Clipboard API has been blocked because of a permissions policy"), while the
 * preview page, a top-level localhost page, would allow it and so pass where Excel fails. The
 * copy command on a selection, in the click that asked for it, is what remains; when the browser
 * refuses that too, the text stays selected for the user's own Ctrl+C.
 */
function copySelection(area: HTMLTextAreaElement): boolean {
  area.focus();
  area.select();
  try {
    return document.execCommand('copy');
  } catch {
    return false;
  }
}

/** Read-only text to paste elsewhere, with a Copy button that says whether it worked. */
export function CopySummary({ text }: { text: string }) {
  const area = useRef<HTMLTextAreaElement>(null);
  const [outcome, setOutcome] = useState<{ text: string; result: CopyOutcome }>({ text, result: undefined });
  // A new model's text needs a new copy: the old outcome no longer speaks of it.
  const result = outcome.text === text ? outcome.result : undefined;
  const copy = () => {
    if (area.current !== null) setOutcome({ text, result: copySelection(area.current) ? 'copied' : 'select' });
  };
  return (
    <div class="copy-summary">
      <label for="copy-summary-text">Summary to copy</label>
      <textarea ref={area} id="copy-summary-text" readOnly rows={Math.min(14, text.split('\n').length + 1)} value={text} spellcheck={false} />
      <div class="actions">
        <button type="button" onClick={copy}>
          Copy
        </button>
        <span role="status" class={result === 'select' ? 'copy-outcome refused' : 'copy-outcome'}>
          {result === 'copied' ? 'Copied' : result === 'select' ? 'Select the text and copy it (Ctrl+C, or ⌘C on a Mac).' : ''}
        </span>
      </div>
    </div>
  );
}
