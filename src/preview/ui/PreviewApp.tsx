import { useEffect, useState } from 'preact/hooks';
import { cellAddress } from '../../addressing/a1';
import type { PreviewWorkbook } from '../workbook/workbook';
import { FormulaBar } from './FormulaBar';
import { Grid } from './Grid';
import { HostSwitches } from './HostSwitches';
import { parseEntry } from './parseEntry';
import { SheetTabs } from './SheetTabs';

/** The preview workbook's screen: a note on what it is, the formula bar, the grid and the sheet tabs. */
export function PreviewApp({ workbook }: { workbook: PreviewWorkbook }) {
  const [, setVersion] = useState(0);
  const [editSeed, setEditSeed] = useState<{ text: string | undefined; token: number }>({ text: undefined, token: 0 });
  useEffect(() => workbook.subscribe(() => setVersion((v) => v + 1)), [workbook]);

  const sheet = workbook.activeSheet();
  const selection = workbook.selection();
  const activeCell = { sheet, row: selection.top, column: selection.left };
  const error = workbook.errorAt(activeCell);

  const commit = (text: string) => {
    workbook.setInputs(sheet, activeCell.row, activeCell.column, [[parseEntry(text)]]);
    const next = activeCell.row + 1;
    workbook.select({ sheet, top: next, left: activeCell.column, bottom: next, right: activeCell.column });
    document.querySelector<HTMLElement>('.grid-scroller')?.focus();
  };

  return (
    <div class="preview">
      <header class="preview-note">
        <strong>Plumbline preview workbook.</strong> This page is a stand-in host, not Excel: it runs the add-in's real cell functions and task pane against a
        small workbook of our own, with a shim for the part of Office.js they use. To use Plumbline in Excel, sideload <code>manifest.xml</code> (see the
        README: Excel desktop through office-addin-debugging, or Insert › Add-ins › Upload My Add-in in Excel on the web).
      </header>
      <HostSwitches workbook={workbook} />
      <FormulaBar
        selection={selection}
        input={workbook.inputAt(activeCell)}
        editSeed={editSeed}
        onCommit={commit}
        onCancel={() => document.querySelector<HTMLElement>('.grid-scroller')?.focus()}
        onGoTo={(range) => {
          if (!workbook.hasSheet(range.sheet)) return false;
          workbook.select(range);
          return true;
        }}
      />
      <Grid
        workbook={workbook}
        sheet={sheet}
        selection={selection}
        onSelect={(range) => workbook.select(range)}
        onStartEdit={(initial) => setEditSeed((s) => ({ text: initial, token: s.token + 1 }))}
      />
      <div class="status-line" role="status" aria-live="polite">
        {error ? `${cellAddress(activeCell.row, activeCell.column)}: ${error.error}${error.message ? ` ${error.message}` : ''}` : ''}
      </div>
      <SheetTabs sheets={workbook.sheetNames()} active={sheet} onActivate={(name) => workbook.activateSheet(name)} />
    </div>
  );
}
