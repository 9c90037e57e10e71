/**
 * The preview host's entry. It must run before the functions and pane bundles (preview.html
 * orders the scripts): they expect Office, Excel and CustomFunctions to exist when they load.
 */
import { render } from 'preact';
import { loadDemo } from './demo/demoWorkbook';
import { installOfficeShim } from './shim/install';
import { PreviewApp } from './ui/PreviewApp';
import { createWorkbook, type FunctionShape } from './workbook/workbook';

const workbook = createWorkbook();
loadDemo(workbook);
installOfficeShim(workbook);

/** functions.json tells which arguments are single values, as Excel learns it from the same file. */
async function loadFunctionShapes(): Promise<void> {
  const response = await fetch('functions.json');
  const metadata = (await response.json()) as { functions: { id: string; parameters: { dimensionality?: string; optional?: boolean }[] }[] };
  const shapes: FunctionShape[] = metadata.functions.map((f) => ({
    id: f.id,
    parameters: f.parameters.map((p) => ({ dimensionality: p.dimensionality === 'matrix' ? 'matrix' : 'scalar', optional: p.optional === true })),
  }));
  workbook.setFunctionShapes(shapes);
}

void loadFunctionShapes();
const host = document.getElementById('workbook');
if (host) render(<PreviewApp workbook={workbook} />, host);
