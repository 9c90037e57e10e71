/**
 * The preview host's entry. It must run before the functions and pane bundles (preview.html
 * orders the scripts): they expect Office, Excel and CustomFunctions to exist when they load.
 */
import { render } from 'preact';
import { loadDemo } from './demo/demoWorkbook';
import { installOfficeShim } from './shim/install';
import { PreviewApp } from './ui/PreviewApp';
import { createWorkbook } from './workbook/workbook';

const workbook = createWorkbook();
loadDemo(workbook);
const settings = installOfficeShim(workbook);
// For browser tests and a curious person's console: the model (cell edit mode, blanks as 0,
// selection) and the shim's live settings (sync delay, payload limit).
(globalThis as unknown as { plumblinePreview: unknown }).plumblinePreview = { workbook, settings };

/** functions.json tells how each argument is passed, as Excel learns it from the same file. */
async function loadFunctionShapes(): Promise<void> {
  const response = await fetch('functions.json');
  workbook.loadFunctionMetadata(await response.json());
}

void loadFunctionShapes();
const host = document.getElementById('workbook');
if (host) render(<PreviewApp workbook={workbook} />, host);
